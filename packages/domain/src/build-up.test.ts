import { describe, expect, it } from 'vitest';
import { BuildUp, DEFAULT_BUILD_UP, resolveBuildUp } from './build-up';
import { DomainError } from './errors';

describe('DEFAULT_BUILD_UP: trade-typical defaults', () => {
  it.each<[keyof BuildUp, unknown]>([
    ['matGsm', 450], // 450 g CSM most common on decks: common trade practice, no source
    ['layers', 1], // common trade practice, no source
    ['rollWidthM', 1], // rolls about 1.0–1.04 m: common trade practice, no source
    ['lapM', 0.05], // mat laps about 50 mm: common trade practice, no source
    ['resinToGlass', 2.5], // 2:1 to 3:1, 2.5:1 usual: common trade practice, no source
    ['topcoatKgPerM2', 0.5], // 0.4–0.6 kg/m²: common trade practice, no source
    ['matWastagePct', 10], // 10–15 %: common trade practice, no source
    ['resinWastagePct', 10], // 5–10 %: common trade practice, no source
    ['trimLengthM', 3], // common trade practice, no source
    ['trimLapM', 0.05], // common trade practice, no source
    ['upstandM', 0.15], // 150 mm minimum upstand, from memory
    ['bandageWidthMm', 100], // 75/100/150 mm tape: common trade practice, no source
  ])('%s = %s', (key, value) => {
    expect(DEFAULT_BUILD_UP[key]).toEqual(value);
  });

  it('keeps the wastage within the trade ranges (common trade practice, no source)', () => {
    expect(Number(DEFAULT_BUILD_UP.matWastagePct)).toBeGreaterThanOrEqual(10);
    expect(Number(DEFAULT_BUILD_UP.matWastagePct)).toBeLessThanOrEqual(15);
    expect(Number(DEFAULT_BUILD_UP.resinWastagePct)).toBeGreaterThanOrEqual(5);
    expect(Number(DEFAULT_BUILD_UP.resinWastagePct)).toBeLessThanOrEqual(10);
  });

  it('has the trade pack sizes (common trade practice, no source)', () => {
    expect(DEFAULT_BUILD_UP.packSizes).toEqual({ 'base-resin': [5, 10, 20, 25], topcoat: [5, 10, 20], catalyst: [0.5, 1, 5] });
  });

  it('cannot be changed by accident', () => {
    expect(Object.isFrozen(DEFAULT_BUILD_UP)).toBe(true);
    expect(Object.isFrozen(DEFAULT_BUILD_UP.battenMPerEdgeM)).toBe(true);
    expect(Object.isFrozen(DEFAULT_BUILD_UP.catalystBands)).toBe(true);
  });
});

describe('resolveBuildUp', () => {
  it('turns every rate into a Decimal', () => {
    const b = resolveBuildUp({ matGsm: '600', topcoatKgPerM2: undefined, nailsPerEdgeM: { angle: '2' } });
    expect(b.matGsm.toString()).toBe('600');
    expect(b.topcoatKgPerM2.toString()).toBe('0.5');
    expect(b.nailsPerEdgeM.angle.toString()).toBe('2');
    expect(b.nailsPerEdgeM.drip.toString()).toBe('5');
  });

  it.each<[Partial<BuildUp>, RegExp]>([
    [{ layers: 1.5 }, /layers must be a whole number/],
    [{ layers: 0 }, /layers must be more than zero/],
    [{ rollWidthM: 1, lapM: 1 }, /lapM .* narrower than rollWidthM/],
    [{ trimLengthM: 3, trimLapM: 3.5 }, /trimLapM .* shorter than trimLengthM/],
    [{ matGsm: 0 }, /matGsm/],
    [{ resinToGlass: -1 }, /resinToGlass/],
    [{ matWastagePct: -5 }, /matWastagePct/],
    [{ adhesiveTrimMPerCartridge: 0 }, /adhesiveTrimMPerCartridge/],
    [{ catalystBands: [{ fromC: 5, percent: 6 }] }, /between 1 % and 4 %/],
    [{ packSizes: { topcoat: [5, 0] } }, /packSizes.topcoat\[1\]/],
    [{ upstandM: 'tall' }, /upstandM/],
  ])('refuses %j', (input, message) => {
    expect(() => resolveBuildUp(input)).toThrow(DomainError);
    expect(() => resolveBuildUp(input)).toThrow(message);
  });

  it('refuses a bad per-edge rate by name', () => {
    expect(() => resolveBuildUp({ battenMPerEdgeM: { kerb: -1 } })).toThrow(/battenMPerEdgeM.kerb/);
  });
});
