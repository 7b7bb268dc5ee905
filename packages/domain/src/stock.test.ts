import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import {
  allocateFefo,
  checkFlammablesCapacity,
  checkSegregation,
  checkStorageTemperature,
  countVariance,
  daysToExpiry,
  DEFAULT_SHELF_LIFE_DAYS,
  expiryDate,
  FefoLot,
  FLAMMABLES_WORKROOM_LIMIT_L,
  HazardClass,
  isExpired,
  ledgerBalance,
  lotUsableOn,
  Movement,
  movementDirection,
  MovementKind,
} from './stock';

// Dates are calendar days; run in a zone with summer time so a clock change is crossed.
const zone = process.env.TZ;
beforeAll(() => {
  process.env.TZ = 'Europe/London';
});
afterAll(() => {
  process.env.TZ = zone;
});

describe('expiryDate', () => {
  it.each([
    ['2025-01-01', DEFAULT_SHELF_LIFE_DAYS['base-resin'], '2025-04-01'], // 90 days: resin 3–6 months (common trade practice, no source)
    ['2025-01-01', DEFAULT_SHELF_LIFE_DAYS.catalyst, '2025-06-30'], // 180 days: catalyst 6–12 months (common trade practice, no source)
    ['2025-01-01', 0, '2025-01-01'],
    ['2024-02-28', 1, '2024-02-29'], // leap year
    ['2025-02-28', 1, '2025-03-01'],
    ['2025-12-31', 1, '2026-01-01'],
    ['2025-03-29', 2, '2025-03-31'], // across the clocks going forward
    ['2025-10-25', 2, '2025-10-27'], // across the clocks going back
    ['2025-01-01', '365', '2026-01-01'],
  ])('received %s, shelf life %s days → %s', (received, days, expires) => {
    expect(expiryDate(received, days)).toBe(expires);
  });

  it.each([
    ['2025-02-30', 10, /not a calendar date/],
    ['01/02/2025', 10, /YYYY-MM-DD/],
    ['2025-1-1', 10, /YYYY-MM-DD/],
    ['2025-01-01T00:00:00Z', 10, /YYYY-MM-DD/],
    ['2025-01-01', 1.5, /whole number/],
    ['2025-01-01', -1, /must not be negative/],
  ])('refuses %s + %s days', (received, days, message) => {
    expect(() => expiryDate(received, days)).toThrow(message);
  });

  it('refuses a date that is not a string', () => {
    expect(() => expiryDate(new Date() as unknown as string, 1)).toThrow(DomainError);
  });
});

describe('isExpired, daysToExpiry: usable on the expiry date, expired the day after', () => {
  it.each([
    ['2025-03-31', '2025-03-30', false, 1],
    ['2025-03-31', '2025-03-31', false, 0],
    ['2025-03-31', '2025-04-01', true, -1], // never used after expiry: classification-society rules for composite materials
    ['2025-03-31', '2025-03-29', false, 2], // across the clocks going forward
    ['2026-01-01', '2025-01-01', false, 365],
    ['2024-01-01', '2025-01-01', true, -366],
  ])('expires %s, on %s → expired %s, %i days left', (expires, on, expired, days) => {
    expect(isExpired(expires, on)).toBe(expired);
    expect(daysToExpiry(expires, on)).toBe(days);
  });
});

describe('lotUsableOn', () => {
  const lot = { expiresOn: '2025-03-31', usable: true };
  it.each([
    [lot, '2025-03-31', 0, true],
    [lot, '2025-03-31', 1, false],
    [lot, '2025-03-24', 7, true], // a week's margin ends on the expiry date
    [lot, '2025-03-24', 8, false],
    [lot, '2025-04-01', undefined, false],
    [{ ...lot, usable: false }, '2025-01-01', 0, false], // quarantined or temperature-flagged
  ])('%j on %s with %s days margin → %s', (l, date, margin, usable) => {
    expect(lotUsableOn(l, date, margin)).toBe(usable);
  });

  it('refuses a margin that is not a whole number of days', () => {
    expect(() => lotUsableOn(lot, '2025-03-01', 1.5)).toThrow(DomainError);
  });
});

describe('allocateFefo: first expired, first out, from usable lots in date', () => {
  const lots: FefoLot[] = [
    { id: 'A', quantity: 10, expiresOn: '2025-06-30', usable: true },
    { id: 'B', quantity: '5', expiresOn: '2025-05-31', usable: true },
    { id: 'C', quantity: 20, expiresOn: '2025-04-30', usable: false }, // quarantined
    { id: 'D', quantity: 8, expiresOn: '2025-03-31', usable: true }, // expired by mid-April
    { id: 'E', quantity: 0, expiresOn: '2025-07-01', usable: true },
  ];
  const skippedMidApril = [
    { lotId: 'C', reason: 'unusable' },
    { lotId: 'D', reason: 'expired' },
    { lotId: 'E', reason: 'empty' },
  ];

  it.each([
    ['0', '2025-04-15', [], '0'],
    ['3', '2025-04-15', [['B', '3']], '0'],
    ['12', '2025-04-15', [['B', '5'], ['A', '7']], '0'],
    ['15', '2025-04-15', [['B', '5'], ['A', '10']], '0'],
    ['20', '2025-04-15', [['B', '5'], ['A', '10']], '5'], // shortfall
    ['2.75', '2025-04-15', [['B', '2.75']], '0'],
  ])('%s on %s', (quantity, useBy, expected, shortfall) => {
    const result = allocateFefo(lots, quantity, useBy);
    expect(result.allocations.map((a) => [a.lotId, a.quantity.toString()])).toEqual(expected);
    expect(result.shortfall.toString()).toBe(shortfall);
    expect(result.skipped).toEqual(skippedMidApril);
  });

  it('takes a lot on its expiry date, oldest first', () => {
    const result = allocateFefo(lots, 10, '2025-03-31');
    expect(result.allocations.map((a) => [a.lotId, a.quantity.toString()])).toEqual([
      ['D', '8'],
      ['B', '2'],
    ]);
  });

  it('keeps the order given for lots with the same expiry', () => {
    const same: FefoLot[] = [
      { id: 'second', quantity: 1, expiresOn: '2025-05-01', usable: true },
      { id: 'first', quantity: 1, expiresOn: '2025-05-01', usable: true },
    ];
    expect(allocateFefo(same, 1, '2025-04-01').allocations[0]?.lotId).toBe('second');
  });

  it.each<[FefoLot[], string, string, RegExp]>([
    [[lots[0]!, lots[0]!], '1', '2025-04-01', /listed twice/],
    [lots, '-1', '2025-04-01', /must not be negative/],
    [lots, '1', '15/04/2025', /useBy/],
    [[{ id: 'X', quantity: -1, expiresOn: '2025-05-01', usable: true }], '1', '2025-04-01', /quantity of lot X/],
    [[{ id: 'X', quantity: 1, expiresOn: '2025-13-01', usable: true }], '1', '2025-04-01', /expiresOn of lot X/],
  ])('refuses %j', (l, quantity, useBy, message) => {
    expect(() => allocateFefo(l, quantity, useBy)).toThrow(message);
  });

  const day = fc.integer({ min: 0, max: 60 }).map((n) => expiryDate('2025-01-01', n));
  const lotArb = fc.record({
    quantity: fc.integer({ min: 0, max: 5000 }).map((n) => new Decimal(n).div(100)),
    expiresOn: day,
    usable: fc.boolean(),
  });

  it('never takes more than a lot holds, nor from a lot it may not use (property)', () => {
    fc.assert(
      fc.property(
        fc.array(lotArb, { maxLength: 10 }),
        fc.integer({ min: 0, max: 20000 }).map((n) => new Decimal(n).div(100)),
        day,
        (raw, quantity, useBy) => {
          const ls: FefoLot[] = raw.map((l, i) => ({ ...l, id: `L${i}` }));
          const result = allocateFefo(ls, quantity, useBy);
          const byId = new Map(ls.map((l) => [l.id, l]));
          let taken = new Decimal(0);
          let lastExpiry = '';
          for (const a of result.allocations) {
            const lot = byId.get(a.lotId)!;
            expect(a.quantity.gt(0)).toBe(true);
            expect(a.quantity.lte(lot.quantity)).toBe(true);
            expect(lotUsableOn(lot, useBy)).toBe(true);
            expect(lot.expiresOn >= lastExpiry).toBe(true);
            lastExpiry = lot.expiresOn;
            taken = taken.plus(a.quantity);
          }
          expect(taken.plus(result.shortfall).eq(quantity)).toBe(true);
          const available = ls
            .filter((l) => lotUsableOn(l, useBy))
            .reduce((s, l) => s.plus(l.quantity), new Decimal(0));
          expect(result.shortfall.eq(Decimal.max(new Decimal(quantity).minus(available), 0))).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('checkSegregation: organic peroxide apart from flammables (HSE CS21; NFPA 432, now NFPA 400)', () => {
  it.each<[HazardClass, HazardClass[], boolean, HazardClass[]]>([
    ['5.2', [], true, []],
    ['5.2', ['3'], false, ['3']], // catalyst into a flammables store: HSE CS21; NFPA 400
    ['3', ['5.2'], false, ['5.2']], // and the reverse: HSE CS21; NFPA 400
    ['5.2', ['3', '3', '5.2', '8'], false, ['3']],
    ['5.2', ['5.2', 'none'], true, []],
    ['3', ['3', '8', '2'], true, []],
    ['none', ['3', '5.2'], true, []],
  ])('class %s where %j are stored → ok %s', (lot, present, ok, conflicts) => {
    const check = checkSegregation(lot, present);
    expect(check.ok).toBe(ok);
    expect(check.conflictsWith).toEqual(conflicts);
    if (!ok) {
      expect(check.message).toContain('HSE CS21');
      expect(check.message).toContain('NFPA 400');
      expect(check.message).toContain('7.6 m (25 ft)'); // NFPA 432 (now NFPA 400)
      expect(check.message).toMatch(/safety data sheet, local codes and licensed practice\.$/);
    }
  });

  it('takes rules as data', () => {
    const rules = [{ classes: ['5.1', '3'] as const, reason: 'keep oxidisers apart.' }];
    expect(checkSegregation('3', ['5.1'], rules).message).toBe('A class 3 lot cannot go where class 5.1 is stored: keep oxidisers apart.');
    expect(checkSegregation('5.2', ['3'], rules).ok).toBe(true);
  });

  it.each([
    ['7', []],
    ['3', ['flammable']],
  ])('refuses the unknown class in %s / %j', (lot, present) => {
    expect(() => checkSegregation(lot as HazardClass, present as HazardClass[])).toThrow(/not a known hazard class/);
  });
});

describe('checkFlammablesCapacity (50 L in a workroom: HSE HSG51; warning from 90 %: Potlife’s own, no source)', () => {
  it('defaults to the 50 L of HSE HSG51', () => {
    expect(FLAMMABLES_WORKROOM_LIMIT_L).toBe(50);
  });

  it.each([
    ['0', '10', undefined, 'ok', '10'],
    ['0', '0', undefined, 'ok', '0'],
    ['40', '4.99', undefined, 'ok', '44.99'],
    ['40', '5', undefined, 'warning', '45'], // 90 % of 50 L: Potlife's own warning, no source
    ['45', '5', undefined, 'warning', '50'], // exactly full: 50 L, HSE HSG51
    ['45', '5.01', undefined, 'refused', '50.01'], // over 50 L: HSE HSG51
    ['20', '7', '30', 'warning', '27'], // a smaller cabinet
    ['20', '11', '30', 'refused', '31'],
  ])('%s L + %s L in a %s L cabinet → %s', (current, add, capacity, level, total) => {
    const check = checkFlammablesCapacity(current, add, capacity);
    expect(check.level).toBe(level);
    expect(check.totalLitres.toString()).toBe(total);
    if (level !== 'ok') {
      expect(check.message).toContain('HSE HSG51');
      expect(check.message).toContain('50 L');
    }
  });

  it.each([
    ['-1', '1', 50],
    ['1', '-1', 50],
    ['1', '1', 0],
  ])('refuses %s + %s in %s', (current, add, capacity) => {
    expect(() => checkFlammablesCapacity(current, add, capacity)).toThrow(DomainError);
  });
});

describe('checkStorageTemperature (resin, topcoat, catalyst at ≤ 25 °C: common trade practice, no source)', () => {
  it.each([
    ['20', 5, 25, true, 'none'],
    ['25', 5, 25, true, 'none'], // ≤ 25 °C: common trade practice, no source
    ['5', 5, 25, true, 'none'],
    ['25.1', 5, 25, false, 'too-warm'],
    ['4.9', 5, 25, false, 'too-cold'],
    ['-2', '-5', 0, true, 'none'],
  ])('%s °C in %s–%s °C → ok %s (%s)', (reading, min, max, ok, exposure) => {
    const check = checkStorageTemperature(reading, min, max);
    expect(check.ok).toBe(ok);
    expect(check.exposure).toBe(exposure);
    if (!ok) {
      expect(check.message).toContain('check before use');
    }
  });

  it('refuses a range upside down', () => {
    expect(() => checkStorageTemperature(20, 25, 5)).toThrow(/above the highest/);
  });
});

describe('ledgerBalance', () => {
  it.each<[string, Movement[], string]>([
    ['an empty ledger', [], '0'],
    ['receipt then issue', [{ kind: 'receipt', quantity: 10 }, { kind: 'issue', quantity: -4 }], '6'],
    ['everything issued', [{ kind: 'receipt', quantity: 10 }, { kind: 'issue', quantity: -10 }], '0'],
    [
      'every kind',
      [
        { kind: 'receipt', quantity: '25' },
        { kind: 'issue', quantity: '-20' },
        { kind: 'return', quantity: '2.5' },
        { kind: 'transfer', quantity: '-5' },
        { kind: 'transfer', quantity: '1' },
        { kind: 'adjustment', quantity: '-0.5' },
        { kind: 'adjustment', quantity: '0.25' },
        { kind: 'write-off', quantity: '-1.25' },
      ],
      '2',
    ],
    ['decimals stay exact', [{ kind: 'receipt', quantity: 0.1 }, { kind: 'receipt', quantity: 0.2 }, { kind: 'issue', quantity: -0.3 }], '0'],
  ])('%s → %s', (_name, movements, balance) => {
    expect(ledgerBalance(movements).toString()).toBe(balance);
  });

  it.each<[string, Movement[], RegExp, string]>([
    ['issue before receipt', [{ kind: 'issue', quantity: -1 }], /balance to -1/, 'negative-balance'],
    ['more issued than held', [{ kind: 'receipt', quantity: 10 }, { kind: 'issue', quantity: '-10.01' }], /not that much in stock/, 'negative-balance'],
    ['a negative receipt', [{ kind: 'receipt', quantity: -1 }], /adds to stock/, 'invalid-input'],
    ['a positive issue', [{ kind: 'receipt', quantity: 5 }, { kind: 'issue', quantity: 1 }], /takes from stock/, 'invalid-input'],
    ['a positive write-off', [{ kind: 'write-off', quantity: 1 }], /takes from stock/, 'invalid-input'],
    ['a movement of zero', [{ kind: 'adjustment', quantity: 0 }], /moves nothing/, 'invalid-input'],
    ['an unknown kind', [{ kind: 'gift' as MovementKind, quantity: 1 }], /Unknown movement kind/, 'invalid-input'],
  ])('refuses %s', (_name, movements, message, code) => {
    expect(() => ledgerBalance(movements)).toThrow(message);
    try {
      ledgerBalance(movements);
    } catch (e) {
      expect((e as DomainError).code).toBe(code);
    }
  });

  it.each<[MovementKind, string]>([
    ['receipt', 'in'],
    ['return', 'in'],
    ['issue', 'out'],
    ['write-off', 'out'],
    ['transfer', 'either'],
    ['adjustment', 'either'],
  ])('a %s goes %s', (kind, direction) => {
    expect(movementDirection(kind)).toBe(direction);
  });
});

describe('countVariance', () => {
  it.each([
    ['10', '10', '5', 'match', '0', '0'],
    ['10', '12', '2.5', 'surplus', '2', '5'],
    ['10', '7.5', '3.333', 'loss', '-2.5', '-8.33'], // −8.3325
    ['0', '1', '0.005', 'surplus', '1', '0.01'], // half a penny rounds up
    ['1', '0', '0.005', 'loss', '-1', '-0.01'], // and away from zero for a loss
    ['0', '0', '0', 'match', '0', '0'],
    ['20', '19.75', '4.2', 'loss', '-0.25', '-1.05'], // kg of resin
  ])('expected %s, counted %s at £%s → %s', (expected, counted, cost, kind, quantity, value) => {
    const v = countVariance(expected, counted, cost);
    expect(v.kind).toBe(kind);
    expect(v.varianceQuantity.toString()).toBe(quantity);
    expect(v.varianceValue.toString()).toBe(value);
  });

  it.each([
    ['-1', '0', '1'],
    ['1', '-1', '1'],
    ['1', '1', '-1'],
  ])('refuses expected %s, counted %s at %s', (expected, counted, cost) => {
    expect(() => countVariance(expected, counted, cost)).toThrow(DomainError);
  });
});
