import { Decimal } from '@potlife/domain';
import type { EdgeKind, HazardClass, MaterialKind } from '@potlife/domain';
import type { MaterialResponse, PackingGroup } from './dto/material.dto';
import type { Material, PackSize, StockUnit, TrimPiece } from './entities/material.entity';
import { plainDecimal } from './dto/validators';

/** Everything a user sets on a material, as stored (decimal strings, nulls for "not given"). */
export interface MaterialFields {
  code: string;
  name: string;
  kind: MaterialKind;
  stockUnit: StockUnit;
  packSizes: PackSize[];
  lotTracked: boolean;
  shelfLifeDays: number | null;
  storageMinC: string | null;
  storageMaxC: string | null;
  hazardClass: HazardClass;
  unNumber: string | null;
  packingGroup: PackingGroup | null;
  flashPointC: string | null;
  isAccelerator: boolean;
  reorderLevel: string;
  reorderQuantity: string;
  matGsm: number | null;
  rollWidthM: string | null;
  trimKind: EdgeKind | null;
  trimLengthM: string | null;
  trimPiece: TrimPiece | null;
  topcoatColour: string | null;
  litresPerKg: string | null;
  active: boolean;
  notes: string | null;
}

export type FieldName = keyof MaterialFields;

/** What a new material has for each field the request leaves out. */
export const MATERIAL_DEFAULTS: Omit<MaterialFields, 'code' | 'name' | 'kind' | 'stockUnit' | 'packSizes'> = {
  lotTracked: true,
  shelfLifeDays: null,
  storageMinC: null,
  storageMaxC: null,
  hazardClass: 'none',
  unNumber: null,
  packingGroup: null,
  flashPointC: null,
  isAccelerator: false,
  reorderLevel: '0',
  reorderQuantity: '0',
  matGsm: null,
  rollWidthM: null,
  trimKind: null,
  trimLengthM: null,
  trimPiece: null,
  topcoatColour: null,
  litresPerKg: null,
  active: true,
  notes: null,
};

export const FIELD_NAMES: readonly FieldName[] = [
  'code',
  'name',
  'kind',
  'stockUnit',
  'packSizes',
  ...(Object.keys(MATERIAL_DEFAULTS) as FieldName[]),
];

/** The same fields with decimals written without trailing zeros, so equal values compare equal. */
export function normaliseFields(f: MaterialFields): MaterialFields {
  return {
    ...f,
    code: f.code.trim(),
    name: f.name.trim(),
    packSizes: f.packSizes.map((p) => ({ size: plainDecimal(p.size), label: p.label.trim() })),
    storageMinC: plainDecimal(f.storageMinC),
    storageMaxC: plainDecimal(f.storageMaxC),
    flashPointC: plainDecimal(f.flashPointC),
    reorderLevel: plainDecimal(f.reorderLevel),
    reorderQuantity: plainDecimal(f.reorderQuantity),
    rollWidthM: plainDecimal(f.rollWidthM),
    trimLengthM: plainDecimal(f.trimLengthM),
    // a trim is a length unless it says it is a corner piece
    trimPiece: f.kind === 'trim' ? (f.trimPiece ?? 'length') : f.trimPiece,
    litresPerKg: plainDecimal(f.litresPerKg),
  };
}

/** A stored material's fields, normalised. */
export function fieldsOf(m: Material): MaterialFields {
  const out = {} as Record<FieldName, unknown>;
  for (const k of FIELD_NAMES) {
    out[k] = m[k];
  }
  return normaliseFields(out as unknown as MaterialFields);
}

export function sameFields(a: MaterialFields, b: MaterialFields): boolean {
  return FIELD_NAMES.every((k) => JSON.stringify(a[k]) === JSON.stringify(b[k]));
}

export function toMaterialResponse(m: Material): MaterialResponse {
  return {
    id: m.id,
    ...fieldsOf(m),
    createdAt: m.createdAt.toISOString(),
    updatedAt: m.updatedAt.toISOString(),
  };
}

export interface FieldError {
  field: string;
  message: string;
}

const MAT_FIELD_KINDS: readonly MaterialKind[] = ['mat', 'bandage'];

/**
 * Rules between fields that a per-field check cannot see. Each problem names its field.
 * - a mat needs its weight (g/m²) and roll width; only mat and bandage carry them;
 * - a trim needs its kind (drip, kerb, wall, angle) and length; only trims carry them, and
 *   only a trim is a piece (length, external or internal corner; a trim is a length by default);
 * - only a topcoat has a colour;
 * - a hazardous material has a UN number, one with no hazard class has none; organic peroxides
 *   (5.2) and gases (2) are not given packing groups ([memory] ADR 2.1.1.3, verify);
 * - storage min ≤ max; no pack size twice.
 */
export function materialRuleErrors(f: MaterialFields): FieldError[] {
  const errors: FieldError[] = [];
  const add = (field: string, message: string) => errors.push({ field, message });
  if (f.kind === 'mat') {
    if (f.matGsm === null) {
      add('matGsm', 'a mat needs its weight in g/m² (e.g. 300, 450, 600)');
    }
    if (f.rollWidthM === null) {
      add('rollWidthM', 'a mat needs its roll width in metres (e.g. 1.04)');
    }
  } else if (!MAT_FIELD_KINDS.includes(f.kind)) {
    if (f.matGsm !== null) {
      add('matGsm', `only a mat or bandage has a weight in g/m², not a ${f.kind}; leave it empty`);
    }
    if (f.rollWidthM !== null) {
      add('rollWidthM', `only a mat or bandage has a roll width, not a ${f.kind}; leave it empty`);
    }
  }
  if (f.kind === 'trim') {
    if (f.trimKind === null) {
      add('trimKind', 'a trim needs its kind: drip, kerb, wall or angle');
    }
    if (f.trimLengthM === null) {
      add('trimLengthM', 'a trim needs its length in metres (e.g. 3)');
    }
  } else {
    if (f.trimKind !== null) {
      add('trimKind', `only a trim has a trim kind, not a ${f.kind}; leave it empty`);
    }
    if (f.trimLengthM !== null) {
      add('trimLengthM', `only a trim has a trim length, not a ${f.kind}; leave it empty`);
    }
    if (f.trimPiece !== null) {
      add('trimPiece', `only a trim is a length or a corner piece, not a ${f.kind}; leave it empty`);
    }
  }
  if (f.kind !== 'topcoat' && f.topcoatColour !== null) {
    add('topcoatColour', `only a topcoat has a colour, not a ${f.kind}; leave it empty`);
  }
  if (f.hazardClass === 'none') {
    if (f.unNumber !== null) {
      add('unNumber', 'a material with hazard class none has no UN number; give its class or leave the number empty');
    }
    if (f.packingGroup !== null) {
      add('packingGroup', 'a material with hazard class none has no packing group');
    }
  } else {
    if (f.unNumber === null) {
      add('unNumber', `a class ${f.hazardClass} material needs its UN number (four digits, from its safety data sheet)`);
    }
    if ((f.hazardClass === '5.2' || f.hazardClass === '2') && f.packingGroup !== null) {
      add('packingGroup', `class ${f.hazardClass} is not given a packing group; leave it empty`);
    }
  }
  if (f.storageMinC !== null && f.storageMaxC !== null && new Decimal(f.storageMinC).greaterThan(f.storageMaxC)) {
    add('storageMaxC', `must not be below the storage minimum (${f.storageMinC} °C)`);
  }
  const seen = new Set<string>();
  for (const p of f.packSizes) {
    const key = plainDecimal(p.size);
    if (seen.has(key)) {
      add('packSizes', `the pack size ${key} appears twice`);
    }
    seen.add(key);
  }
  return errors;
}
