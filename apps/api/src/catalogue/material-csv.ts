import { Decimal } from '@potlife/domain';
import { CsvTable, RowAction, RowError } from './csv';
import type { FieldCheck } from './dto/checks';
import { MATERIAL_FIELD_CHECKS, MaterialFieldKey } from './dto/material.dto';
import type { PackSize } from './entities/material.entity';
import {
  FieldName,
  MATERIAL_DEFAULTS,
  MaterialFields,
  materialRuleErrors,
  normaliseFields,
  sameFields,
} from './material-fields';

type CellType = 'text' | 'int' | 'bool' | 'decimal' | 'packs';

interface ColumnSpec {
  field: FieldName;
  type: CellType;
  /** What an empty cell means: null (cleared) when true; the default or the existing value when false. */
  nullable: boolean;
  /** For the documentation of the file format. */
  note: string;
}

/**
 * The catalogue CSV, in one place: the columns an export writes (in this order) and an import
 * reads (any order, names in any case; only the required ones must be there). An import matches
 * rows to materials by `code` (case-insensitive): a known code updates that material, a new one
 * creates it. A column left out of the file leaves that field as it is (or its default for a new
 * material); an empty cell clears an optional field and leaves a field that must have a value as
 * it is.
 */
export const MATERIAL_CSV_SPEC = {
  code: { field: 'code', type: 'text', nullable: false, note: 'required; letters, digits and . _ / -; unique in the company' },
  name: { field: 'name', type: 'text', nullable: false, note: 'required' },
  kind: { field: 'kind', type: 'text', nullable: false, note: 'required: mat, bandage, base-resin, topcoat, catalyst, trim, outlet, acetone, adhesive, batten, fixing, other' },
  stock_unit: { field: 'stockUnit', type: 'text', nullable: false, note: 'required: kg, L, m2, m, each' },
  pack_sizes: { field: 'packSizes', type: 'packs', nullable: false, note: 'required: size:label, several separated by ";", e.g. "20:20 kg drum; 25:25 kg drum"' },
  lot_tracked: { field: 'lotTracked', type: 'bool', nullable: false, note: 'yes or no (default yes)' },
  shelf_life_days: { field: 'shelfLifeDays', type: 'int', nullable: true, note: 'whole days' },
  storage_min_c: { field: 'storageMinC', type: 'decimal', nullable: true, note: '°C' },
  storage_max_c: { field: 'storageMaxC', type: 'decimal', nullable: true, note: '°C, not below the minimum' },
  hazard_class: { field: 'hazardClass', type: 'text', nullable: false, note: 'none, 2, 3, 4.1, 5.1, 5.2, 6.1, 8, 9 (default none)' },
  un_number: { field: 'unNumber', type: 'text', nullable: true, note: 'four digits; needed when the hazard class is not none' },
  packing_group: { field: 'packingGroup', type: 'text', nullable: true, note: 'I, II or III' },
  flash_point_c: { field: 'flashPointC', type: 'decimal', nullable: true, note: '°C' },
  is_accelerator: { field: 'isAccelerator', type: 'bool', nullable: false, note: 'yes or no (default no)' },
  reorder_level: { field: 'reorderLevel', type: 'decimal', nullable: false, note: 'in the stock unit (default 0)' },
  reorder_quantity: { field: 'reorderQuantity', type: 'decimal', nullable: false, note: 'in the stock unit (default 0)' },
  mat_gsm: { field: 'matGsm', type: 'int', nullable: true, note: 'g/m²; needed for a mat' },
  roll_width_m: { field: 'rollWidthM', type: 'decimal', nullable: true, note: 'm; needed for a mat' },
  trim_kind: { field: 'trimKind', type: 'text', nullable: true, note: 'drip, kerb, wall or angle; needed for a trim' },
  trim_length_m: { field: 'trimLengthM', type: 'decimal', nullable: true, note: 'm; needed for a trim' },
  trim_piece: { field: 'trimPiece', type: 'text', nullable: true, note: 'trims only: length, external-corner or internal-corner (empty: length)' },
  topcoat_colour: { field: 'topcoatColour', type: 'text', nullable: true, note: 'topcoat only' },
  litres_per_kg: { field: 'litresPerKg', type: 'decimal', nullable: true, note: 'for liquids stocked by weight' },
  active: { field: 'active', type: 'bool', nullable: false, note: 'yes or no (default yes); no archives the material' },
  notes: { field: 'notes', type: 'text', nullable: true, note: 'free text' },
} as const satisfies Record<string, ColumnSpec>;

export type MaterialCsvColumn = keyof typeof MATERIAL_CSV_SPEC;
export const MATERIAL_CSV_COLUMNS = Object.keys(MATERIAL_CSV_SPEC) as MaterialCsvColumn[];
export const MATERIAL_CSV_REQUIRED: MaterialCsvColumn[] = ['code', 'name', 'kind', 'stock_unit', 'pack_sizes'];

/** The format, one line a column, for the API documentation and the web's help text. */
export const MATERIAL_CSV_HELP = MATERIAL_CSV_COLUMNS.map((c) => `${c}: ${MATERIAL_CSV_SPEC[c].note}`).join('\n');

const COLUMN_OF = new Map<string, MaterialCsvColumn>(MATERIAL_CSV_COLUMNS.map((c) => [MATERIAL_CSV_SPEC[c].field, c]));

/** The column a field is written in (errors name columns, as the user sees them). */
export function columnOf(field: string): string {
  return COLUMN_OF.get(field) ?? field;
}

const YES = new Set(['yes', 'y', 'true', '1']);
const NO = new Set(['no', 'n', 'false', '0']);

export function formatPacks(packs: readonly PackSize[]): string {
  return packs.map((p) => `${p.size}:${p.label}`).join('; ');
}

/** "20:20 kg drum; 25:25 kg drum" → packs, or null when a part is not size:label. */
export function parsePacks(cell: string): PackSize[] | null {
  const parts = cell
    .split(';')
    .map((p) => p.trim())
    .filter((p) => p !== '');
  const packs: PackSize[] = [];
  for (const part of parts) {
    const i = part.indexOf(':');
    if (i <= 0) {
      return null;
    }
    packs.push({ size: part.slice(0, i).trim(), label: part.slice(i + 1).trim() });
  }
  return packs;
}

/** A cell as the value its field takes, or an error; '' is handled by the caller. */
function convert(spec: ColumnSpec, cell: string): { value: unknown } | { error: string } {
  switch (spec.type) {
    case 'text':
    case 'decimal':
      return { value: cell };
    case 'int':
      return { value: /^-?\d{1,9}$/.test(cell) ? Number(cell) : cell };
    case 'bool': {
      const v = cell.toLowerCase();
      return YES.has(v) ? { value: true } : NO.has(v) ? { value: false } : { error: 'must be yes or no' };
    }
    case 'packs': {
      const packs = parsePacks(cell);
      return packs === null ? { error: 'write each pack as size:label, several separated by ";", e.g. "20:20 kg drum; 25:25 kg drum"' } : { value: packs };
    }
  }
}

/** Field checks (the same as the request bodies') and the rules between fields, for a whole set of fields. */
const FIELD_CHECKS = Object.entries(MATERIAL_FIELD_CHECKS) as [MaterialFieldKey, { nullable: boolean; check: FieldCheck }][];

export function checkMaterialFields(fields: MaterialFields): RowError[] {
  const errors: RowError[] = [];
  for (const [field, spec] of FIELD_CHECKS) {
    const v = fields[field];
    if (v === null || v === undefined) {
      if (!spec.nullable) {
        errors.push({ field: columnOf(field), message: 'must not be empty' });
      }
      continue;
    }
    const problem = spec.check(v);
    if (problem !== null) {
      errors.push({ field: columnOf(field), message: problem });
    }
  }
  if (errors.length > 0) {
    return errors;
  }
  return materialRuleErrors(normaliseFields(fields)).map((e) => ({ field: columnOf(e.field), message: e.message }));
}

export interface CheckedMaterialRow {
  row: number;
  action: RowAction;
  code: string;
  name: string;
  errors: RowError[];
  /** The material's fields after the row (normalised), when the row has no errors. */
  fields: MaterialFields | null;
  /** The material the row updates, if its code is known. */
  existingId: string | null;
  /** The stock unit the existing material had, when the row changes it. */
  stockUnitChangedFrom: string | null;
}

/**
 * Checks every row of a catalogue CSV against the company's materials (by lower-case code) without
 * touching the database: the row parser and validator of the import.
 */
export function checkMaterialRows(
  table: CsvTable,
  existing: ReadonlyMap<string, { id: string; fields: MaterialFields }>,
): CheckedMaterialRow[] {
  const firstRowOfCode = new Map<string, number>();
  return table.records.map((rec) => {
    const errors: RowError[] = [];
    const code = rec.cells.get('code') ?? '';
    const known = code === '' ? undefined : existing.get(code.toLowerCase());
    const base: Record<string, unknown> = known ? { ...known.fields } : { ...MATERIAL_DEFAULTS };
    if (rec.problem !== null) {
      errors.push({ field: 'row', message: rec.problem });
    }
    for (const column of table.columns as MaterialCsvColumn[]) {
      const spec: ColumnSpec = MATERIAL_CSV_SPEC[column];
      const cell = rec.cells.get(column) ?? '';
      if (cell === '') {
        if (spec.nullable) {
          base[spec.field] = null;
        } else if ((MATERIAL_CSV_REQUIRED as string[]).includes(column)) {
          errors.push({ field: column, message: 'must not be empty' });
        }
        continue;
      }
      const c = convert(spec, cell);
      if ('error' in c) {
        errors.push({ field: column, message: c.error });
      } else {
        base[spec.field] = c.value;
      }
    }
    if (code !== '') {
      const first = firstRowOfCode.get(code.toLowerCase());
      if (first !== undefined) {
        errors.push({ field: 'code', message: `the code ${code} is also on row ${first}; each material once per file` });
      } else {
        firstRowOfCode.set(code.toLowerCase(), rec.row);
      }
    }
    const fields = base as unknown as MaterialFields;
    if (errors.length === 0) {
      errors.push(...checkMaterialFields(fields));
    }
    const ok = errors.length === 0;
    const normalised = ok ? normaliseFields(fields) : null;
    const action: RowAction = !known ? 'create' : normalised && sameFields(normalised, known.fields) ? 'unchanged' : 'update';
    return {
      row: rec.row,
      action,
      code,
      name: typeof base.name === 'string' ? base.name : '',
      errors,
      fields: normalised,
      existingId: known?.id ?? null,
      stockUnitChangedFrom: known && normalised && normalised.stockUnit !== known.fields.stockUnit ? known.fields.stockUnit : null,
    };
  });
}

/** One material as a CSV row under MATERIAL_CSV_COLUMNS. */
export function materialCsvRow(f: MaterialFields): Record<MaterialCsvColumn, string> {
  const out = {} as Record<MaterialCsvColumn, string>;
  for (const column of MATERIAL_CSV_COLUMNS) {
    const spec: ColumnSpec = MATERIAL_CSV_SPEC[column];
    const v = f[spec.field];
    out[column] =
      v === null || v === undefined
        ? ''
        : spec.type === 'packs'
          ? formatPacks(v as PackSize[])
          : spec.type === 'bool'
            ? v
              ? 'yes'
              : 'no'
            : spec.type === 'decimal'
              ? new Decimal(v as string).toString()
              : String(v);
  }
  return out;
}
