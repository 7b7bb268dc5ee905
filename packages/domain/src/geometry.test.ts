import Flatten from '@flatten-js/core';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from './decimal';
import { DomainError } from './errors';
import { Point, polygonArea, rectangleArea } from './geometry';

const flattenArea = (pts: [number, number][]): number => Math.abs(new Flatten.Polygon(pts).area());

const L_SHAPE: [number, number][] = [
  [0, 0],
  [6, 0],
  [6, 3],
  [2.5, 3],
  [2.5, 7.2],
  [0, 7.2],
];

describe('polygonArea', () => {
  it.each<[string, Point[], string]>([
    ['unit square', [[0, 0], [1, 0], [1, 1], [0, 1]], '1'],
    ['rectangle 5 × 4', [[0, 0], [5, 0], [5, 4], [0, 4]], '20'],
    ['triangle', [[0, 0], [4, 0], [0, 3]], '6'],
    ['L-shape 6 × 3 plus 2.5 × 4.2', L_SHAPE, '28.5'],
    ['clockwise L-shape', [...L_SHAPE].reverse(), '28.5'],
    ['negative coordinates', [[-2, -2], [2, -2], [2, 2], [-2, 2]], '16'],
    ['closing corner repeated', [[0, 0], [3, 0], [3, 2], [0, 2], [0, 0]], '6'],
    ['triangle closed back to its start', [[0, 0], [1, 0], [0, 1], [0, 0]], '0.5'],
    ['string coordinates, exact decimals', [['0.1', '0.1'], ['0.3', '0.1'], ['0.3', '0.3'], ['0.1', '0.3']], '0.04'],
    ['a straight corner along a segment', [[0, 0], [2, 0], [4, 0], [4, 1], [0, 1]], '4'],
    ['millimetre rectangle in metres', [[0, 0], [0.001, 0], [0.001, 0.001], [0, 0.001]], '0.000001'],
  ])('%s → %s m²', (_name, points, expected) => {
    expect(polygonArea(points).toString()).toBe(expected);
  });

  it('matches @flatten-js/core on a fixed L-shape, both windings', () => {
    expect(polygonArea(L_SHAPE).toNumber()).toBeCloseTo(flattenArea(L_SHAPE), 12);
    expect(polygonArea([...L_SHAPE].reverse()).toNumber()).toBeCloseTo(flattenArea([...L_SHAPE].reverse()), 12);
  });

  it.each<[string, Point[], RegExp]>([
    ['no corners', [], /at least 3 corners; this one has 0/],
    ['two corners', [[0, 0], [1, 1]], /at least 3 corners/],
    ['corner repeated', [[0, 0], [1, 0], [1, 0], [1, 1]], /same place/],
    ['all on one line', [[0, 0], [1, 0], [2, 0]], /zero area/],
    ['bow-tie', [[0, 0], [1, 1], [1, 0], [0, 1]], /cross or touch/],
    ['figure of eight touching at a corner', [[0, 0], [2, 0], [2, 2], [4, 2], [4, 4], [2, 4], [2, 2], [0, 2]], /cross or touch/],
    ['a segment folds back over the one before', [[0, 0], [3, 0], [1, 0], [1, 2]], /folds back/],
    ['a spike returning along a segment', [[0, 0], [4, 0], [4, 2], [4, 1], [0, 1]], /folds back/],
  ])('%s', (_name, points, message) => {
    expect(() => polygonArea(points)).toThrow(DomainError);
    expect(() => polygonArea(points)).toThrow(message);
  });

  it.each<[string, unknown]>([
    ['not a list', 'square'],
    ['a corner that is not a pair', [[0, 0], [1], [1, 1]]],
    ['a coordinate that is not a number', [[0, 0], [1, 'x'], [1, 1]]],
  ])('refuses %s', (_name, points) => {
    expect(() => polygonArea(points as Point[])).toThrow(DomainError);
  });

  it('gives the code invalid-polygon', () => {
    try {
      polygonArea([[0, 0]]);
    } catch (e) {
      expect((e as DomainError).code).toBe('invalid-polygon');
    }
    expect.assertions(1);
  });

  // Star-shaped polygons: one corner in each of n equal sectors round a centre, so the corners are in
  // angular order with every gap under 180° — always simple.
  const starPolygon = fc
    .integer({ min: 4, max: 12 })
    .chain((n) =>
      fc.tuple(
        fc.array(fc.tuple(fc.double({ min: 0.05, max: 0.95, noNaN: true }), fc.double({ min: 0.5, max: 50, noNaN: true })), {
          minLength: n,
          maxLength: n,
        }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
      ),
    )
    .map(([corners, cx, cy]) =>
      corners.map(([f, r], i): [number, number] => {
        const angle = ((i + f) / corners.length) * 2 * Math.PI;
        return [cx + r * Math.cos(angle), cy + r * Math.sin(angle)];
      }),
    );

  it('matches @flatten-js/core on random simple polygons, either winding (property)', () => {
    fc.assert(
      fc.property(starPolygon, fc.boolean(), (pts, reverse) => {
        const points = reverse ? [...pts].reverse() : pts;
        const ours = polygonArea(points).toNumber();
        const theirs = flattenArea(points);
        expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(1e-9 * Math.max(1, theirs));
      }),
      { numRuns: 300 },
    );
  });

  it('never accepts a polygon @flatten-js/core finds invalid, and agrees on the area of those it accepts (property)', () => {
    const point = fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 }));
    fc.assert(
      fc.property(fc.array(point, { minLength: 3, maxLength: 7 }), (pts) => {
        let ours: number | undefined;
        try {
          ours = polygonArea(pts).toNumber();
        } catch (e) {
          expect(e).toBeInstanceOf(DomainError);
          return;
        }
        const theirs = new Flatten.Polygon(pts);
        expect(theirs.isValid()).toBe(true);
        expect(ours).toBeCloseTo(Math.abs(theirs.area()), 9);
      }),
      { numRuns: 500 },
    );
  });
});

describe('rectangleArea', () => {
  it.each([
    ['5', '4', '20'],
    ['0.1', '0.2', '0.02'], // exact, where binary floats give 0.020000000000000004
    [new Decimal('12.345'), 2, '24.69'],
  ])('%s × %s = %s m²', (l, w, area) => {
    expect(rectangleArea(l, w).toString()).toBe(area);
  });

  it.each([
    [0, 4],
    [5, 0],
    [-5, 4],
  ])('refuses %s × %s', (l, w) => {
    expect(() => rectangleArea(l, w, 'Rear')).toThrow(/of Rear must be more than zero/);
  });
});
