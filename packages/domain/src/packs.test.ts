import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import { choosePacks, shortfallToOrder } from './packs';

// Pack sizes: resin 5/10/20/25 kg, topcoat 5/10/20 kg, catalyst 0.5/1/5 kg (common trade practice, no source).
const RESIN = [5, 10, 20, 25];
const CATALYST = [0.5, 1, 5];

const show = (choice: ReturnType<typeof choosePacks>): string =>
  choice.packs.map((p) => `${p.size.toString()}×${p.count}`).join(' + ');

describe('choosePacks: least leftover, then fewest packs', () => {
  it.each([
    ['0', RESIN, '', '0', '0'],
    ['1', RESIN, '5×1', '5', '4'],
    ['5', RESIN, '5×1', '5', '0'],
    ['5.001', RESIN, '10×1', '10', '4.999'],
    ['30', RESIN, '25×1 + 5×1', '30', '0'], // ties with 20 + 10: the larger packs win
    ['31', RESIN, '25×1 + 10×1', '35', '4'], // 2 packs rather than 20 + 10 + 5
    ['40', RESIN, '20×2', '40', '0'], // 2 packs rather than 25 + 10 + 5
    ['45', RESIN, '25×1 + 20×1', '45', '0'],
    ['50', RESIN, '25×2', '50', '0'],
    ['10000', RESIN, '25×400', '10000', '0'],
    ['10001', RESIN, '25×400 + 5×1', '10005', '4'],
    ['0.6', CATALYST, '1×1', '1', '0.4'], // one 1 kg pack rather than two of 0.5 kg
    ['1.2', CATALYST, '1×1 + 0.5×1', '1.5', '0.3'],
    ['4.6', CATALYST, '5×1', '5', '0.4'],
    ['5.1', CATALYST, '5×1 + 0.5×1', '5.5', '0.4'],
    ['9', [3, 5], '3×3', '9', '0'], // least leftover beats fewest packs (5 + 5 leaves 1)
    ['7', [3, 5], '5×1 + 3×1', '8', '1'],
    ['7', [10, 5, 10], '10×1', '10', '3'], // unsorted, repeated sizes
    ['2.25', ['0.75'], '0.75×3', '2.25', '0'],
    [new Decimal('12.345'), [1], '1×13', '13', '0.655'],
  ])('%s from %j → %s', (q, sizes, packs, total, leftover) => {
    const choice = choosePacks(q, sizes);
    expect(show(choice)).toBe(packs);
    expect(choice.total.toString()).toBe(total);
    expect(choice.leftover.toString()).toBe(leftover);
  });

  it.each([
    ['-1', RESIN, /must not be negative/],
    ['1', [], /at least one pack size/],
    ['1', [0], /more than zero/],
    ['1', [-5], /more than zero/],
    ['100', ['24.9999', 25], /too close together or too finely divided/],
    ['100', ['1e20', 25], /too large or too finely divided/],
  ])('refuses %s from %j', (q, sizes, message) => {
    expect(() => choosePacks(q, sizes)).toThrow(DomainError);
    expect(() => choosePacks(q, sizes)).toThrow(message);
  });

  /** Every way to buy up to enough packs, for small cases. */
  function bruteForce(q: number, sizes: number[]): { leftover: number; packs: number } {
    let best = { leftover: Number.POSITIVE_INFINITY, packs: Number.POSITIVE_INFINITY };
    const walk = (i: number, total: number, packs: number): void => {
      if (i === sizes.length) {
        if (total >= q) {
          const leftover = Math.round((total - q) * 10) / 10;
          if (leftover < best.leftover || (leftover === best.leftover && packs < best.packs)) {
            best = { leftover, packs };
          }
        }
        return;
      }
      const size = sizes[i]!;
      for (let c = 0; c <= Math.ceil(q / size) + 1; c++) {
        walk(i + 1, total + c * size, packs + c);
      }
    };
    walk(0, 0, 0);
    return best;
  }

  it('agrees with trying every combination (property)', () => {
    const size = fc.integer({ min: 1, max: 24 }).map((n) => n / 2);
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 600 }).map((n) => n / 10),
        fc.uniqueArray(size, { minLength: 1, maxLength: 3 }),
        (q, sizes) => {
          const choice = choosePacks(q, sizes);
          const best = bruteForce(q, sizes);
          expect(choice.leftover.toNumber()).toBeCloseTo(best.leftover, 9);
          expect(choice.packs.reduce((n, p) => n + p.count, 0)).toBe(best.packs);
          expect(choice.total.minus(choice.leftover).toString()).toBe(new Decimal(q).toString());
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('shortfallToOrder', () => {
  it.each([
    ['0', RESIN, undefined, '', '0'],
    ['0', RESIN, 50, '', '0'], // nothing short, nothing ordered
    ['12', RESIN, undefined, '10×1 + 5×1', '3'],
    ['12', RESIN, 50, '25×2', '38'], // the reorder quantity rules; leftover beyond the shortfall
    ['60', RESIN, 50, '25×2 + 10×1', '0'], // the shortfall is above the reorder quantity
    ['0.3', CATALYST, '1', '1×1', '0.7'],
  ])('short %s, sizes %j, reorder %s → %s', (short, sizes, reorder, packs, leftover) => {
    const choice = shortfallToOrder(short, sizes, reorder);
    expect(show(choice)).toBe(packs);
    expect(choice.leftover.toString()).toBe(leftover);
  });

  it.each([
    ['-1', undefined],
    ['1', -1],
  ])('refuses shortfall %s with reorder %s', (short, reorder) => {
    expect(() => shortfallToOrder(short, RESIN, reorder)).toThrow(DomainError);
  });
});
