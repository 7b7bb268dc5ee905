import {
  Decimal,
  EDGE_KINDS,
  HAZARD_CLASSES,
  MATERIAL_KINDS,
  type EdgeKind,
  type HazardClass,
  type MaterialKind,
} from '@potlife/domain';
import { z } from 'zod';
import { STOCK_UNITS, type StockUnit } from '../../../lib/material-words';
import { TRIM_PIECES, type Material, type MaterialBody, type PackingGroup, type TrimPiece } from '../api/types';

// The material form's values (text as typed), its rules, and the body sent to the API. The rules
// repeat the API's (apps/api/src/catalogue/material-fields.ts) so a mistake is shown at once; the
// API checks again.

export type MaterialFormValues = {
  code: string;
  name: string;
  kind: MaterialKind | '';
  stockUnit: StockUnit | '';
  packSizes: { key: string; size: string; label: string }[];
  lotTracked: boolean;
  shelfLifeDays: string;
  storageMinC: string;
  storageMaxC: string;
  hazardClass: HazardClass;
  unNumber: string;
  packingGroup: PackingGroup | '';
  flashPointC: string;
  isAccelerator: boolean;
  reorderLevel: string;
  reorderQuantity: string;
  matGsm: string;
  rollWidthM: string;
  trimKind: EdgeKind | '';
  trimLengthM: string;
  trimPiece: TrimPiece;
  topcoatColour: string;
  litresPerKg: string;
  notes: string;
};

export const MATERIAL_FORM_FIELDS = [
  'code',
  'name',
  'kind',
  'stockUnit',
  'packSizes',
  'lotTracked',
  'shelfLifeDays',
  'storageMinC',
  'storageMaxC',
  'hazardClass',
  'unNumber',
  'packingGroup',
  'flashPointC',
  'isAccelerator',
  'reorderLevel',
  'reorderQuantity',
  'matGsm',
  'rollWidthM',
  'trimKind',
  'trimLengthM',
  'trimPiece',
  'topcoatColour',
  'litresPerKg',
  'notes',
] as const;

/** Kinds whose form shows a weight and roll width (a mat must have them). */
export const MAT_FIELD_KINDS: readonly MaterialKind[] = ['mat', 'bandage'];
/** Liquids often stocked by weight: the form offers litres per kg (for the flammables cabinet). */
export const LIQUID_KINDS: readonly MaterialKind[] = [
  'base-resin',
  'topcoat',
  'catalyst',
  'acetone',
  'adhesive',
];

let packKey = 0;
export function newPackRow(size = '', label = '') {
  packKey += 1;
  return { key: `pack-${packKey}`, size, label };
}

const text = (value: string | null | undefined) => value ?? '';

export function formValuesOf(material?: Material): MaterialFormValues {
  if (!material) {
    return {
      code: '',
      name: '',
      kind: '',
      stockUnit: '',
      packSizes: [newPackRow()],
      lotTracked: true,
      shelfLifeDays: '',
      storageMinC: '',
      storageMaxC: '',
      hazardClass: 'none',
      unNumber: '',
      packingGroup: '',
      flashPointC: '',
      isAccelerator: false,
      reorderLevel: '0',
      reorderQuantity: '0',
      matGsm: '',
      rollWidthM: '',
      trimKind: '',
      trimLengthM: '',
      trimPiece: 'length',
      topcoatColour: '',
      litresPerKg: '',
      notes: '',
    };
  }
  return {
    code: material.code,
    name: material.name,
    kind: material.kind,
    stockUnit: material.stockUnit,
    packSizes: material.packSizes.map((pack) => newPackRow(pack.size, pack.label)),
    lotTracked: material.lotTracked,
    shelfLifeDays: material.shelfLifeDays === null ? '' : String(material.shelfLifeDays),
    storageMinC: text(material.storageMinC),
    storageMaxC: text(material.storageMaxC),
    hazardClass: material.hazardClass,
    unNumber: text(material.unNumber),
    packingGroup: material.packingGroup ?? '',
    flashPointC: text(material.flashPointC),
    isAccelerator: material.isAccelerator,
    reorderLevel: material.reorderLevel,
    reorderQuantity: material.reorderQuantity,
    matGsm: material.matGsm === null ? '' : String(material.matGsm),
    rollWidthM: text(material.rollWidthM),
    trimKind: material.trimKind ?? '',
    trimLengthM: text(material.trimLengthM),
    trimPiece: material.trimPiece ?? 'length',
    topcoatColour: text(material.topcoatColour),
    litresPerKg: text(material.litresPerKg),
    notes: text(material.notes),
  };
}

const decimalPattern = (signed: boolean, scale: number) =>
  new RegExp(`^${signed ? '-?' : ''}\\d+(\\.\\d{1,${scale}})?$`);

function decimal(label: string, { signed = false, scale = 3, positive = false, optional = true } = {}) {
  return z.string().superRefine((raw, ctx) => {
    const value = raw.trim();
    if (value === '') {
      if (!optional) {
        ctx.addIssue({ code: 'custom', message: `Enter ${label}` });
      }
      return;
    }
    if (!decimalPattern(signed, scale).test(value)) {
      ctx.addIssue({
        code: 'custom',
        message: `Write ${label} as a number${signed ? '' : ' (0 or more)'}, with at most ${scale} decimal places`,
      });
      return;
    }
    if (positive && new Decimal(value).lte(0)) {
      ctx.addIssue({
        code: 'custom',
        message: `${label.charAt(0).toUpperCase()}${label.slice(1)} must be more than 0`,
      });
    }
  });
}

function whole(label: string, min: number, max: number) {
  return z.string().superRefine((raw, ctx) => {
    const value = raw.trim();
    if (value === '') {
      return;
    }
    if (!/^\d+$/.test(value) || Number(value) < min || Number(value) > max) {
      ctx.addIssue({ code: 'custom', message: `${label} must be a whole number from ${min} to ${max}` });
    }
  });
}

const CODE = /^[A-Za-z0-9][A-Za-z0-9._/-]*$/;

export const materialSchema = z
  .object({
    code: z
      .string()
      .trim()
      .min(1, 'Enter a code, like RES-25')
      .max(40, 'Keep the code to 40 characters')
      .regex(CODE, 'Use letters, digits and . _ / - only, starting with a letter or digit'),
    name: z.string().trim().min(1, 'Enter the name').max(160, 'Keep the name to 160 characters'),
    kind: z.enum(MATERIAL_KINDS as [MaterialKind, ...MaterialKind[]], {
      error: 'Choose the kind of material',
    }),
    stockUnit: z.enum(STOCK_UNITS, { error: 'Choose the unit it is stocked in' }),
    packSizes: z
      .array(
        z.object({
          key: z.string(),
          size: decimal('the pack size', { positive: true, optional: false }),
          label: z
            .string()
            .trim()
            .min(1, 'Name the pack, like "25 kg drum"')
            .max(60, 'Keep it to 60 characters')
            .regex(/^[^;]*$/, 'No semicolons in a pack name'),
        }),
      )
      .min(1, 'Add at least one pack')
      .max(20, 'At most 20 packs'),
    lotTracked: z.boolean(),
    shelfLifeDays: whole('Shelf life', 1, 3650),
    storageMinC: decimal('the minimum', { signed: true, scale: 1 }),
    storageMaxC: decimal('the maximum', { signed: true, scale: 1 }),
    hazardClass: z.enum(HAZARD_CLASSES as [HazardClass, ...HazardClass[]]),
    unNumber: z
      .string()
      .trim()
      .regex(/^(\d{4})?$/, 'A UN number is four digits, like 1866'),
    packingGroup: z.enum(['', 'I', 'II', 'III']),
    flashPointC: decimal('the flash point', { signed: true, scale: 1 }),
    isAccelerator: z.boolean(),
    reorderLevel: decimal('the reorder level', { optional: false }),
    reorderQuantity: decimal('the reorder quantity', { optional: false }),
    matGsm: whole('The weight', 1, 5000),
    rollWidthM: decimal('the roll width', { positive: true }),
    trimKind: z.enum(['', ...EDGE_KINDS] as [string, ...string[]]),
    trimLengthM: decimal('the trim length', { positive: true }),
    trimPiece: z.enum(TRIM_PIECES as unknown as [TrimPiece, ...TrimPiece[]], {
      error: 'Choose a straight length or a corner piece',
    }),
    topcoatColour: z.string().trim().max(60, 'Keep the colour to 60 characters'),
    litresPerKg: decimal('litres per kg', { positive: true, scale: 4 }),
    notes: z.string().max(2000, 'Keep the notes to 2000 characters'),
  })
  .superRefine(
    (values, ctx) => {
      const add = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
      if (values.kind === 'mat') {
        if (values.matGsm.trim() === '') {
          add('matGsm', 'A mat needs its weight in g/m² (e.g. 300, 450, 600)');
        }
        if (values.rollWidthM.trim() === '') {
          add('rollWidthM', 'A mat needs its roll width in metres (e.g. 1.04)');
        }
      }
      if (values.kind === 'trim') {
        if (values.trimKind === '') {
          add('trimKind', 'A trim needs its kind: drip, kerb, wall or angle');
        }
        if (values.trimLengthM.trim() === '') {
          add('trimLengthM', 'A trim needs its length in metres (e.g. 3)');
        }
      }
      if (values.hazardClass !== 'none' && values.unNumber.trim() === '') {
        add(
          'unNumber',
          `A class ${values.hazardClass} material needs its UN number (four digits, from its safety data sheet)`,
        );
      }
      const min = values.storageMinC.trim();
      const max = values.storageMaxC.trim();
      if (
        decimalPattern(true, 1).test(min) &&
        decimalPattern(true, 1).test(max) &&
        new Decimal(min).gt(max)
      ) {
        add('storageMaxC', `Must not be below the minimum (${min} °C)`);
      }
      const seen = new Map<string, number>();
      values.packSizes.forEach((pack, index) => {
        const size = pack.size.trim();
        if (!decimalPattern(false, 3).test(size)) {
          return;
        }
        const key = new Decimal(size).toString();
        if (seen.has(key)) {
          ctx.addIssue({
            code: 'custom',
            path: ['packSizes', index, 'size'],
            message: `The pack size ${key} is already listed`,
          });
        }
        seen.set(key, index);
      });
      // Run even when a field above is wrong, so every problem shows at once.
    },
    { when: () => true },
  );

const orNull = (value: string) => (value.trim() === '' ? null : value.trim());

/** The body for POST or PATCH: fields that do not apply to the kind are cleared. */
export function materialBodyOf(values: MaterialFormValues, active = true): MaterialBody {
  const kind = values.kind as MaterialKind;
  const matFields = MAT_FIELD_KINDS.includes(kind);
  const hazardous = values.hazardClass !== 'none';
  return {
    code: values.code.trim(),
    name: values.name.trim(),
    kind,
    stockUnit: values.stockUnit as StockUnit,
    packSizes: values.packSizes.map((pack) => ({ size: pack.size.trim(), label: pack.label.trim() })),
    lotTracked: values.lotTracked,
    shelfLifeDays: values.shelfLifeDays.trim() === '' ? null : Number(values.shelfLifeDays.trim()),
    storageMinC: orNull(values.storageMinC),
    storageMaxC: orNull(values.storageMaxC),
    hazardClass: values.hazardClass,
    unNumber: hazardous ? orNull(values.unNumber) : null,
    packingGroup:
      hazardous && values.hazardClass !== '5.2' && values.hazardClass !== '2' && values.packingGroup !== ''
        ? values.packingGroup
        : null,
    flashPointC: orNull(values.flashPointC),
    isAccelerator: values.isAccelerator,
    reorderLevel: values.reorderLevel.trim(),
    reorderQuantity: values.reorderQuantity.trim(),
    matGsm: matFields && values.matGsm.trim() !== '' ? Number(values.matGsm.trim()) : null,
    rollWidthM: matFields ? orNull(values.rollWidthM) : null,
    trimKind: kind === 'trim' && values.trimKind !== '' ? (values.trimKind as EdgeKind) : null,
    trimLengthM: kind === 'trim' ? orNull(values.trimLengthM) : null,
    trimPiece: kind === 'trim' ? values.trimPiece : null,
    topcoatColour: kind === 'topcoat' ? orNull(values.topcoatColour) : null,
    litresPerKg: orNull(values.litresPerKg),
    active,
    notes: orNull(values.notes),
  };
}
