import { describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import { estimateRoof } from './estimate';
import { packsForEstimate, priceEstimate, PricedLine } from './price';

describe('priceEstimate: rounded to the penny, half up, once at the end', () => {
  it.each<[string, PricedLine[], string, string, string, string | undefined, string[]]>([
    // lines, hours, rate, markup %, VAT % → material, labour, markup, net, vat, gross
    ['nothing', [], '0', '0', '0', undefined, ['0', '0', '0', '0', '0', '0']],
    [
      'a small job',
      [
        { quantity: 10, unitCost: '2.5' },
        { quantity: '0.333', unitCost: 3 },
      ],
      '9.7',
      '30',
      '20',
      undefined, // VAT at the UK standard rate of 20 % (HMRC)
      ['26', '291', '63.4', '380.4', '76.08', '456.48'], // 25.999 → 26.00; markup 20 % of 316.999 = 63.3998
    ],
    [
      'sub-penny lines summed before rounding',
      [
        { quantity: 1, unitCost: '0.004' },
        { quantity: 1, unitCost: '0.004' },
        { quantity: 1, unitCost: '0.004' },
      ],
      '0',
      '0',
      '0',
      '20',
      ['0.01', '0', '0', '0.01', '0', '0.01'], // 0.012 → 0.01, where rounding each line would give 0
    ],
    [
      'VAT rounded down on the invoice total',
      [{ quantity: 1, unitCost: '10.99' }],
      '0',
      '0',
      '0',
      '20',
      ['10.99', '0', '0', '10.99', '2.19', '13.18'], // HMRC VAT Notice 700 §17.5: 2.198 → 2.19
    ],
    [
      'half a penny of markup rounds up',
      [{ quantity: 1, unitCost: '0.1' }],
      '0',
      '0',
      '5',
      '0',
      ['0.1', '0', '0.01', '0.11', '0', '0.11'], // 0.005 → 0.01
    ],
    [
      'zero-rated',
      [{ quantity: 2, unitCost: 50 }],
      '1.5',
      '28.5',
      '15',
      '0',
      ['100', '42.75', '21.41', '164.16', '0', '164.16'], // 15 % of 142.75 = 21.4125
    ],
  ])('%s', (_name, lines, hours, rate, markup, vat, expected) => {
    const p = priceEstimate(lines, hours, rate, markup, vat);
    expect([p.materialCost, p.labourCost, p.markup, p.net, p.vat, p.gross].map((d) => d.toString())).toEqual(expected);
    expect(p.net.eq(p.materialCost.plus(p.labourCost).plus(p.markup))).toBe(true);
    expect(p.gross.eq(p.net.plus(p.vat))).toBe(true);
  });

  it('prices the lines of an estimate', () => {
    const e = estimateRoof({ areas: [{ name: 'Deck', lengthM: 5, widthM: 4 }], edges: [] });
    const cost: Record<string, string> = { mat: '1.2', 'base-resin': '3.1', topcoat: '5.6', catalyst: '12', acetone: '2.4' };
    const lines = e.lines.map((l) => ({ ...l, unitCost: cost[l.role] ?? '0' }));
    const p = priceEstimate(lines, e.labour.totalHours, '32.5', '25');
    // mat 23.157895 m² × 1.2 + resin 26.052632 kg × 3.1 + topcoat 10 kg × 5.6 + catalyst 0.721053 kg × 12 + acetone 1 L × 2.4
    expect(p.materialCost.toString()).toBe('175.61'); // 175.605264
    expect(p.net.decimalPlaces()).toBeLessThanOrEqual(2);
  });

  it.each<[PricedLine[], string, string, string, RegExp]>([
    [[{ quantity: 1, unitCost: -1 }], '0', '0', '0', /unitCost of line 1/],
    [[{ quantity: -1, unitCost: 1 }], '0', '0', '0', /quantity of line 1/],
    [[], '-1', '30', '0', /labour hours/],
    [[], '1', '-30', '0', /labour rate/],
    [[], '1', '30', '-5', /markup/],
  ])('refuses %j with %s h at %s, markup %s', (lines, hours, rate, markup, message) => {
    expect(() => priceEstimate(lines, hours, rate, markup)).toThrow(DomainError);
    expect(() => priceEstimate(lines, hours, rate, markup)).toThrow(message);
  });
});

describe('packsForEstimate', () => {
  const e = estimateRoof({
    areas: [{ name: 'Garage', lengthM: 5, widthM: 4 }],
    edges: [
      { kind: 'drip', lengthM: 5 },
      { kind: 'kerb', lengthM: 4 },
      { kind: 'drip', lengthM: 5 },
      { kind: 'kerb', lengthM: 4 },
    ],
  });

  it('sums base resin for the deck and the bandage, and picks packs (common trade practice, no source)', () => {
    const packs = packsForEstimate(e);
    expect(
      packs.map((p) => [p.material, p.unit, p.quantity.toDecimalPlaces(4).toString(), p.packs.map((x) => `${x.size.toString()}×${x.count}`).join(' + '), p.leftover.toDecimalPlaces(4).toString()]),
    ).toEqual([
      ['base-resin', 'kg', '28.6761', '25×1 + 5×1', '1.3239'], // 26.052632 + 2.6235 kg
      ['topcoat', 'kg', '10', '10×1', '0'],
      ['catalyst', 'kg', '0.7735', '1×1', '0.2265'],
    ]);
  });

  it('takes the pack sizes as data', () => {
    const packs = packsForEstimate(e, { acetone: [1, 5], bandage: [new Decimal(50)] });
    expect(packs.map((p) => [p.material, p.total.toString()])).toEqual([
      ['bandage', '50'],
      ['acetone', '1'],
    ]);
  });
});
