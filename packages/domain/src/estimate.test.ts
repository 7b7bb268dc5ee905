import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BuildUpInput, DEFAULT_BUILD_UP } from './build-up';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import { deriveCorners, estimateRoof, Estimate, LineRole } from './estimate';
import { catalystPercent } from './laying';
import { EdgeKind, Roof } from './roof';
import { matAreaForDeck, resinForMat } from './takeoff';

/** A line's quantity to 6 places, or undefined when the line is left out. */
function q(estimate: Estimate, role: LineRole): string | undefined {
  return estimate.lines.find((l) => l.role === role)?.quantity.toDecimalPlaces(6).toString();
}

// A detached garage, 5 m × 4 m: drip trims front and back, kerb trims at the verges.
const GARAGE: Roof = {
  areas: [{ name: 'Garage', lengthM: 5, widthM: 4 }],
  edges: [
    { kind: 'drip', lengthM: 5 },
    { kind: 'kerb', lengthM: 4 },
    { kind: 'drip', lengthM: 5 },
    { kind: 'kerb', lengthM: 4 },
  ],
};

describe('estimateRoof: a 5 m × 4 m garage on the default build-up, worked by hand', () => {
  const e = estimateRoof(GARAGE);

  it.each<[LineRole, string]>([
    ['mat', '23.157895'], // 20 m² × 1/0.95 (1 m roll, 50 mm lap) × 1.10
    ['base-resin', '26.052632'], // 20/0.95 m² × 0.45 kg/m² × 2.5 × 1.10
    ['bandage-resin', '2.6235'], // 21.2 m × 0.1 m × 0.45 kg/m² × 2.5 × 1.10
    ['topcoat', '10'], // 20 m² × 0.5 kg/m²
    ['catalyst', '0.773523'], // (26.052632 + 2.6235 + 10) × 2 % at 20 °C
    ['trim:drip', '4'], // 2 × ⌈4.95 / 2.95⌉
    ['trim:kerb', '4'], // 2 × ⌈3.95 / 2.95⌉
    ['corner:external', '4'], // four drip–kerb corners
    ['bandage', '21.2'], // 18 m of edge + 4 joints × 0.3 m + 4 corners × 0.5 m
    ['acetone', '1'], // 20 m² × 0.05 L
    ['adhesive', '3'], // ⌈18 m / 6 m⌉
    ['battens', '28'], // drip 10 m × 2 + kerb 8 m × 1
    ['nails', '90'], // 18 m × 5
  ])('%s = %s', (role, expected) => {
    expect(q(e, role)).toBe(expected);
  });

  it('leaves out the lines with nothing to buy', () => {
    expect(e.lines.map((l) => l.role)).toEqual([
      'mat',
      'base-resin',
      'bandage-resin',
      'topcoat',
      'catalyst',
      'trim:drip',
      'trim:kerb',
      'corner:external',
      'bandage',
      'acetone',
      'adhesive',
      'battens',
      'nails',
    ]);
  });

  it('gives the areas, corners, labour and cautions', () => {
    expect(e.deckAreaM2.toString()).toBe('20');
    expect(e.upstandAreaM2.toString()).toBe('0');
    expect(e.laminatedAreaM2.toString()).toBe('20');
    expect(e.trimM.toString()).toBe('18');
    expect(e.areas).toEqual([{ name: 'Garage', shape: 'rectangle', areaM2: new Decimal(20) }]);
    expect(e.corners).toEqual({ external: 4, internal: 0, derived: true });
    expect(e.catalystPercent.toString()).toBe('2');
    expect(e.airC.toString()).toBe('20');
    expect(e.labour.laminatingHours.toString()).toBe('7'); // 20 m² × 0.35 h
    expect(e.labour.trimHours.toString()).toBe('2.7'); // 18 m × 0.15 h
    expect(e.labour.totalHours.toString()).toBe('9.7');
    expect(e.cautions.map((c) => c.id)).toEqual(['work-at-height', 'styrene-vapour', 'catalyst', 'flammable', 'dust']);
  });

  it('describes trim lines in lengths and metres', () => {
    const drip = e.lines.find((l) => l.role === 'trim:drip')!;
    expect(drip.unit).toBe('each');
    expect(drip.lengths).toBe(4);
    expect(drip.metres?.toString()).toBe('10');
    expect(drip.description).toBe('Drip trim: 4 × 3 m lengths for 10 m of edge');
  });

  it('gives every line a unit and a material', () => {
    const units = Object.fromEntries(e.lines.map((l) => [l.role, `${l.unit}/${l.material}`]));
    expect(units).toMatchObject({
      mat: 'm2/mat',
      'base-resin': 'kg/base-resin',
      'bandage-resin': 'kg/base-resin',
      topcoat: 'kg/topcoat',
      catalyst: 'kg/catalyst',
      'trim:drip': 'each/trim',
      bandage: 'm/bandage',
      acetone: 'L/acetone',
      adhesive: 'each/adhesive',
      battens: 'm/batten',
      nails: 'each/fixing',
    });
  });
});

describe('estimateRoof: upstands, polygons, pipes and outlets', () => {
  // A lean-to against a house wall, listed round the roof: wall, kerb, drip, kerb.
  const leanTo = (upstandM?: number): Roof => ({
    areas: [{ name: 'Kitchen', lengthM: '6', widthM: '3' }],
    edges: [
      { kind: 'wall', lengthM: 6, ...(upstandM === undefined ? {} : { upstandM }) },
      { kind: 'kerb', lengthM: 3 },
      { kind: 'drip', lengthM: 6 },
      { kind: 'kerb', lengthM: 3 },
    ],
  });

  it.each([
    [0.2, '1.2', '19.2'], // 6 m × 200 mm upstand
    [undefined, '0.9', '18.9'], // default 150 mm upstand (from memory)
    [0, '0', '18'],
  ])('upstand %s m → upstand %s m², laminated %s m²', (upstand, upstandArea, laminated) => {
    const e = estimateRoof(leanTo(upstand));
    expect(e.upstandAreaM2.toString()).toBe(upstandArea);
    expect(e.laminatedAreaM2.toString()).toBe(laminated);
    expect(e.corners).toEqual({ external: 2, internal: 0, derived: true });
    expect(q(e, 'trim:wall')).toBe('3');
    expect(q(e, 'topcoat')).toBe(new Decimal(laminated).times(0.5).toString());
  });

  it('adds polygon areas and uses corners when given', () => {
    const e = estimateRoof({
      areas: [
        {
          name: 'L-shaped rear',
          polygon: [
            [0, 0],
            [6, 0],
            [6, 3],
            [2.5, 3],
            [2.5, 7.2],
            [0, 7.2],
          ],
        },
        { name: 'Porch', lengthM: 2, widthM: 1.5 },
      ],
      edges: [{ kind: 'drip', lengthM: 26.4 }],
      corners: { external: 5, internal: 1 },
    });
    expect(e.areas.map((a) => [a.name, a.shape, a.areaM2.toString()])).toEqual([
      ['L-shaped rear', 'polygon', '28.5'],
      ['Porch', 'rectangle', '3'],
    ]);
    expect(e.deckAreaM2.toString()).toBe('31.5');
    expect(e.corners).toEqual({ external: 5, internal: 1, derived: false });
    expect(q(e, 'corner:external')).toBe('5');
    expect(q(e, 'corner:internal')).toBe('1');
    expect(q(e, 'trim:drip')).toBe('9'); // ⌈26.35 / 2.95⌉
  });

  it('adds bandage, resin and outlet pieces for pipes and outlets', () => {
    const plain = estimateRoof(GARAGE);
    const e = estimateRoof({ ...GARAGE, pipes: 2, outlets: '1' });
    const diff = (role: LineRole): string =>
      e.lines
        .find((l) => l.role === role)!
        .quantity.minus(plain.lines.find((l) => l.role === role)!.quantity)
        .toString();
    expect(diff('bandage')).toBe('3.5'); // 2 × 1 m + 1 × 1.5 m
    expect(diff('bandage-resin')).toBe('1.533125'); // (3.5 m × 0.1 m × 0.45 × 2.5 + 2 × 0.25 + 0.5 kg) × 1.10
    expect(q(e, 'outlet')).toBe('1');
    expect(e.pipes).toBe(2);
    expect(e.outlets).toBe(1);
  });

  it('leaves out trim lines and bandage for a roof with no edges', () => {
    const e = estimateRoof({ areas: [{ name: 'Deck', lengthM: 2, widthM: 2 }], edges: [] });
    expect(e.lines.map((l) => l.role)).toEqual(['mat', 'base-resin', 'topcoat', 'catalyst', 'acetone']);
    expect(e.cautions.map((c) => c.id)).toEqual(['work-at-height', 'styrene-vapour', 'catalyst', 'flammable', 'dust']);
  });

  it('takes a roof without an edges list', () => {
    const e = estimateRoof({ areas: [{ name: 'Deck', lengthM: 2, widthM: 2 }] } as unknown as Roof);
    expect(e.trimM.toString()).toBe('0');
  });
});

describe('estimateRoof: catalyst by the air temperature on the day', () => {
  it.each([
    [undefined, '2'],
    [8, '3'],
    ['27', '1.5'],
    [31, '1'],
  ])('air %s °C → %s %%', (airC, pct) => {
    const e = estimateRoof({ ...GARAGE, ...(airC === undefined ? {} : { airC }) });
    expect(e.catalystPercent.toString()).toBe(pct);
    const resinAndTopcoat = ['base-resin', 'bandage-resin', 'topcoat']
      .map((r) => e.lines.find((l) => l.role === r)!.quantity)
      .reduce((a, b) => a.plus(b));
    expect(e.lines.find((l) => l.role === 'catalyst')!.quantity.eq(resinAndTopcoat.times(pct).div(100))).toBe(true);
  });

  it('refuses a day too cold to lay', () => {
    expect(() => estimateRoof({ ...GARAGE, airC: 3 })).toThrow(/below the 5 °C minimum/);
  });
});

describe('estimateRoof: the build-up is data', () => {
  it('merges a partial build-up over the defaults', () => {
    const e = estimateRoof(GARAGE, { layers: 2, matGsm: 600, battenMPerEdgeM: { drip: 1 }, topcoatKgPerM2: undefined });
    expect(q(e, 'mat')).toBe('46.315789'); // twice the default
    expect(q(e, 'base-resin')).toBe('69.473684'); // 40/0.95 m² × 0.6 × 2.5 × 1.1
    expect(q(e, 'battens')).toBe('18'); // drip 10 m × 1 + kerb 8 m × 1
    expect(q(e, 'topcoat')).toBe('10'); // undefined keeps the default
  });

  it.each<[BuildUpInput, LineRole, string | undefined]>([
    [{ resinWastagePct: 0, matWastagePct: 0 }, 'base-resin', '23.684211'], // 20/0.95 × 0.45 × 2.5
    [{ rollWidthM: 1.25, lapM: 0.05 }, 'mat', '22.916667'], // 20 × 1.25/1.2 × 1.1
    [{ trimLengthM: 2, trimLapM: 0 }, 'trim:drip', '6'],
    [{ nailsPerEdgeM: { kerb: 0 } }, 'nails', '50'],
    [{ acetoneLPerM2: 0 }, 'acetone', undefined],
    [{ bandageWidthMm: 150 }, 'bandage-resin', '3.93525'], // 150 mm bandage: 21.2 × 0.15 × 0.45 × 2.5 × 1.1
    [{ catalystBands: [{ fromC: 5, percent: 4 }] }, 'catalyst', '1.547045'],
  ])('%j changes %s to %s', (buildUp, role, expected) => {
    expect(q(estimateRoof(GARAGE, buildUp), role)).toBe(expected);
  });

  it('follows the contract formulas for any rectangle and wall (property)', () => {
    const dim = fc.integer({ min: 1, max: 5000 }).map((n) => new Decimal(n).div(100));
    fc.assert(
      fc.property(dim, dim, dim, fc.integer({ min: 0, max: 60 }).map((n) => n / 100), (l, w, wall, upstand) => {
        const e = estimateRoof({
          areas: [{ name: 'A', lengthM: l, widthM: w }],
          edges: [
            { kind: 'wall', lengthM: wall, upstandM: upstand },
            { kind: 'drip', lengthM: l },
          ],
        });
        const b = DEFAULT_BUILD_UP;
        const laminated = l.times(w).plus(wall.times(upstand));
        expect(e.laminatedAreaM2.eq(laminated)).toBe(true);
        const mat = matAreaForDeck(laminated, { rollWidthM: b.rollWidthM, lapM: b.lapM, layers: b.layers, wastagePct: b.matWastagePct });
        expect(e.lines[0]!.quantity.eq(mat)).toBe(true);
        const resin = resinForMat(matAreaForDeck(laminated, { rollWidthM: b.rollWidthM, lapM: b.lapM, layers: b.layers }), b.matGsm, b.resinToGlass).times(1.1);
        expect(e.lines[1]!.quantity.eq(resin)).toBe(true);
        expect(e.catalystPercent.eq(catalystPercent(20))).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});

describe('estimateRoof refuses a roof it cannot measure', () => {
  const area = { name: 'A', lengthM: 5, widthM: 4 };
  it.each<[string, unknown, RegExp]>([
    ['no areas', { areas: [], edges: [] }, /at least one area/],
    ['no roof', undefined, /at least one area/],
    ['edges that are not a list', { areas: [area], edges: 'drip' }, /must be a list/],
    ['an area that is not an object', { areas: [null], edges: [] }, /Area 1 must be an object/],
    ['an area with both shapes', { areas: [{ ...area, polygon: [[0, 0], [1, 0], [0, 1]] }], edges: [] }, /not both/],
    ['an area with no shape', { areas: [{ name: 'Rear' }], edges: [] }, /Rear: give lengthM and widthM/],
    ['an area of zero width', { areas: [{ name: 'Rear', lengthM: 5, widthM: 0 }], edges: [] }, /widthM of Rear must be more than zero/],
    ['a crossed polygon', { areas: [{ name: 'Rear', polygon: [[0, 0], [1, 1], [1, 0], [0, 1]] }], edges: [] }, /^Rear: Segments 1 and 3/],
    ['an unnamed area', { areas: [{ name: ' ', lengthM: 1 }], edges: [] }, /widthM of Area 1/],
    ['an unknown edge kind', { areas: [area], edges: [{ kind: 'gutter', lengthM: 1 }] }, /drip, kerb, wall or angle/],
    ['an upstand on a drip edge', { areas: [area], edges: [{ kind: 'drip', lengthM: 1, upstandM: 0.15 }] }, /only wall edges have an upstand/],
    ['a negative edge', { areas: [area], edges: [{ kind: 'kerb', lengthM: -1 }] }, /lengthM of edge 1/],
    ['a negative upstand', { areas: [area], edges: [{ kind: 'wall', lengthM: 1, upstandM: -0.1 }] }, /upstandM of edge 1/],
    ['half a pipe', { areas: [area], edges: [], pipes: 1.5 }, /pipes must be a whole number/],
    ['negative corners', { areas: [area], edges: [], corners: { external: -1 } }, /corners.external/],
    ['an air temperature that is not a number', { areas: [area], edges: [], airC: 'mild' }, /airC/],
  ])('%s', (_name, roof, message) => {
    expect(() => estimateRoof(roof as Roof)).toThrow(DomainError);
    expect(() => estimateRoof(roof as Roof)).toThrow(message);
  });

  it('keeps the polygon error code', () => {
    try {
      estimateRoof({ areas: [{ name: 'Rear', polygon: [[0, 0]] }], edges: [] });
    } catch (e) {
      expect((e as DomainError).code).toBe('invalid-polygon');
    }
    expect.assertions(1);
  });
});

describe('deriveCorners: neighbouring drip and kerb edges, the last meeting the first', () => {
  it.each<[EdgeKind[], number]>([
    [[], 0],
    [['drip'], 0],
    [['drip', 'kerb'], 2],
    [['drip', 'kerb', 'drip', 'kerb'], 4], // a detached roof
    [['wall', 'kerb', 'drip', 'kerb'], 2], // a lean-to
    [['wall', 'angle', 'wall', 'angle'], 0],
    [['drip', 'angle', 'drip'], 1], // the two drips meet across the end of the list
  ])('%j → %i external', (kinds, external) => {
    expect(deriveCorners(kinds.map((kind) => ({ kind })))).toEqual({ external, internal: 0 });
  });
});
