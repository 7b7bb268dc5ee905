import { describe, expect, it } from 'vitest';
import { DomainError } from './errors';
import {
  catalystPercent,
  checkFall,
  checkLayingConditions,
  dewPointC,
  DEFAULT_LAYING_RULES,
  slopeCategory,
  workingTimeHint,
} from './laying';

describe('dewPointC: WMO-No. 8 Magnus formula, a = 17.62, b = 243.12 °C', () => {
  it.each([
    [20, 50, 9.3], // tabulated dew point, from memory
    [25, 60, 16.7], // tabulated dew point, from memory
    [10, 80, 6.7], // tabulated dew point, from memory
    [30, 70, 23.9], // tabulated dew point, from memory
    [15, 40, 1.5], // tabulated dew point, from memory
    [35, 30, 14.8], // tabulated dew point, from memory
  ])('%s °C at %s %% RH → about %s °C', (t, rh, td) => {
    expect(Math.abs(dewPointC(t, rh).toNumber() - td)).toBeLessThan(0.1);
  });

  it.each([
    ['20', '50', '9.255'], // WMO-No. 8 Magnus formula, worked by hand
    ['-10', '80', '-12.797'],
    ['0', '100', '0'],
  ])('%s °C at %s %% → %s °C (3 places)', (t, rh, td) => {
    expect(dewPointC(t, rh).toDecimalPlaces(3).toString()).toBe(td);
  });

  it.each([[-20], [0], [10], [33.3], [60]])('at 100 %% RH the dew point is the air temperature (%s °C)', (t) => {
    expect(dewPointC(t, 100).toDecimalPlaces(20).toNumber()).toBe(t);
  });

  it.each([
    [20, 0, /more than zero/],
    [20, -5, /more than zero/],
    [20, 100.1, /above 100/],
    [-45.1, 50, /from -45 to 60/], // range of the formula over water, WMO-No. 8 (range from memory)
    [60.1, 50, /from -45 to 60/],
  ])('refuses %s °C at %s %%', (t, rh, message) => {
    expect(() => dewPointC(t, rh)).toThrow(message);
  });
});

describe('checkLayingConditions (5 °C minimum and ≤ 85 % RH: common trade practice, no source; dew point + 3 K: ISO 8502-4, ISO 12944-7)', () => {
  const fine = { airC: 15, surfaceC: 12, relativeHumidityPct: 60, raining: false };

  it.each([
    ['a fine day', {}, []],
    ['air exactly 5 °C', { airC: 5, surfaceC: 8, relativeHumidityPct: 40 }, []], // 5 °C minimum: common trade practice, no source
    ['air 4.9 °C', { airC: 4.9, surfaceC: 8, relativeHumidityPct: 40 }, ['air is 4.9 °C']],
    ['deck exactly 5 °C', { airC: 8, surfaceC: 5, relativeHumidityPct: 30 }, []],
    ['deck 4.9 °C', { airC: 8, surfaceC: 4.9, relativeHumidityPct: 30 }, ['deck is 4.9 °C']],
    ['humidity exactly 85 %', { airC: 20, surfaceC: 25, relativeHumidityPct: 85 }, []], // ≤ 85 %: common trade practice, no source (as used with ISO 12944-7)
    ['humidity 85.1 %', { airC: 20, surfaceC: 25, relativeHumidityPct: 85.1 }, ['humidity is 85.1 %']],
    ['rain', { raining: true }, ['raining']],
    ['deck close to the dew point', { airC: 15, surfaceC: 9, relativeHumidityPct: 60 }, ['above the dew point (7.3 °C)']],
    [
      'a cold wet morning',
      { airC: 3, surfaceC: 1, relativeHumidityPct: 95, raining: true },
      ['raining', 'air is 3 °C', 'deck is 1 °C', 'dew point', 'humidity is 95 %'],
    ],
  ])('%s', (_name, change, expected) => {
    const result = checkLayingConditions({ ...fine, ...change });
    expect(result.ok).toBe(expected.length === 0);
    expect(result.problems).toHaveLength(expected.length);
    expected.forEach((fragment, i) => expect(result.problems[i]).toContain(fragment));
  });

  it.each([
    [13, true], // deck exactly 3 K above a dew point of 10 °C: ISO 8502-4, ISO 12944-7
    [12.99, false],
  ])('at 100 %% RH (dew point = air 10 °C) a deck of %s °C is ok: %s', (deck, ok) => {
    const rules = { ...DEFAULT_LAYING_RULES, maxRelativeHumidityPct: 100 };
    const result = checkLayingConditions({ airC: 10, surfaceC: deck, relativeHumidityPct: 100, raining: false }, rules);
    expect(result.ok).toBe(ok);
    expect(result.dewPointC.toString()).toBe('10');
  });

  it('writes sentences a crew understands', () => {
    const { problems } = checkLayingConditions({ airC: 4, surfaceC: 6, relativeHumidityPct: 50, raining: false });
    expect(problems).toEqual(['The air is 4 °C; resin needs at least 5 °C to cure. Wait until it is warmer.']);
  });

  it('refuses a humidity reading that is not a number', () => {
    expect(() => checkLayingConditions({ ...fine, relativeHumidityPct: 'damp' })).toThrow(DomainError);
  });
});

describe('catalystPercent (1–4 %, ~3 % cold, 2 % at 20 °C, ~1 % hot: common trade practice, no source)', () => {
  it.each([
    [5, '3'], // ~3 % cold: common trade practice, no source
    [9.99, '3'],
    [10, '2.5'],
    [14.9, '2.5'],
    [15, '2'],
    [20, '2'], // 2 % at 20 °C: common trade practice, no source
    [24.99, '2'],
    [25, '1.5'],
    [30, '1'], // ~1 % hot: common trade practice, no source
    [40, '1'],
    ['20', '2'],
  ])('%s °C → %s %%', (t, pct) => {
    expect(catalystPercent(t).toString()).toBe(pct);
  });

  it.each([[4.99], [0], [-5]])('refuses %s °C as too cold to lay', (t) => {
    expect(() => catalystPercent(t)).toThrow(/below the 5 °C minimum/);
    try {
      catalystPercent(t);
    } catch (e) {
      expect((e as DomainError).code).toBe('too-cold');
    }
  });

  it.each([
    [[{ fromC: 0, percent: 4 }], 6, '4'],
    [[{ fromC: 8, percent: 3 }, { fromC: 18, percent: '1.8' }], 18, '1.8'],
  ])('custom bands %j at %s °C → %s %%', (bands, t, pct) => {
    expect(catalystPercent(t, bands).toString()).toBe(pct);
  });

  it.each([
    [[{ fromC: 0, percent: 4 }], 3, /5 °C minimum/], // bands may not lower the minimum laying temperature
    [[{ fromC: 8, percent: 3 }], 7, /8 °C minimum/], // nor may the air be below the first band
    [[], 20, /empty/],
    [[{ fromC: 5, percent: 0.5 }], 20, /between 1 % and 4 %/],
    [[{ fromC: 5, percent: 4.5 }], 20, /between 1 % and 4 %/],
    [[{ fromC: 10, percent: 2 }, { fromC: 10, percent: 1 }], 20, /rising order/],
  ])('refuses bands %j at %s °C', (bands, t, message) => {
    expect(() => catalystPercent(t, bands)).toThrow(message);
  });
});

describe('checkFall: BS 6229:2018, design fall 1:40, finished fall at least 1:80', () => {
  it.each([
    [1, 40, 'ok', '1:40'], // design fall 1:40: BS 6229:2018
    [1, 39, 'ok', '1:39'],
    [1, 20, 'ok', '1:20'],
    [25, 1000, 'ok', '1:40'], // 25 mm in 1 m: the same units for rise and run
    [1, 40.01, 'warning', '1:40'],
    [1, 60, 'warning', '1:60'],
    [12.5, 1000, 'warning', '1:80'], // exactly 1:80 still warns: BS 6229:2018 finished fall
    [1, 80.01, 'error', '1:80'], // flatter than 1:80: BS 6229:2018
    [1, 120, 'error', '1:120'],
    [0, 10, 'error', 'level'],
  ])('rise %s in %s → %s', (rise, run, level, fragment) => {
    const check = checkFall(rise, run);
    expect(check.level).toBe(level);
    expect(check.message).toContain(fragment);
    expect(check.message).toContain('BS 6229:2018');
  });

  it.each([
    [1, 0],
    [1, -40],
    [-1, 40],
  ])('refuses rise %s in %s', (rise, run) => {
    expect(() => checkFall(rise, run)).toThrow(DomainError);
  });
});

describe('slopeCategory: ETAG 005 S1 < 5 %, S2 5–10 %, S3 10–30 %, S4 > 30 % (middle bands from memory)', () => {
  it.each([
    [0, 100, 'S1'],
    [4.99, 100, 'S1'],
    [5, 100, 'S2'], // ETAG 005 (middle bands from memory)
    [9.99, 100, 'S2'],
    [10, 100, 'S3'],
    [30, 100, 'S3'],
    [30.01, 100, 'S4'],
    [1, 40, 'S1'], // 1:40 is 2.5 %
  ])('rise %s in %s → %s', (rise, run, category) => {
    expect(slopeCategory(rise, run)).toBe(category);
  });

  it('refuses a run of zero', () => {
    expect(() => slopeCategory(1, 0)).toThrow(DomainError);
  });
});

describe('workingTimeHint (rough pot life by temperature: common trade practice, no source)', () => {
  it.each([
    [5, 25, 40],
    [12, 20, 30],
    [20, 15, 25],
    [27, 10, 20],
    [35, 8, 15],
  ])('%s °C → %i–%i minutes', (t, min, max) => {
    const hint = workingTimeHint(t);
    expect([hint.minMinutes, hint.maxMinutes]).toEqual([min, max]);
    expect(hint.text).toContain(`${min}–${max} minutes`);
    expect(hint.text).toContain('data sheet');
  });

  it('refuses air below 5 °C', () => {
    expect(() => workingTimeHint(4.9)).toThrow(/below the 5 °C minimum/);
  });
});
