import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import {
  glassWeightFraction,
  gsmToKgPerM2,
  laminateThicknessMm,
  matAreaForDeck,
  resinForMat,
  trimLengthsForRun,
} from './takeoff';

describe('trimLengthsForRun (3 m lengths, 50 mm lap: common trade practice, no source)', () => {
  it.each([
    ['0', 0], // 0 m needs nothing
    ['0.01', 1],
    ['0.05', 1], // shorter than the lap still takes one length
    ['3', 1], // one whole length
    ['3.0001', 2],
    ['5.95', 2], // 2·3 − 1·0.05
    ['5.9501', 3],
    ['8.9', 3], // 3·3 − 2·0.05
    ['8.91', 4],
    ['100', 34], // ⌈99.95 / 2.95⌉
    [new Decimal('29.55'), 10], // 10·3 − 9·0.05
    [12, 5], // a plain number
  ])('%s m → %i lengths', (run, n) => {
    expect(trimLengthsForRun(run)).toBe(n);
  });

  it.each([
    [{ lengthM: 2.5, lapM: 0.1 }, '4.9', 2], // 2·2.5 − 0.1
    [{ lengthM: 2.5, lapM: 0.1 }, '4.91', 3],
    [{ lapM: 0 }, '6', 2], // butt-jointed lengths
    [{ lapM: 0 }, '6.01', 3],
    [{ lengthM: '3000', lapM: '50' }, '5950', 2], // the same rule in millimetres
  ])('with %o, %s → %i', (opts, run, n) => {
    expect(trimLengthsForRun(run, opts)).toBe(n);
  });

  it.each([
    ['-1', {}, /must not be negative/],
    ['1', { lengthM: 0 }, /more than zero/],
    ['1', { lapM: -0.05 }, /must not be negative/],
    ['1', { lengthM: 3, lapM: 3 }, /shorter than the trim length/],
    ['x', {}, /must be a number/],
  ])('refuses run %s with %o', (run, opts, message) => {
    expect(() => trimLengthsForRun(run, opts)).toThrow(DomainError);
    expect(() => trimLengthsForRun(run, opts)).toThrow(message);
  });
});

describe('trimLengthsForRun against its definition', () => {
  it('is the fewest lengths n with n·L − (n−1)·lap ≥ run (property)', () => {
    const mm = (min: number, max: number) => fc.integer({ min, max }).map((n) => new Decimal(n).div(1000));
    fc.assert(
      fc.property(mm(0, 60000), mm(500, 6000), mm(0, 200), (run, length, lap) => {
        const n = trimLengthsForRun(run, { lengthM: length, lapM: lap });
        const covers = (k: number): boolean => length.times(k).minus(lap.times(k - 1)).gte(run);
        if (run.isZero()) {
          expect(n).toBe(0);
          return;
        }
        expect(covers(n)).toBe(true);
        expect(n === 1 || !covers(n - 1)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('matAreaForDeck: area × layers × w / (w − lap) × (1 + wastage)', () => {
  it.each([
    ['0', { rollWidthM: 1 }, '0'],
    ['100', { rollWidthM: 1.04, lapM: 0.04 }, '104'], // 1.04 m roll, 40 mm lap: exact
    ['100', { rollWidthM: 1.05, wastagePct: 10 }, '115.5'], // default 50 mm lap; 10 % wastage (common trade practice, no source)
    ['100', { rollWidthM: 1.05, layers: 2 }, '210'],
    ['100', { rollWidthM: 1, lapM: 0 }, '100'],
    ['20.75', { rollWidthM: '1.25', lapM: '0.05', layers: '1', wastagePct: '12.5' }, '24.31640625'],
  ])('%s m² with %o → %s m²', (area, opts, expected) => {
    expect(matAreaForDeck(area, opts).toString()).toBe(expected);
  });

  it('keeps full precision for a 1 m roll with a 50 mm lap (100 / 0.95)', () => {
    expect(matAreaForDeck(100, { rollWidthM: 1 }).toDecimalPlaces(6).toString()).toBe('105.263158');
  });

  it.each([
    ['-1', { rollWidthM: 1 }, /must not be negative/],
    ['10', { rollWidthM: 0 }, /more than zero/],
    ['10', { rollWidthM: 1, lapM: 1 }, /narrower than the roll/],
    ['10', { rollWidthM: 1, layers: 1.5 }, /whole number/],
    ['10', { rollWidthM: 1, layers: 0 }, /more than zero/],
    ['10', { rollWidthM: 1, wastagePct: -1 }, /must not be negative/],
  ])('refuses %s m² with %o', (area, opts, message) => {
    expect(() => matAreaForDeck(area, opts)).toThrow(message);
  });
});

describe('resinForMat: m² × g/m² / 1000 × ratio', () => {
  it.each([
    ['1', 450, 2.5, '1.125'], // TRADE.md arithmetic: 450 g at 2.5:1 → 1.125 kg/m² (ratio: common trade practice, no source)
    ['0', 450, 2.5, '0'],
    ['100', 600, 2, '120'],
    ['10', 300, 3, '9'],
    ['105.263157894736842105263157894736842105', 450, 2.5, '118.4210526315789473684210526315789473681'],
  ])('%s m² of %s g mat at %s:1 → %s kg', (m2, gsm, ratio, kg) => {
    expect(resinForMat(m2, gsm, ratio).toString()).toBe(kg);
  });

  it.each([
    ['-1', 450, 2.5],
    ['1', 0, 2.5],
    ['1', 450, 0],
    ['1', 450, -2],
  ])('refuses %s m², %s g, %s:1', (m2, gsm, ratio) => {
    expect(() => resinForMat(m2, gsm, ratio)).toThrow(DomainError);
  });
});

describe('unit conversions', () => {
  it.each([
    [450, '0.45'],
    [300, '0.3'],
    [600, '0.6'],
    [0, '0'],
  ])('%s g/m² = %s kg/m²', (gsm, kg) => {
    expect(gsmToKgPerM2(gsm).toString()).toBe(kg);
  });

  it.each([
    [3, '0.25'], // 3:1 → glass 25 % (common trade practice, no source)
    [2, '0.3333'], // 2:1 → glass 33 % (common trade practice, no source)
    [2.5, '0.2857'],
    [0, '1'],
  ])('resin-to-glass %s:1 → glass weight fraction %s', (ratio, fraction) => {
    expect(glassWeightFraction(ratio).toDecimalPlaces(4).toString()).toBe(fraction);
  });

  it('refuses a negative ratio', () => {
    expect(() => glassWeightFraction(-1)).toThrow(DomainError);
  });
});

describe('laminateThicknessMm: rule of mixtures as in ISO 12215-5 Annex C (ρg 2.56, ρr 1.2 g/cm³ from memory)', () => {
  it.each([
    [450, '0.3', '1.05078125'], // 0.45 · (1/2.56 + (1/0.3 − 1)/1.2)
    [450, '1', '0.17578125'], // all glass: 0.45 / 2.56
    [600, new Decimal(1).div(3.5), '1.484375'], // 600 g at 2.5:1
    [300, '0.25', '0.8671875'], // 0.3 · (1/2.56 + 3/1.2)
  ])('%s g/m² at glass fraction %s → %s mm', (gsm, psi, mm) => {
    expect(laminateThicknessMm(gsm, psi).toDecimalPlaces(10).toString()).toBe(mm);
  });

  it('gives about 1 mm for one layer of 450 g mat at 30 % glass (from memory)', () => {
    expect(laminateThicknessMm(450, 0.3).toNumber()).toBeCloseTo(1, 0);
  });

  it.each([
    [450, 0, /more than zero/],
    [450, 30, /30 % is 0.3/], // a percentage given where a fraction belongs
    [0, 0.3, /more than zero/],
  ])('refuses %s g/m² at %s', (gsm, psi, message) => {
    expect(() => laminateThicknessMm(gsm, psi)).toThrow(message);
  });
});
