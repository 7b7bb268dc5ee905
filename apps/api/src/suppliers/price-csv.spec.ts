import { parseCsv } from '../catalogue/csv';
import { checkPriceRows, parseDate, parsePrice, PRICE_CSV_COLUMNS, PRICE_CSV_REQUIRED, priceKey, PriceLookups, PriceMaterial } from './price-csv';

// Pack sizes are common trade practice, no source (TRADE.md [practice]); prices are invented.
const RESIN: PriceMaterial = { id: 'm-res', code: 'RES', name: 'Base resin', packSizes: [{ size: '20', label: '20 kg drum' }, { size: '25', label: '25 kg drum' }] };
const CAT: PriceMaterial = { id: 'm-cat', code: 'CAT', name: 'Catalyst', packSizes: [{ size: '1', label: '1 kg bottle' }] };

const lookups: PriceLookups = {
  materialsByCode: new Map([
    ['res', RESIN],
    ['cat', CAT],
  ]),
  materialsById: new Map([
    [RESIN.id, RESIN],
    [CAT.id, CAT],
  ]),
  materialBySupplierCode: new Map([['br-25', RESIN.id]]),
  history: new Map([
    [
      priceKey(RESIN.id, '25'),
      [
        { validFrom: '2025-01-06', packPrice: '82.00' },
        { validFrom: '2025-04-01', packPrice: '86.40' },
      ],
    ],
  ]),
};

const check = (body: string, defaultValidFrom: string | null = null) =>
  checkPriceRows(parseCsv(`material_code,supplier_code,pack_size,pack_price,valid_from\n${body}`, PRICE_CSV_COLUMNS, PRICE_CSV_REQUIRED), lookups, defaultValidFrom);

describe('parsePrice and parseDate', () => {
  it.each([
    ['86.40', '86.40'],
    ['£86.40', '86.40'],
    ['£ 1,081.00', '1081.00'],
    ['1,081', '1081'],
    ['12,5', '12,5'],
  ])('parsePrice(%j) = %j', (cell, expected) => {
    expect(parsePrice(cell)).toBe(expected);
  });

  it.each([
    ['2025-04-01', '2025-04-01'],
    ['01/04/2025', '2025-04-01'],
    ['1/4/2025', '2025-04-01'],
    ['29/02/2024', '2024-02-29'],
    ['29/02/2025', null],
    ['2025-02-30', null],
    ['04/01/25', null],
    ['next week', null],
  ])('parseDate(%j) = %j', (cell, expected) => {
    expect(parseDate(cell)).toBe(expected);
  });
});

describe('checkPriceRows', () => {
  it('a new price for a known pack is a row to insert, with the price before it', () => {
    const [r] = check('RES,,25,88,2025-06-01');
    expect(r).toMatchObject({ row: 2, action: 'create', code: 'RES', name: 'Base resin', packSize: '25', packPrice: '88.00', validFrom: '2025-06-01', previousPrice: '86.40', errors: [] });
    expect(r!.write).toEqual({ materialId: RESIN.id, packSize: '25', packPrice: '88.00', validFrom: '2025-06-01', supplierCode: null });
  });

  it("finds the material by the supplier's code and keeps the code with the price", () => {
    const [r] = check(',BR-25,20,70,2025-06-01');
    expect(r!.errors).toEqual([]);
    expect(r!.write).toMatchObject({ materialId: RESIN.id, supplierCode: 'BR-25' });
  });

  it('the same price on the same date again is unchanged; another price on that date is refused', () => {
    const [same, changed] = check('RES,,25.0,82,2025-01-06\nRES,,25,83,2025-01-06');
    expect(same).toMatchObject({ action: 'unchanged', errors: [], write: null });
    expect(changed!.errors.map((e) => e.field)).toEqual(['row', 'pack_price']);
    expect(changed!.errors[1]!.message).toContain('already has £82.00 for this pack from 2025-01-06');
  });

  it('fills an empty date with the default of the file, or says it is missing', () => {
    expect(check('RES,,25,88,', '2025-07-01')[0]!.validFrom).toBe('2025-07-01');
    expect(check('RES,,25,88,')[0]!.errors).toEqual([{ field: 'valid_from', message: 'must not be empty (or give validFrom for the whole file)' }]);
  });

  it.each([
    ['an unknown material code', 'NOPE,,25,1,2025-06-01', 'material_code', 'no material has the code NOPE'],
    ["an unknown supplier's code", ',ZZ-1,25,1,2025-06-01', 'supplier_code', 'give the material_code'],
    ['neither code', ',,25,1,2025-06-01', 'material_code', 'give the material_code or the supplier_code'],
    ["a supplier's code of another material", 'CAT,BR-25,1,1,2025-06-01', 'supplier_code', 'belongs to RES, not CAT'],
    ['a pack the material does not come in', 'RES,,5,1,2025-06-01', 'pack_size', 'RES comes in 20, 25'],
    ['a pack size of 0', 'RES,,0,1,2025-06-01', 'pack_size', 'greater than 0'],
    ['no price', 'RES,,25,,2025-06-01', 'pack_price', 'must not be empty'],
    ['a negative price', 'RES,,25,-1,2025-06-01', 'pack_price', 'at least 0'],
    ['a fraction of a penny', 'RES,,25,1.005,2025-06-01', 'pack_price', 'at most 2 decimal places'],
    ['a date that is not one', 'RES,,25,1,2025-13-01', 'valid_from', 'YYYY-MM-DD or DD/MM/YYYY'],
  ])('%s is a row error naming the column', (_what, row, field, message) => {
    const [r] = check(row);
    expect(r!.write).toBeNull();
    expect(r!.errors).toEqual([{ field, message: expect.stringContaining(message) }]);
  });
});
