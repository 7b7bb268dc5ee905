import { Decimal } from '@potlife/domain';
import { CsvTable, RowAction, RowError } from '../catalogue/csv';
import { DECIMAL_RULES } from '../catalogue/dto/material.dto';
import { decimalProblem, isIsoDate } from '../catalogue/dto/validators';
import type { PackSize } from '../catalogue/entities/material.entity';

/**
 * A supplier's price list as CSV, in one place: the columns an export writes (in this order) and
 * an import reads (any order, names in any case). Each row is a new price for one pack of one
 * material from its valid_from date; a row is matched to a material by the company's material
 * code, or by the supplier's own code when this supplier has priced the material under it before.
 */
export const PRICE_CSV_SPEC = {
  material_code: 'the company’s material code; this or supplier_code is needed on every row',
  supplier_code: 'the supplier’s own code for the pack; kept with the price, and used to find the material when material_code is empty',
  material_name: 'written by the export for reading; ignored by the import',
  pack_size: 'required: one of the material’s pack sizes, in its stock unit (e.g. 25)',
  pack_label: 'written by the export for reading; ignored by the import',
  pack_price: 'required: pounds per pack net of VAT, to the penny (e.g. 86.40; a leading £ and thousands commas are accepted)',
  valid_from: 'the date the price starts, YYYY-MM-DD or DD/MM/YYYY; may be left out when the import gives validFrom',
} as const;

export type PriceCsvColumn = keyof typeof PRICE_CSV_SPEC;
export const PRICE_CSV_COLUMNS = Object.keys(PRICE_CSV_SPEC) as PriceCsvColumn[];
export const PRICE_CSV_REQUIRED: PriceCsvColumn[] = ['pack_size', 'pack_price'];
export const PRICE_CSV_HELP = PRICE_CSV_COLUMNS.map((c) => `${c}: ${PRICE_CSV_SPEC[c]}`).join('\n');

export interface PriceMaterial {
  id: string;
  code: string;
  name: string;
  packSizes: PackSize[];
}

/** What the row checker needs to know, loaded by the service for one supplier. */
export interface PriceLookups {
  /** The company's materials by lower-case code. */
  materialsByCode: ReadonlyMap<string, PriceMaterial>;
  materialsById: ReadonlyMap<string, PriceMaterial>;
  /** This supplier's codes (lower case) → material id, from its latest price row with that code. */
  materialBySupplierCode: ReadonlyMap<string, string>;
  /** This supplier's price rows by priceKey(materialId, packSize), oldest first. */
  history: ReadonlyMap<string, readonly { validFrom: string; packPrice: string }[]>;
}

export const priceKey = (materialId: string, packSize: string) => `${materialId}|${new Decimal(packSize).toString()}`;

export interface PriceWrite {
  materialId: string;
  packSize: string;
  packPrice: string;
  validFrom: string;
  supplierCode: string | null;
}

export interface CheckedPriceRow {
  row: number;
  action: RowAction;
  code: string;
  name: string;
  errors: RowError[];
  packSize: string | null;
  packPrice: string | null;
  validFrom: string | null;
  previousPrice: string | null;
  /** The row to insert, when the row is valid and new. */
  write: PriceWrite | null;
}

/** "£1,234.5" → "1234.5"; anything else is returned trimmed for the decimal check to judge. */
export function parsePrice(cell: string): string {
  return cell.trim().replace(/^£\s*/, '').replace(/,(?=\d{3}(\D|$))/g, '');
}

/** YYYY-MM-DD, or DD/MM/YYYY as UK spreadsheets write dates; null when neither. */
export function parseDate(cell: string): string | null {
  const t = cell.trim();
  if (isIsoDate(t)) {
    return t;
  }
  const uk = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/.exec(t);
  if (uk) {
    const iso = `${uk[3]}-${uk[2]!.padStart(2, '0')}-${uk[1]!.padStart(2, '0')}`;
    return isIsoDate(iso) ? iso : null;
  }
  return null;
}

const gbp = (v: string) => `£${new Decimal(v).toFixed(2)}`;

/**
 * Checks every row of a price list CSV for one supplier without touching the database: the row
 * parser and validator of the price list import.
 */
export function checkPriceRows(table: CsvTable, lookups: PriceLookups, defaultValidFrom: string | null): CheckedPriceRow[] {
  const firstRowOfKey = new Map<string, number>();
  return table.records.map((rec) => {
    const errors: RowError[] = [];
    const cell = (c: PriceCsvColumn) => rec.cells.get(c) ?? '';
    if (rec.problem !== null) {
      errors.push({ field: 'row', message: rec.problem });
    }
    const materialCode = cell('material_code');
    const supplierCode = cell('supplier_code');
    let material: PriceMaterial | undefined;
    if (materialCode !== '') {
      material = lookups.materialsByCode.get(materialCode.toLowerCase());
      if (!material) {
        errors.push({ field: 'material_code', message: `no material has the code ${materialCode} in the catalogue` });
      }
    }
    if (supplierCode !== '') {
      const byTheirs = lookups.materialBySupplierCode.get(supplierCode.toLowerCase());
      if (material === undefined && materialCode === '') {
        material = byTheirs === undefined ? undefined : lookups.materialsById.get(byTheirs);
        if (!material) {
          errors.push({
            field: 'supplier_code',
            message: `no material is priced under the supplier’s code ${supplierCode} yet; give the material_code`,
          });
        }
      } else if (material && byTheirs !== undefined && byTheirs !== material.id) {
        const other = lookups.materialsById.get(byTheirs);
        errors.push({
          field: 'supplier_code',
          message: `the supplier’s code ${supplierCode} belongs to ${other?.code ?? 'another material'}, not ${material.code}`,
        });
      }
    }
    if (materialCode === '' && supplierCode === '') {
      errors.push({ field: 'material_code', message: 'give the material_code or the supplier_code' });
    }
    if (supplierCode.length > 60) {
      errors.push({ field: 'supplier_code', message: 'must be at most 60 characters' });
    }

    const sizeCell = cell('pack_size');
    let packSize: string | null = null;
    const sizeProblem = sizeCell === '' ? 'must not be empty' : decimalProblem(sizeCell, DECIMAL_RULES.packSize);
    if (sizeProblem) {
      errors.push({ field: 'pack_size', message: sizeProblem });
    } else {
      packSize = new Decimal(sizeCell).toString();
      if (material && !material.packSizes.some((p) => new Decimal(p.size).equals(packSize!))) {
        errors.push({
          field: 'pack_size',
          message: `${material.code} comes in ${material.packSizes.map((p) => p.size).join(', ')}; add the ${packSize} pack to the material first`,
        });
      }
    }

    const priceCell = parsePrice(cell('pack_price'));
    let packPrice: string | null = null;
    const priceProblem = priceCell === '' ? 'must not be empty' : decimalProblem(priceCell, { min: '0', max: '999999999', scale: 2 });
    if (priceProblem) {
      errors.push({ field: 'pack_price', message: priceProblem });
    } else {
      packPrice = new Decimal(priceCell).toFixed(2);
    }

    const dateCell = cell('valid_from');
    let validFrom: string | null = null;
    if (dateCell === '') {
      if (defaultValidFrom === null) {
        errors.push({ field: 'valid_from', message: 'must not be empty (or give validFrom for the whole file)' });
      } else {
        validFrom = defaultValidFrom;
      }
    } else {
      validFrom = parseDate(dateCell);
      if (validFrom === null) {
        errors.push({ field: 'valid_from', message: 'must be a date written YYYY-MM-DD or DD/MM/YYYY' });
      }
    }

    let action: RowAction = 'create';
    let previousPrice: string | null = null;
    if (material && packSize !== null && validFrom !== null) {
      const key = `${priceKey(material.id, packSize)}|${validFrom}`;
      const first = firstRowOfKey.get(key);
      if (first !== undefined) {
        errors.push({ field: 'row', message: `row ${first} already prices this pack from ${validFrom}` });
      } else {
        firstRowOfKey.set(key, rec.row);
      }
      const rows = lookups.history.get(priceKey(material.id, packSize)) ?? [];
      const same = rows.find((r) => r.validFrom === validFrom);
      const before = rows.filter((r) => r.validFrom < validFrom!);
      previousPrice = before.length > 0 ? new Decimal(before[before.length - 1]!.packPrice).toFixed(2) : null;
      if (same) {
        if (packPrice !== null && new Decimal(same.packPrice).equals(packPrice)) {
          action = 'unchanged';
        } else {
          errors.push({
            field: 'pack_price',
            message: `this supplier already has ${gbp(same.packPrice)} for this pack from ${validFrom}; prices are never changed: give a later valid_from`,
          });
        }
      }
    }
    const ok = errors.length === 0;
    return {
      row: rec.row,
      action,
      code: material?.code ?? materialCode,
      name: material?.name ?? cell('material_name'),
      errors,
      packSize,
      packPrice,
      validFrom,
      previousPrice,
      write:
        ok && action === 'create'
          ? { materialId: material!.id, packSize: packSize!, packPrice: packPrice!, validFrom: validFrom!, supplierCode: supplierCode || null }
          : null,
    };
  });
}
