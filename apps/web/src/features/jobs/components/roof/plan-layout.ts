import type { Decimal } from '@potlife/domain';
import { parseDecimal, sideLengths, type AreaDraft, type SideKind } from './roof-model';

// Where things go on the plan, in metres (y upwards) and then in SVG pixels. Only drawing: the
// lengths printed come from sideLengths (exact decimals), the areas from the domain.

export interface PlanPoint {
  x: number;
  y: number;
}

export interface PlanSide {
  index: number;
  from: PlanPoint;
  to: PlanPoint;
  kind: SideKind;
  length: Decimal | null;
  /** unit vector pointing out of the area (for hatching walls and placing dimensions) */
  outward: PlanPoint;
}

export interface PlanArea {
  key: string;
  index: number;
  name: string;
  outline: PlanPoint[];
  sides: PlanSide[];
  /** where the label goes */
  centre: PlanPoint;
}

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

const GAP_M = 1.5;

function num(text: string): number | null {
  const d = parseDecimal(text);
  return d === null ? null : d.toNumber();
}

function signedArea(points: PlanPoint[]): number {
  let twice = 0;
  points.forEach((p, i) => {
    const q = points[(i + 1) % points.length] as PlanPoint;
    twice += p.x * q.y - q.x * p.y;
  });
  return twice / 2;
}

function outlineOf(area: AreaDraft, origin: PlanPoint): PlanPoint[] | null {
  if (area.shape === 'rectangle') {
    const l = num(area.lengthM);
    const w = num(area.widthM);
    if (l === null || w === null || l <= 0 || w <= 0) {
      return null;
    }
    // Length along the bottom, then up the width: the sides are length, width, length, width.
    return [
      { x: origin.x, y: origin.y },
      { x: origin.x + l, y: origin.y },
      { x: origin.x + l, y: origin.y + w },
      { x: origin.x, y: origin.y + w },
    ];
  }
  const pts = area.points.map((p) => ({ x: num(p.x), y: num(p.y) }));
  if (pts.some((p) => p.x === null || p.y === null)) {
    return null;
  }
  return pts as PlanPoint[];
}

function boundsOf(points: PlanPoint[]): Bounds | null {
  if (points.length === 0) {
    return null;
  }
  return {
    minX: Math.min(...points.map((p) => p.x)),
    minY: Math.min(...points.map((p) => p.y)),
    maxX: Math.max(...points.map((p) => p.x)),
    maxY: Math.max(...points.map((p) => p.y)),
  };
}

export function unionBounds(a: Bounds | null, b: Bounds | null): Bounds | null {
  if (a === null) {
    return b;
  }
  if (b === null) {
    return a;
  }
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  };
}

function inside(p: PlanPoint, poly: PlanPoint[]): boolean {
  let odd = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i] as PlanPoint;
    const b = poly[j] as PlanPoint;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) {
      odd = !odd;
    }
  }
  return odd;
}

function distanceToSegment(p: PlanPoint, a: PlanPoint, b: PlanPoint): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t =
    dx === 0 && dy === 0
      ? 0
      : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/** Where an area's name fits best: the sampled inside point farthest from its outline. */
export function labelPoint(outline: PlanPoint[]): PlanPoint {
  const mean = {
    x: outline.reduce((s, p) => s + p.x, 0) / outline.length,
    y: outline.reduce((s, p) => s + p.y, 0) / outline.length,
  };
  const b = boundsOf(outline);
  if (b === null || outline.length < 3) {
    return mean;
  }
  const steps = 24;
  let best = mean;
  let bestDistance = inside(mean, outline)
    ? Math.min(
        ...outline.map((p, i) => distanceToSegment(mean, p, outline[(i + 1) % outline.length] as PlanPoint)),
      )
    : -1;
  for (let i = 1; i < steps; i++) {
    for (let j = 1; j < steps; j++) {
      const p = { x: b.minX + ((b.maxX - b.minX) * i) / steps, y: b.minY + ((b.maxY - b.minY) * j) / steps };
      if (!inside(p, outline)) {
        continue;
      }
      const d = Math.min(
        ...outline.map((q, k) => distanceToSegment(p, q, outline[(k + 1) % outline.length] as PlanPoint)),
      );
      if (d > bestDistance + 1e-9) {
        best = p;
        bestDistance = d;
      }
    }
  }
  return best;
}

/**
 * The areas on plan: polygons where their corners say, rectangles in a row to the right of them
 * (a rectangle has a size but no place).
 */
export function layOut(areas: AreaDraft[]): { areas: PlanArea[]; bounds: Bounds | null } {
  let polygonBounds: Bounds | null = null;
  areas.forEach((area) => {
    if (area.shape === 'polygon') {
      const outline = outlineOf(area, { x: 0, y: 0 });
      polygonBounds = unionBounds(polygonBounds, outline ? boundsOf(outline) : null);
    }
  });
  let nextX = polygonBounds === null ? 0 : (polygonBounds as Bounds).maxX + GAP_M;
  const baseY = polygonBounds === null ? 0 : (polygonBounds as Bounds).minY;
  let bounds: Bounds | null = polygonBounds;
  const placed: PlanArea[] = [];
  areas.forEach((area, index) => {
    const outline = outlineOf(area, { x: nextX, y: baseY });
    if (outline === null || outline.length < 2) {
      return;
    }
    if (area.shape === 'rectangle') {
      nextX = (outline[1] as PlanPoint).x + GAP_M;
    }
    bounds = unionBounds(bounds, boundsOf(outline));
    const lengths = sideLengths(area);
    const ccw = signedArea(outline) >= 0;
    const closed = outline.length >= 3;
    const count = closed ? outline.length : outline.length - 1;
    const sides: PlanSide[] = Array.from({ length: count }, (_, i) => {
      const from = outline[i] as PlanPoint;
      const to = outline[(i + 1) % outline.length] as PlanPoint;
      const dx = to.x - from.x;
      const dy = to.y - from.y;
      const len = Math.hypot(dx, dy) || 1;
      // Counter-clockwise (y up): the outside is to the right of the direction of travel.
      const outward = ccw ? { x: dy / len, y: -dx / len } : { x: -dy / len, y: dx / len };
      return { index: i, from, to, kind: area.sides[i]?.kind ?? null, length: lengths[i] ?? null, outward };
    });
    const centre = labelPoint(outline);
    placed.push({ key: area.key, index, name: area.name, outline, sides, centre });
  });
  return { areas: placed, bounds };
}

export interface Viewport {
  width: number;
  height: number;
  /** px per metre */
  scale: number;
  bounds: Bounds;
  toPx: (p: PlanPoint) => PlanPoint;
  toMetres: (p: PlanPoint) => PlanPoint;
}

export const PLAN_WIDTH_PX = 640;
const PAD_PX = 60;
const MAX_HEIGHT_PX = 560;

/** Fits the bounds (with room round them) into the plan's width; y upwards on the page. */
export function viewport(
  bounds: Bounds | null,
  minimum: Bounds = { minX: 0, minY: 0, maxX: 10, maxY: 6 },
): Viewport {
  const b = unionBounds(bounds, minimum) as Bounds;
  const spanX = Math.max(b.maxX - b.minX, 1);
  const spanY = Math.max(b.maxY - b.minY, 1);
  const scale = Math.min((PLAN_WIDTH_PX - 2 * PAD_PX) / spanX, (MAX_HEIGHT_PX - 2 * PAD_PX) / spanY);
  const width = PLAN_WIDTH_PX;
  const height = Math.round(spanY * scale + 2 * PAD_PX);
  const offsetX = (width - spanX * scale) / 2;
  return {
    width,
    height,
    scale,
    bounds: b,
    toPx: (p) => ({ x: offsetX + (p.x - b.minX) * scale, y: height - PAD_PX - (p.y - b.minY) * scale }),
    toMetres: (p) => ({ x: b.minX + (p.x - offsetX) / scale, y: b.minY + (height - PAD_PX - p.y) / scale }),
  };
}

/** A round length for the scale bar: about a fifth of the plan. */
export function scaleBarMetres(spanM: number): number {
  const target = spanM / 5;
  const steps = [0.5, 1, 2, 5, 10, 20, 50, 100];
  return steps.reduce((best, s) => (Math.abs(s - target) < Math.abs(best - target) ? s : best), 1);
}
