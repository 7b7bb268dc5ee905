import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import { CostLayer, ValuationMethod, valueInventory } from './valuation';

// A periodic-inventory worked example of the kind introductory accounting textbooks use (figures
// from memory): opening 100 units at £10, purchases of 200 at £11 and 300 at £12; 400 units issued.
// FIFO: cost of issues 100·10 + 200·11 + 100·12 = £4,400, closing 200·12 = £2,400.
// Weighted average: £6,800 / 600 = £11.333…; issues 400 × 11.333… = £4,533.33, closing £2,266.67.
const TEXTBOOK: CostLayer[] = [
  { quantity: 100, unitCost: 10 },
  { quantity: 200, unitCost: 11 },
  { quantity: 300, unitCost: 12 },
];

describe('valueInventory (FIFO and weighted average, IAS 2 §§23–25)', () => {
  it.each<[ValuationMethod, CostLayer[], string, string, string, string, string]>([
    ['fifo', TEXTBOOK, '400', '4400', '200', '2400', '6800'], // textbook periodic-inventory example, from memory
    ['weighted-average', TEXTBOOK, '400', '4533.33', '200', '2266.67', '6800'], // textbook periodic-inventory example, from memory
    ['fifo', TEXTBOOK, '0', '0', '600', '6800', '6800'],
    ['weighted-average', TEXTBOOK, '0', '0', '600', '6800', '6800'],
    ['fifo', TEXTBOOK, '600', '6800', '0', '0', '6800'],
    ['weighted-average', TEXTBOOK, '600', '6800', '0', '0', '6800'],
    ['fifo', TEXTBOOK, '100', '1000', '500', '5800', '6800'], // exactly the first layer
    ['fifo', TEXTBOOK, '100.5', '1005.5', '499.5', '5794.5', '6800'],
    ['fifo', [], '0', '0', '0', '0', '0'],
    ['weighted-average', [], '0', '0', '0', '0', '0'],
    ['weighted-average', [{ quantity: 0, unitCost: 5 }], '0', '0', '0', '0', '0'],
    ['fifo', [{ quantity: 3, unitCost: '0.333' }], '1', '0.33', '2', '0.67', '1'], // 0.999 → £1.00; no penny lost
    ['weighted-average', [{ quantity: 1, unitCost: 1 }, { quantity: 2, unitCost: 2 }], '1', '1.67', '2', '3.33', '5'], // 5/3 half up
    ['fifo', [{ quantity: '12.5', unitCost: '3.2' }, { quantity: '7.5', unitCost: '3.6' }], '15', '49.0', '5', '18', '67'], // kg of resin
  ])('%s, issuing %s of %j', (method, layers, issued, issuedCost, closingQuantity, closingValue, totalCost) => {
    const v = valueInventory(layers, issued, method);
    expect(v.issuedCost.toString()).toBe(new Decimal(issuedCost).toString());
    expect(v.closingQuantity.toString()).toBe(closingQuantity);
    expect(v.closingValue.toString()).toBe(closingValue);
    expect(v.totalCost.toString()).toBe(totalCost);
  });

  it.each(['lifo', 'LIFO', 'specific'])('refuses %s (IAS 2 allows FIFO or weighted average, not LIFO)', (method) => {
    expect(() => valueInventory(TEXTBOOK, 10, method as ValuationMethod)).toThrow(/IAS 2/);
    try {
      valueInventory(TEXTBOOK, 10, method as ValuationMethod);
    } catch (e) {
      expect((e as DomainError).code).toBe('not-allowed');
    }
  });

  it.each<[CostLayer[], string, RegExp]>([
    [TEXTBOOK, '600.01', /Cannot issue 600.01 when the layers hold 600/],
    [TEXTBOOK, '-1', /must not be negative/],
    [[{ quantity: -1, unitCost: 1 }], '0', /quantity of layer 1/],
    [[{ quantity: 1, unitCost: -1 }], '0', /unit cost of layer 1/],
  ])('refuses %j issuing %s', (layers, issued, message) => {
    expect(() => valueInventory(layers, issued, 'fifo')).toThrow(message);
  });

  const layer = fc.record({
    quantity: fc.integer({ min: 0, max: 100000 }).map((n) => new Decimal(n).div(100)),
    unitCost: fc.integer({ min: 0, max: 1000000 }).map((n) => new Decimal(n).div(10000)),
  });
  const stock = fc
    .array(layer, { maxLength: 8 })
    .chain((layers) => {
      const total = layers.reduce((s, l) => s.plus(l.quantity), new Decimal(0));
      return fc.tuple(
        fc.constant(layers),
        fc.integer({ min: 0, max: total.times(100).toNumber() }).map((n) => new Decimal(n).div(100)),
        fc.constantFrom<ValuationMethod>('fifo', 'weighted-average'),
      );
    });

  it('issued cost + closing value = total cost exactly, never below zero (property)', () => {
    fc.assert(
      fc.property(stock, ([layers, issued, method]) => {
        const v = valueInventory(layers, issued, method);
        expect(v.issuedCost.plus(v.closingValue).eq(v.totalCost)).toBe(true);
        expect(v.closingValue.gte(0)).toBe(true);
        expect(v.issuedCost.decimalPlaces()).toBeLessThanOrEqual(2);
      }),
      { numRuns: 400 },
    );
  });

  it('FIFO and weighted average cost the same when every layer costs the same (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 500 }), { minLength: 1, maxLength: 6 }), fc.integer({ min: 1, max: 9999 }), (qs, pence) => {
        const layers = qs.map((q) => ({ quantity: q, unitCost: new Decimal(pence).div(100) }));
        const issued = Math.floor(qs.reduce((a, b) => a + b, 0) / 2);
        expect(valueInventory(layers, issued, 'fifo').issuedCost.toString()).toBe(
          valueInventory(layers, issued, 'weighted-average').issuedCost.toString(),
        );
      }),
    );
  });
});
