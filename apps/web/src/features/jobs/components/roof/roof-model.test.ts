import { estimateRoof } from '@potlife/domain';
import { describe, expect, it } from 'vitest';
import { appendPoint, changeShape, removePoint } from './area-edits';
import { labelPoint, layOut } from './plan-layout';
import {
  emptyDraft,
  fieldErrors,
  fromStoredRoof,
  newArea,
  paths,
  previewRoof,
  sideLengths,
  snapToGrid,
  toRoofBody,
  type AreaDraft,
  type RoofDraft,
} from './roof-model';

const L_SHAPE = [
  ['0', '0'],
  ['8', '0'],
  ['8', '4'],
  ['4', '4'],
  ['4', '7'],
  ['0', '7'],
] as const;

function polygonArea(points: readonly (readonly [string, string])[], name = 'Main roof'): AreaDraft {
  const area = { ...newArea(0, 'polygon'), name, points: points.map(([x, y]) => ({ x, y })) };
  return { ...area, sides: points.map(() => ({ kind: 'drip' as const, upstandM: '' })) };
}

function draftOf(...areas: AreaDraft[]): RoofDraft {
  return { ...emptyDraft(), areas };
}

describe('the roof model', () => {
  it('gives the L-shaped roof the same totals as the domain, for the same roof (no second implementation)', () => {
    const area = polygonArea(L_SHAPE);
    area.sides[3] = { kind: 'wall', upstandM: '0.15' };
    const draft = {
      ...draftOf(area),
      pipes: '2',
      outlets: '1',
      cornersGiven: true,
      cornersExternal: '5',
      cornersInternal: '1',
    };
    const preview = previewRoof(draft);
    const direct = estimateRoof({
      areas: [{ name: 'Main roof', polygon: L_SHAPE.map(([x, y]) => [x, y] as const) }],
      edges: [
        { kind: 'drip', lengthM: '8' },
        { kind: 'drip', lengthM: '4' },
        { kind: 'drip', lengthM: '4' },
        { kind: 'wall', lengthM: '3', upstandM: '0.15' },
        { kind: 'drip', lengthM: '4' },
        { kind: 'drip', lengthM: '7' },
      ],
      pipes: 2,
      outlets: 1,
      corners: { external: 5, internal: 1 },
    });
    expect(preview.takeoff?.deckAreaM2.toString()).toBe(direct.deckAreaM2.toString());
    expect(preview.takeoff?.laminatedAreaM2.toString()).toBe(direct.laminatedAreaM2.toString());
    expect(preview.takeoff?.lines.map((l) => [l.role, l.quantity.toString()])).toEqual(
      direct.lines.map((l) => [l.role, l.quantity.toString()]),
    );
    // Arithmetic: 8 × 4 + 4 × 3 = 44 m² of deck; 3 m of wall × 0.15 m upstand = 0.45 m².
    expect(preview.takeoff?.deckAreaM2.toString()).toBe('44');
    expect(preview.takeoff?.upstandAreaM2.toString()).toBe('0.45');
    expect(preview.areas[0]?.areaM2?.toString()).toBe('44');
  });

  it.each([
    // Pythagoras: a 3-4-5 right triangle's long side is 5 m (arithmetic).
    [
      'a 3-4-5 triangle',
      [
        ['0', '0'],
        ['4', '0'],
        ['0', '3'],
      ],
      ['4', '5', '3'],
    ],
    // Arithmetic: the L's sides are 8, 4, 4, 3, 4 and 7 m.
    ['the L', L_SHAPE, ['8', '4', '4', '3', '4', '7']],
  ] as const)('measures the sides of %s', (_name, points, lengths) => {
    const area = polygonArea(points as unknown as (readonly [string, string])[]);
    expect(sideLengths(area).map((d) => d?.toString())).toEqual(lengths);
  });

  it('measures a diagonal side to the millimetre', () => {
    const area = polygonArea([
      ['0', '0'],
      ['1', '1'],
      ['0', '1'],
    ]);
    // √2 = 1.41421…, to the millimetre 1.414 m (arithmetic).
    expect(sideLengths(area)[0]?.toString()).toBe('1.414');
  });

  it("shows the domain's message at an area whose outline crosses itself, and leaves it out of the totals", () => {
    const bowTie = polygonArea(
      [
        ['0', '0'],
        ['4', '4'],
        ['4', '0'],
        ['0', '4'],
      ],
      'Bow tie',
    );
    const good = {
      ...newArea(1),
      name: 'Porch',
      lengthM: '2',
      widthM: '1.5',
      sides: newArea(1).sides.map(() => ({ kind: 'none' as const, upstandM: '' })),
    };
    const preview = previewRoof(draftOf(bowTie, good));
    expect(preview.areas[0]?.problem).toMatch(/cross or touch/);
    expect(preview.areas[0]?.areaM2).toBeNull();
    expect(preview.leftOut).toEqual(['Bow tie']);
    // Arithmetic: only the 2 × 1.5 m porch counts.
    expect(preview.takeoff?.deckAreaM2.toString()).toBe('3');
  });

  it('refuses a zero-area polygon and a rectangle of negative width with the domain’s sentence', () => {
    const line = polygonArea([
      ['0', '0'],
      ['2', '0'],
      ['4', '0'],
    ]);
    const negative = { ...newArea(1), lengthM: '3', widthM: '-2' };
    const preview = previewRoof(draftOf(line, negative));
    expect(preview.areas[0]?.problem).toMatch(/zero area|folds back/);
    expect(preview.areas[1]?.problem).toMatch(/must be more than zero/);
    expect(preview.takeoff).toBeNull();
  });

  it('checks the fall with the domain: 50 mm over 3 m is flatter than 1:40', () => {
    const area = { ...polygonArea(L_SHAPE), hasFall: true, fallRiseMm: '50', fallRunM: '3' };
    const fall = previewRoof(draftOf(area)).areas[0]?.fall;
    // Arithmetic: 3000 mm / 50 mm = 1:60, between BS 6229's 1:40 design and 1:80 finished fall.
    expect(fall?.ratio).toBe('1:60');
    expect(fall?.level).toBe('warning');
  });

  it('lists what must be typed before saving, by field', () => {
    const empty = newArea(0);
    const draft = { ...draftOf(empty), pipes: '1.5' };
    const errors = fieldErrors(draft);
    expect(errors.get(paths.areaLength(empty.key))).toBe('Enter the length in metres');
    expect(errors.get(paths.side(empty.key, 0))).toMatch(/Choose the kind/);
    expect(errors.get(paths.pipes)).toBe('A whole number from 0 to 999');
    const typed = { ...empty, lengthM: 'six', widthM: '0' };
    const again = fieldErrors(draftOf(typed));
    expect(again.get(paths.areaLength(empty.key))).toBe('Write a number, like 6.2');
    expect(again.get(paths.areaWidth(empty.key))).toBe('Must be more than 0');
  });

  it('writes the body of PUT /roof with each side as an edge of its area, and reads it back', () => {
    const area = polygonArea(L_SHAPE);
    area.sides[2] = { kind: 'angle', upstandM: '' };
    area.sides[3] = { kind: 'wall', upstandM: '0.2' };
    area.sides[4] = { kind: 'none', upstandM: '' };
    const draft: RoofDraft = {
      ...draftOf(area),
      freeEdges: [{ key: 'e1', kind: 'kerb', lengthM: '1.2', upstandM: '', label: 'Step' }],
      outlets: '1',
    };
    const body = toRoofBody(draft);
    expect(body.areas[0]).toEqual({
      name: 'Main roof',
      shape: 'polygon',
      points: L_SHAPE.map((p) => [...p]),
      fall: null,
    });
    expect(body.edges).toEqual([
      { kind: 'drip', lengthM: '8', upstandM: null, areaIndex: 0, side: 0, label: null },
      { kind: 'drip', lengthM: '4', upstandM: null, areaIndex: 0, side: 1, label: null },
      { kind: 'angle', lengthM: '4', upstandM: null, areaIndex: 0, side: 2, label: null },
      { kind: 'wall', lengthM: '3', upstandM: '0.2', areaIndex: 0, side: 3, label: null },
      { kind: 'drip', lengthM: '7', upstandM: null, areaIndex: 0, side: 5, label: null },
      { kind: 'kerb', lengthM: '1.2', upstandM: null, areaIndex: null, side: null, label: 'Step' },
    ]);
    expect(body).toMatchObject({ pipes: 0, outlets: 1, corners: null, notes: null });

    const back = fromStoredRoof({
      ...body,
      areas: body.areas.map((a) => ({ ...a, fall: a.fall ?? null })),
      edges: body.edges.map((e) => ({
        ...e,
        upstandM: e.upstandM ?? null,
        areaIndex: e.areaIndex ?? null,
        side: e.side ?? null,
        label: e.label ?? null,
      })),
      corners: null,
      notes: null,
    });
    expect(back.areas[0]?.sides.map((s) => s.kind)).toEqual([
      'drip',
      'drip',
      'angle',
      'wall',
      'none',
      'drip',
    ]);
    expect(back.areas[0]?.sides[3]?.upstandM).toBe('0.2');
    expect(back.freeEdges).toMatchObject([{ kind: 'kerb', lengthM: '1.2', label: 'Step' }]);
  });

  it.each([
    [0.26, 0.74, '0.5', { x: '0.5', y: '0.5' }],
    [3.12, -0.1, '0.25', { x: '3', y: '0' }],
    [7.3, 2.9, '1', { x: '7', y: '3' }],
    [0.3, 0.29, '0.1', { x: '0.3', y: '0.3' }],
  ])('snaps a click at (%s, %s) to the %s m grid', (x, y, step, expected) => {
    expect(snapToGrid(x, y, step)).toEqual(expected);
  });

  it('keeps the sides in step with the corners as they are added and removed', () => {
    let area = newArea(0, 'polygon');
    area = appendPoint(area, { x: '0', y: '0' });
    area = appendPoint(area, { x: '4', y: '0' });
    expect(area.sides).toHaveLength(0);
    area = appendPoint(area, { x: '4', y: '3' });
    expect(area.sides).toHaveLength(3);
    area = {
      ...area,
      sides: [
        { kind: 'drip', upstandM: '' },
        { kind: 'kerb', upstandM: '' },
        { kind: 'wall', upstandM: '' },
      ],
    };
    area = appendPoint(area, { x: '0', y: '3' });
    // The first two sides stay; the old closing side is now two new ones.
    expect(area.sides.map((s) => s.kind)).toEqual(['drip', 'kerb', null, null]);
    area = removePoint(area, 3);
    expect(area.points).toHaveLength(3);
    expect(area.sides).toHaveLength(3);
    expect(area.sides.slice(0, 2).map((s) => s.kind)).toEqual(['drip', 'kerb']);
  });

  it('turns a rectangle into the polygon of its corners, keeping the kinds of its sides', () => {
    const rect = {
      ...newArea(0),
      lengthM: '6',
      widthM: '4',
      sides: [
        { kind: 'drip' as const, upstandM: '' },
        { kind: 'kerb' as const, upstandM: '' },
        { kind: 'wall' as const, upstandM: '' },
        { kind: 'kerb' as const, upstandM: '' },
      ],
    };
    const polygon = changeShape(rect, 'polygon');
    expect(polygon.points).toEqual([
      { x: '0', y: '0' },
      { x: '6', y: '0' },
      { x: '6', y: '4' },
      { x: '0', y: '4' },
    ]);
    expect(polygon.sides.map((s) => s.kind)).toEqual(['drip', 'kerb', 'wall', 'kerb']);
    // Arithmetic: 6 × 4 = 24 m² either way.
    expect(previewRoof(draftOf(polygon)).areas[0]?.areaM2?.toString()).toBe('24');
  });

  it('puts polygons where their corners are and rectangles beside them, labels inside the L', () => {
    const plan = layOut([polygonArea(L_SHAPE), { ...newArea(1), lengthM: '2', widthM: '1' }]);
    expect(plan.bounds).toEqual({ minX: 0, minY: 0, maxX: 11.5, maxY: 7 });
    const label = labelPoint(plan.areas[0]!.outline);
    // Inside the L: not in the cut-out corner above x 4, y 4.
    expect(label.x < 4 || label.y < 4).toBe(true);
    expect(plan.areas[1]?.outline[0]).toEqual({ x: 9.5, y: 0 });
  });
});
