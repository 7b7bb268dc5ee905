import { Decimal } from '@potlife/domain';
import { toStockUnit } from './units';

const ctx = { matGsm: '450', bandageWidthMm: '100', bandageGsm: '450', trimLengthM: '3' };
const material = (over: Record<string, unknown>) =>
  ({
    name: 'X',
    stockUnit: 'kg',
    matGsm: null,
    rollWidthM: null,
    trimLengthM: null,
    litresPerKg: null,
    ...over,
  }) as never;

describe('toStockUnit', () => {
  it.each([
    // arithmetic on the material's own fields, no outside source
    ['m2 of 450 g mat as kg', '10', 'm2', { stockUnit: 'kg', matGsm: 450 }, '4.5'],
    ['m2 as m2', '10', 'm2', { stockUnit: 'm2' }, '10'],
    ['m of 100 mm bandage as m2', '10', 'm', { stockUnit: 'm2' }, '1'],
    ['m of 150 mm bandage as kg', '10', 'm', { stockUnit: 'kg', rollWidthM: '0.15', matGsm: 450 }, '0.675'],
    ['trim lengths as m', '4', 'each', { stockUnit: 'm', trimLengthM: '3' }, '12'],
    ['trim m as lengths', '7', 'm', { stockUnit: 'each', trimLengthM: '3' }, '3'],
    ['litres as kg', '1.58', 'L', { stockUnit: 'kg', litresPerKg: '1.264' }, '1.25'],
    ['kg as litres', '2', 'kg', { stockUnit: 'L', litresPerKg: '1.25' }, '2.5'],
  ])('%s', (_name, q, from, over, expected) => {
    const r = toStockUnit(new Decimal(q), from as never, material(over), ctx);
    expect(r.ok && r.quantity.toString()).toBe(expected);
  });

  it.each([
    ['litres without litres per kg', 'L', { stockUnit: 'kg' }, /litres per kg/],
    ['m as each without a trim length', 'm', { stockUnit: 'each' }, /change its stock unit/],
  ])('says why it cannot convert %s', (_name, from, over, problem) => {
    const r = toStockUnit(new Decimal(1), from as never, material(over), ctx);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.problem).toMatch(problem);
  });
});
