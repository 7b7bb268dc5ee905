import { describe, expect, it } from 'vitest';
import { DEFAULT_BUILD_UP } from './build-up';
import { SCALAR_RATES } from './contracts';

describe('the stored build-up rates', () => {
  it('are every rate of the domain build-up: the scalars, the catalyst bands, the per-edge rates; pack sizes come from the catalogue', () => {
    // the project's own contract (packages/domain/src/build-up.ts), no outside source
    const stored = [...SCALAR_RATES, 'catalystBands', 'battenMPerEdgeM', 'nailsPerEdgeM', 'packSizes'].sort();
    expect(stored).toEqual(Object.keys(DEFAULT_BUILD_UP).sort());
    expect(new Set(SCALAR_RATES).size).toBe(SCALAR_RATES.length);
  });
});
