import {
  checkFall,
  Decimal,
  DomainError,
  estimateRoof,
  polygonArea,
  rectangleArea,
  type EdgeKind,
  type Estimate,
  type FallCheck,
  type Roof,
  type RoofEdge,
} from '@potlife/domain';
import type { RoofBody, StoredRoof } from '../../api/types';

// The roof editor's working copy (strings as typed), turned into the API's body and into the
// domain's Roof. Every area, total and fall check comes from @potlife/domain; this file only
// shapes the data and checks that what was typed is a number at all.

/** What a side of an area is: an edge kind, 'none' (no trim: it meets another area), or not chosen yet. */
export type SideKind = EdgeKind | 'none' | null;

export interface SideDraft {
  kind: SideKind;
  /** wall only, m; empty means the build-up's upstand */
  upstandM: string;
}

export interface PointDraft {
  x: string;
  y: string;
}

export interface AreaDraft {
  key: string;
  name: string;
  shape: 'rectangle' | 'polygon';
  lengthM: string;
  widthM: string;
  points: PointDraft[];
  hasFall: boolean;
  fallRiseMm: string;
  fallRunM: string;
  /** one per side: a rectangle's length, width, length, width; a polygon's corner n to n+1 */
  sides: SideDraft[];
}

/** An edge not drawn as the side of an area (measured along the roof by tape). */
export interface FreeEdgeDraft {
  key: string;
  kind: EdgeKind;
  lengthM: string;
  upstandM: string;
  label: string;
}

export interface RoofDraft {
  areas: AreaDraft[];
  freeEdges: FreeEdgeDraft[];
  pipes: string;
  outlets: string;
  cornersGiven: boolean;
  cornersExternal: string;
  cornersInternal: string;
  notes: string;
}

let keySeed = 0;
export function newKey(prefix: string): string {
  keySeed += 1;
  return `${prefix}-${keySeed}`;
}

export function emptySide(): SideDraft {
  return { kind: null, upstandM: '' };
}

export function newArea(index: number, shape: AreaDraft['shape'] = 'rectangle'): AreaDraft {
  return {
    key: newKey('area'),
    name: index === 0 ? 'Main roof' : `Area ${index + 1}`,
    shape,
    lengthM: '',
    widthM: '',
    points: [],
    hasFall: false,
    fallRiseMm: '',
    fallRunM: '',
    sides: shape === 'rectangle' ? [emptySide(), emptySide(), emptySide(), emptySide()] : [],
  };
}

export function emptyDraft(): RoofDraft {
  return {
    areas: [newArea(0)],
    freeEdges: [],
    pipes: '0',
    outlets: '0',
    cornersGiven: false,
    cornersExternal: '0',
    cornersInternal: '0',
    notes: '',
  };
}

/** Sides follow the corners: one per corner of a polygon (0 until it has 3), four for a rectangle. */
export function sideCount(area: Pick<AreaDraft, 'shape' | 'points'>): number {
  if (area.shape === 'rectangle') {
    return 4;
  }
  return area.points.length >= 3 ? area.points.length : 0;
}

/** The sides resized to the area's shape, keeping what was chosen for the ones that remain. */
export function fitSides(area: AreaDraft): SideDraft[] {
  const n = sideCount(area);
  return Array.from({ length: n }, (_, i) => area.sides[i] ?? emptySide());
}

const NUMBER = /^-?\d{1,12}(\.\d{1,8})?$/;

/** A typed decimal, or null if it is not one. */
export function parseDecimal(text: string): Decimal | null {
  const t = text.trim();
  return NUMBER.test(t) ? new Decimal(t) : null;
}

function clean(text: string): string {
  return new Decimal(text.trim()).toString();
}

/** The length of each side in metres, exact to the millimetre; null where a corner is not a number yet. */
export function sideLengths(area: AreaDraft): (Decimal | null)[] {
  if (area.shape === 'rectangle') {
    const l = parseDecimal(area.lengthM);
    const w = parseDecimal(area.widthM);
    return [l, w, l, w];
  }
  const n = sideCount(area);
  return Array.from({ length: n }, (_, i) => {
    const a = area.points[i];
    const b = area.points[(i + 1) % n];
    const ax = a ? parseDecimal(a.x) : null;
    const ay = a ? parseDecimal(a.y) : null;
    const bx = b ? parseDecimal(b.x) : null;
    const by = b ? parseDecimal(b.y) : null;
    if (ax === null || ay === null || bx === null || by === null) {
      return null;
    }
    return bx.minus(ax).pow(2).plus(by.minus(ay).pow(2)).sqrt().toDecimalPlaces(3);
  });
}

/** Where a problem is: shown beside that field. */
export type FieldPath = string;
export const paths = {
  areaName: (a: string) => `area:${a}:name`,
  areaLength: (a: string) => `area:${a}:lengthM`,
  areaWidth: (a: string) => `area:${a}:widthM`,
  areaPoints: (a: string) => `area:${a}:points`,
  point: (a: string, i: number, c: 'x' | 'y') => `area:${a}:point:${i}:${c}`,
  side: (a: string, i: number) => `area:${a}:side:${i}`,
  sideUpstand: (a: string, i: number) => `area:${a}:side:${i}:upstand`,
  fallRise: (a: string) => `area:${a}:fall:rise`,
  fallRun: (a: string) => `area:${a}:fall:run`,
  edgeLength: (e: string) => `edge:${e}:lengthM`,
  edgeUpstand: (e: string) => `edge:${e}:upstandM`,
  pipes: 'pipes',
  outlets: 'outlets',
  cornersExternal: 'corners:external',
  cornersInternal: 'corners:internal',
};

function checkNumber(
  errors: Map<FieldPath, string>,
  path: FieldPath,
  text: string,
  what: string,
  rule: 'any' | 'positive' | 'non-negative' | 'count' = 'any',
): void {
  if (text.trim() === '') {
    errors.set(path, `Enter ${what}`);
    return;
  }
  const d = parseDecimal(text);
  if (d === null) {
    errors.set(path, 'Write a number, like 6.2');
    return;
  }
  if (rule === 'positive' && d.lte(0)) {
    errors.set(path, 'Must be more than 0');
  } else if (rule === 'non-negative' && d.lt(0)) {
    errors.set(path, 'Must not be negative');
  } else if (rule === 'count' && (d.lt(0) || !d.isInteger() || d.gt(999))) {
    errors.set(path, 'A whole number from 0 to 999');
  }
}

/** What the estimator must fix before the roof can be saved, by field. */
export function fieldErrors(draft: RoofDraft): Map<FieldPath, string> {
  const errors = new Map<FieldPath, string>();
  draft.areas.forEach((area) => {
    if (area.name.trim() === '') {
      errors.set(paths.areaName(area.key), 'Name the area');
    }
    if (area.shape === 'rectangle') {
      checkNumber(errors, paths.areaLength(area.key), area.lengthM, 'the length in metres', 'positive');
      checkNumber(errors, paths.areaWidth(area.key), area.widthM, 'the width in metres', 'positive');
    } else {
      if (area.points.length < 3) {
        errors.set(
          paths.areaPoints(area.key),
          `A polygon needs at least 3 corners; this one has ${area.points.length}. Type them or click them on the plan.`,
        );
      }
      area.points.forEach((p, i) => {
        checkNumber(errors, paths.point(area.key, i, 'x'), p.x, 'x in metres');
        checkNumber(errors, paths.point(area.key, i, 'y'), p.y, 'y in metres');
      });
    }
    area.sides.forEach((side, i) => {
      if (side.kind === null) {
        errors.set(
          paths.side(area.key, i),
          'Choose the kind of this side (or “No trim” where it meets another area)',
        );
      }
      if (side.kind === 'wall' && side.upstandM.trim() !== '') {
        checkNumber(
          errors,
          paths.sideUpstand(area.key, i),
          side.upstandM,
          'the upstand in metres',
          'non-negative',
        );
      }
    });
    if (area.hasFall) {
      checkNumber(errors, paths.fallRise(area.key), area.fallRiseMm, 'the rise in mm', 'non-negative');
      checkNumber(errors, paths.fallRun(area.key), area.fallRunM, 'the run in metres', 'positive');
    }
  });
  draft.freeEdges.forEach((edge) => {
    checkNumber(errors, paths.edgeLength(edge.key), edge.lengthM, 'the length in metres', 'non-negative');
    if (edge.kind === 'wall' && edge.upstandM.trim() !== '') {
      checkNumber(
        errors,
        paths.edgeUpstand(edge.key),
        edge.upstandM,
        'the upstand in metres',
        'non-negative',
      );
    }
  });
  checkNumber(errors, paths.pipes, draft.pipes, 'the number of pipes', 'count');
  checkNumber(errors, paths.outlets, draft.outlets, 'the number of outlets', 'count');
  if (draft.cornersGiven) {
    checkNumber(errors, paths.cornersExternal, draft.cornersExternal, 'the external corners', 'count');
    checkNumber(errors, paths.cornersInternal, draft.cornersInternal, 'the internal corners', 'count');
  }
  return errors;
}

/** The first problem of an area or its fields, for the area's card and the plan. */
export function areaFieldErrors(errors: Map<FieldPath, string>, areaKey: string): string[] {
  const prefix = `area:${areaKey}:`;
  return [...errors.entries()].filter(([path]) => path.startsWith(prefix)).map(([, message]) => message);
}

export interface AreaCheck {
  key: string;
  /** from the domain (rectangleArea or polygonArea) */
  areaM2: Decimal | null;
  /** the domain's sentence when it refuses the geometry */
  problem: string | null;
  /** what is still to be typed before the domain can measure the area */
  incomplete: string | null;
  /** checkFall of the area's fall, when one is given and readable */
  fall: (FallCheck & { ratio: string }) | null;
  fallProblem: string | null;
}

function domainMessage(error: unknown): string {
  if (error instanceof DomainError) {
    return error.message;
  }
  throw error;
}

/** The area as the domain takes it, when its numbers are readable. */
function domainArea(area: AreaDraft): Roof['areas'][number] | null {
  if (area.shape === 'rectangle') {
    if (parseDecimal(area.lengthM) === null || parseDecimal(area.widthM) === null) {
      return null;
    }
    return { name: area.name, lengthM: clean(area.lengthM), widthM: clean(area.widthM) };
  }
  if (area.points.some((p) => parseDecimal(p.x) === null || parseDecimal(p.y) === null)) {
    return null;
  }
  return { name: area.name, polygon: area.points.map((p) => [clean(p.x), clean(p.y)] as const) };
}

const MM_PER_M = 1000;

/** Each area measured by the domain, with the domain's message where its geometry is refused. */
export function checkAreas(draft: RoofDraft): AreaCheck[] {
  return draft.areas.map((area) => {
    let areaM2: Decimal | null = null;
    let problem: string | null = null;
    let incomplete: string | null = null;
    const shaped = domainArea(area);
    if (shaped === null) {
      incomplete =
        area.shape === 'rectangle'
          ? 'Enter the length and width in metres.'
          : 'Every corner needs x and y in metres.';
    } else if ('polygon' in shaped && shaped.polygon.length < 3) {
      incomplete = 'A polygon needs at least 3 corners.';
    } else {
      try {
        areaM2 =
          'polygon' in shaped
            ? polygonArea(shaped.polygon)
            : rectangleArea(shaped.lengthM, shaped.widthM, `“${area.name}”`);
      } catch (error) {
        problem = domainMessage(error);
      }
    }
    let fall: AreaCheck['fall'] = null;
    let fallProblem: string | null = null;
    if (area.hasFall) {
      const rise = parseDecimal(area.fallRiseMm);
      const run = parseDecimal(area.fallRunM);
      if (rise !== null && run !== null) {
        try {
          const runMm = run.times(MM_PER_M);
          const check = checkFall(rise, runMm);
          fall = {
            ...check,
            ratio: rise.isZero() ? 'level' : `1:${runMm.div(rise).toDecimalPlaces(0).toString()}`,
          };
        } catch (error) {
          fallProblem = domainMessage(error);
        }
      }
    }
    return { key: area.key, areaM2, problem, incomplete, fall, fallProblem };
  });
}

function edgeFromSide(kind: EdgeKind, length: Decimal, side: SideDraft): RoofEdge {
  if (kind === 'wall' && parseDecimal(side.upstandM) !== null) {
    return { kind, lengthM: length.toString(), upstandM: clean(side.upstandM) };
  }
  return { kind, lengthM: length.toString() };
}

/** The edges of the roof in order: each area's sides round the area, then the edges measured apart. */
export function draftEdges(
  draft: RoofDraft,
): (RoofEdge & { areaIndex: number | null; side: number | null; label: string | null })[] {
  const edges: (RoofEdge & { areaIndex: number | null; side: number | null; label: string | null })[] = [];
  draft.areas.forEach((area, areaIndex) => {
    const lengths = sideLengths(area);
    area.sides.forEach((side, i) => {
      const length = lengths[i];
      if (side.kind === null || side.kind === 'none' || length === null || length === undefined) {
        return;
      }
      edges.push({ ...edgeFromSide(side.kind, length, side), areaIndex, side: i, label: null });
    });
  });
  draft.freeEdges.forEach((edge) => {
    const length = parseDecimal(edge.lengthM);
    if (length === null) {
      return;
    }
    const base: RoofEdge =
      edge.kind === 'wall' && parseDecimal(edge.upstandM) !== null
        ? { kind: edge.kind, lengthM: length.toString(), upstandM: clean(edge.upstandM) }
        : { kind: edge.kind, lengthM: length.toString() };
    edges.push({
      ...base,
      areaIndex: null,
      side: null,
      label: edge.label.trim() === '' ? null : edge.label.trim(),
    });
  });
  return edges;
}

function whole(text: string): number {
  const d = parseDecimal(text);
  return d !== null && d.isInteger() && d.gte(0) ? d.toNumber() : 0;
}

export interface RoofPreview {
  areas: AreaCheck[];
  /** the domain's take-off of the areas that measure, or null when none does */
  takeoff: Estimate | null;
  /** a refusal of the roof as a whole (an edge), from the domain */
  problem: string | null;
  /** names of areas left out of the totals because of a problem */
  leftOut: string[];
}

/**
 * The live totals: estimateRoof over the areas whose geometry the domain accepts (the others are
 * named in leftOut), with the edges, pipes and outlets as typed. `upstandM` is the build-up's
 * default upstand for walls that give none.
 */
export function previewRoof(draft: RoofDraft, buildUp: { upstandM?: string } = {}): RoofPreview {
  const areas = checkAreas(draft);
  const good = draft.areas.flatMap((area, i) => {
    const shaped = areas[i]?.areaM2 ? domainArea(area) : null;
    return shaped ? [shaped] : [];
  });
  const leftOut = draft.areas
    .filter((_, i) => areas[i]?.areaM2 === null)
    .map((a) => a.name || 'An unnamed area');
  if (good.length === 0) {
    return { areas, takeoff: null, problem: null, leftOut };
  }
  const roof: Roof = {
    areas: good,
    edges: draftEdges(draft).map(({ kind, lengthM, upstandM }) =>
      upstandM === undefined ? { kind, lengthM } : { kind, lengthM, upstandM },
    ),
    pipes: whole(draft.pipes),
    outlets: whole(draft.outlets),
    ...(draft.cornersGiven
      ? { corners: { external: whole(draft.cornersExternal), internal: whole(draft.cornersInternal) } }
      : {}),
  };
  try {
    const takeoff = estimateRoof(roof, buildUp.upstandM ? { upstandM: buildUp.upstandM } : {});
    return { areas, takeoff, problem: null, leftOut };
  } catch (error) {
    return { areas, takeoff: null, problem: domainMessage(error), leftOut };
  }
}

/** The body of PUT /roof; call only when fieldErrors is empty. */
export function toRoofBody(draft: RoofDraft): RoofBody {
  return {
    areas: draft.areas.map((area) => {
      const fall = area.hasFall ? { riseMm: clean(area.fallRiseMm), runM: clean(area.fallRunM) } : null;
      return area.shape === 'rectangle'
        ? {
            name: area.name.trim(),
            shape: 'rectangle',
            lengthM: clean(area.lengthM),
            widthM: clean(area.widthM),
            fall,
          }
        : {
            name: area.name.trim(),
            shape: 'polygon',
            points: area.points.map((p) => [clean(p.x), clean(p.y)]),
            fall,
          };
    }),
    edges: draftEdges(draft).map((e) => ({
      kind: e.kind,
      lengthM: String(e.lengthM),
      upstandM: e.upstandM === undefined ? null : String(e.upstandM),
      areaIndex: e.areaIndex,
      side: e.side,
      label: e.label,
    })),
    pipes: whole(draft.pipes),
    outlets: whole(draft.outlets),
    corners: draft.cornersGiven
      ? { external: whole(draft.cornersExternal), internal: whole(draft.cornersInternal) }
      : null,
    notes: draft.notes.trim() === '' ? null : draft.notes.trim(),
  };
}

/** The stored roof as the editor's working copy; a side without an edge means no trim. */
export function fromStoredRoof(roof: StoredRoof | null): RoofDraft {
  if (roof === null) {
    return emptyDraft();
  }
  const areas: AreaDraft[] = roof.areas.map((a) => {
    const points = (a.points ?? []).map(([x, y]) => ({ x, y }));
    const area: AreaDraft = {
      key: newKey('area'),
      name: a.name,
      shape: a.shape,
      lengthM: a.lengthM ?? '',
      widthM: a.widthM ?? '',
      points,
      hasFall: a.fall !== null,
      fallRiseMm: a.fall?.riseMm ?? '',
      fallRunM: a.fall?.runM ?? '',
      sides: [],
    };
    area.sides = Array.from({ length: sideCount(area) }, () => ({ kind: 'none' as SideKind, upstandM: '' }));
    return area;
  });
  const freeEdges: FreeEdgeDraft[] = [];
  for (const edge of roof.edges) {
    const area = edge.areaIndex === null ? undefined : areas[edge.areaIndex];
    const side = area && edge.side !== null ? area.sides[edge.side] : undefined;
    if (side && side.kind === 'none') {
      side.kind = edge.kind;
      side.upstandM = edge.upstandM ?? '';
    } else {
      freeEdges.push({
        key: newKey('edge'),
        kind: edge.kind,
        lengthM: edge.lengthM,
        upstandM: edge.upstandM ?? '',
        label: edge.label ?? '',
      });
    }
  }
  return {
    areas: areas.length > 0 ? areas : [newArea(0)],
    freeEdges,
    pipes: String(roof.pipes),
    outlets: String(roof.outlets),
    cornersGiven: roof.corners !== null,
    cornersExternal: String(roof.corners?.external ?? 0),
    cornersInternal: String(roof.corners?.internal ?? 0),
    notes: roof.notes ?? '',
  };
}

/** A grid point for a click at (x, y) metres: the nearest multiple of the step, written exactly. */
export function snapToGrid(x: number, y: number, step: string): PointDraft {
  const s = new Decimal(step);
  const snap = (v: number) => s.times(Math.round(v / s.toNumber())).toString();
  return { x: snap(x), y: snap(y) };
}
