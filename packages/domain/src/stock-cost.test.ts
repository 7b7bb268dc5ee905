import { describe, expect, it } from 'vitest';
import { DomainError } from './errors';
import { costFromStock, CostedLot } from './stock-cost';

// The rule itself (use what the job can take from stock at what it cost, buy only the rest):
// common trade practice, no source. The numbers are worked by hand below each case.
const lot = (id: string, quantity: string, expiresOn: string, unitCost: string, usable = true): CostedLot => ({
  id,
  quantity,
  expiresOn,
  unitCost,
  usable,
});

const RESIN_PACKS = ['25', '5'];

describe('costFromStock: FEFO stock at lot cost, the remainder in packs', () => {
  it.each([
    {
      name: 'no stock: everything bought',
      lots: [] as CostedLot[],
      need: '37.3',
      parts: '',
      stock: '0',
      remainder: '37.3',
      packs: '25×1 + 5×3', // 37.3 → 40 kg: 25 + 5 + 5 + 5 (least leftover, then fewest packs)
    },
    {
      // hand-worked: 20 kg of lot B (expires first) at 3.40 = 68.00; 10 kg of lot A at 3.10 = 31.00;
      // 37.3 − 30 = 7.3 kg to buy → 10 kg (5 × 2: no 10 kg pack; 25 leaves more)
      name: 'two lots, earliest expiry first, the rest bought',
      lots: [lot('A', '10', '2027-06-30', '3.10'), lot('B', '20', '2027-03-31', '3.40')],
      need: '37.3',
      parts: 'B:20@3.4=68 A:10@3.1=31',
      stock: '30',
      remainder: '7.3',
      packs: '5×2',
    },
    {
      // hand-worked: 12.5 kg × 3.1234 = 39.0425 → £39.04; nothing to buy
      name: 'stock covers the need: nothing bought',
      lots: [lot('A', '50', '2027-06-30', '3.1234')],
      need: '12.5',
      parts: 'A:12.5@3.1234=39.04',
      stock: '12.5',
      remainder: '0',
      packs: null,
    },
    {
      // the flagged lot and the lot expiring before the use-by date are passed over
      name: 'flagged and out-of-date lots are not offered',
      lots: [lot('X', '100', '2027-06-30', '1', false), lot('Y', '100', '2026-12-01', '1'), lot('Z', '4', '2027-06-30', '2.5')],
      need: '10',
      parts: 'Z:4@2.5=10',
      stock: '4',
      remainder: '6',
      packs: '5×2', // 6 → 10 kg in 5 kg tins
    },
    {
      name: 'no pack sizes: the remainder stays without packs',
      lots: [lot('A', '1', '2027-06-30', '2')],
      need: '3',
      parts: 'A:1@2=2',
      stock: '1',
      remainder: '2',
      packs: null,
      sizes: [] as string[],
    },
  ])('$name', ({ lots, need, parts, stock, remainder, packs, sizes }) => {
    const split = costFromStock(lots, need, '2026-12-15', sizes ?? RESIN_PACKS);
    expect(
      split.fromStock
        .map((p) => `${p.lotId}:${p.quantity.toString()}@${p.unitCost.toString()}=${p.cost.toString()}`)
        .join(' '),
    ).toBe(parts);
    expect(split.stockQuantity.toString()).toBe(stock);
    expect(split.remainder.toString()).toBe(remainder);
    expect(split.packs ? split.packs.packs.map((p) => `${p.size.toString()}×${p.count}`).join(' + ') : null).toBe(packs);
  });

  it('refuses a negative need or lot cost', () => {
    expect(() => costFromStock([], '-1', '2026-12-15', RESIN_PACKS)).toThrow(DomainError);
    expect(() => costFromStock([lot('A', '1', '2027-01-01', '-2')], '1', '2026-12-15', RESIN_PACKS)).toThrow(
      /unitCost of lot A/,
    );
  });
});
