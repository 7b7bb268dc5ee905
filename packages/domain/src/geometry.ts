import { Decimal, Numeric, toDecimal, positive } from './decimal';
import { DomainError } from './errors';

/** A corner of an area on plan: [x, y] in metres. */
export type Point = readonly [Numeric, Numeric];

/**
 * A corner as whole numbers: every coordinate times 10^places, so the tests for crossing segments and
 * the shoelace sum are exact integer arithmetic (and fast), whatever decimals the corners carry.
 */
type P = { x: bigint; y: bigint };

function cross(o: P, a: P, b: P): bigint {
  return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
}

const sign = (v: bigint): number => (v > 0n ? 1 : v < 0n ? -1 : 0);
const min = (a: bigint, b: bigint): bigint => (a < b ? a : b);
const max = (a: bigint, b: bigint): bigint => (a > b ? a : b);

/** q lies within the bounding box of segment p–r (used once p, q, r are known to be collinear). */
function withinBox(p: P, q: P, r: P): boolean {
  return q.x >= min(p.x, r.x) && q.x <= max(p.x, r.x) && q.y >= min(p.y, r.y) && q.y <= max(p.y, r.y);
}

/** Segments a–b and c–d share at least one point (touching counts). */
function segmentsTouch(a: P, b: P, c: P, d: P): boolean {
  if (
    max(a.x, b.x) < min(c.x, d.x) ||
    max(c.x, d.x) < min(a.x, b.x) ||
    max(a.y, b.y) < min(c.y, d.y) ||
    max(c.y, d.y) < min(a.y, b.y)
  ) {
    return false;
  }
  const d1 = sign(cross(c, d, a));
  const d2 = sign(cross(c, d, b));
  const d3 = sign(cross(a, b, c));
  const d4 = sign(cross(a, b, d));
  if (d1 * d2 < 0 && d3 * d4 < 0) {
    return true;
  }
  return (
    (d1 === 0 && withinBox(c, a, d)) ||
    (d2 === 0 && withinBox(c, b, d)) ||
    (d3 === 0 && withinBox(a, c, b)) ||
    (d4 === 0 && withinBox(a, d, b))
  );
}

const PLAIN_DECIMAL = /^(-?)(\d+)(?:\.(\d+))?$/;

/** A coordinate as an integer and its number of decimal places: "7.31" → 731n, 2. Exact. */
function integerParts(value: Numeric, name: string): { units: bigint; places: number } {
  let text = typeof value === 'string' ? value.trim() : typeof value === 'number' ? String(value) : '';
  let match = PLAIN_DECIMAL.exec(text);
  if (match === null) {
    // Exponents, a Decimal, a leading '+': let decimal.js read it, then write it out plainly.
    text = toDecimal(value, name).toFixed();
    match = PLAIN_DECIMAL.exec(text) as RegExpExecArray;
  }
  const fraction = match[3] ?? '';
  return { units: BigInt(`${match[1] ?? ''}${match[2] ?? ''}${fraction}`), places: fraction.length };
}

/** The corners as integers on one scale (10^places). A closing corner that repeats the first is dropped. */
function toPoints(points: readonly Point[]): { pts: P[]; places: number } {
  if (!Array.isArray(points)) {
    throw new DomainError('An area polygon must be a list of [x, y] corners in metres.', 'invalid-polygon');
  }
  const raw = points.map((pt, i) => {
    if (!Array.isArray(pt) || pt.length !== 2) {
      throw new DomainError(`Corner ${i + 1} of the polygon must be a pair [x, y] in metres.`, 'invalid-polygon');
    }
    return [integerParts(pt[0], `x of corner ${i + 1}`), integerParts(pt[1], `y of corner ${i + 1}`)] as const;
  });
  let places = 0;
  for (const [x, y] of raw) {
    places = Math.max(places, x.places, y.places);
  }
  const up = (c: { units: bigint; places: number }): bigint => c.units * 10n ** BigInt(places - c.places);
  const pts = raw.map(([x, y]) => ({ x: up(x), y: up(y) }));
  // As GeoJSON rings do, a closing corner that repeats the first is accepted.
  const first = pts[0];
  const last = pts[pts.length - 1];
  if (pts.length > 3 && first && last && first.x === last.x && first.y === last.y) {
    pts.pop();
  }
  return { pts, places };
}

/**
 * The area in m² of a simple polygon with corners in metres, in either winding (shoelace formula,
 * exact). A repeated closing corner is accepted. Throws DomainError (`invalid-polygon`) for fewer
 * than 3 corners, two corners in a row at the same place, outline segments that cross, touch or fold back, or
 * zero area.
 */
export function polygonArea(points: readonly Point[]): Decimal {
  const { pts, places } = toPoints(points);
  const n = pts.length;
  if (n < 3) {
    throw new DomainError(`A polygon needs at least 3 corners; this one has ${n}.`, 'invalid-polygon');
  }
  const at = (i: number): P => pts[i % n] as P;

  for (let i = 0; i < n; i++) {
    const a = at(i);
    const b = at(i + 1);
    if (a.x === b.x && a.y === b.y) {
      throw new DomainError(
        `Corners ${i + 1} and ${((i + 1) % n) + 1} of the polygon are at the same place; remove one.`,
        'invalid-polygon',
      );
    }
  }

  if (pts.every((p) => cross(at(0), at(1), p) === 0n)) {
    throw new DomainError('The polygon has zero area: all its corners lie on one line.', 'invalid-polygon');
  }

  for (let i = 0; i < n; i++) {
    const a = at(i);
    const b = at(i + 1);
    // Neighbouring segments meet only at their shared corner; they may not fold back over each other.
    const c = at(i + 2);
    if (cross(a, b, c) === 0n && (a.x - b.x) * (c.x - b.x) + (a.y - b.y) * (c.y - b.y) > 0n) {
      throw new DomainError(
        `The polygon folds back on itself at corner ${((i + 1) % n) + 1}; its segments must not overlap.`,
        'invalid-polygon',
      );
    }
    // Segments that are not neighbours may not touch at all.
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) {
        continue;
      }
      if (segmentsTouch(a, b, at(j), at(j + 1))) {
        throw new DomainError(
          `Segments ${i + 1} and ${j + 1} of the polygon's outline cross or touch; draw the area as a simple outline or split it into areas.`,
          'invalid-polygon',
        );
      }
    }
  }

  let twice = 0n;
  for (let i = 0; i < n; i++) {
    const a = at(i);
    const b = at(i + 1);
    twice += a.x * b.y - b.x * a.y;
  }
  // A simple polygon whose corners are not all on one line has an area above zero.
  // area = |twice| / 2 / 10^(2·places) = |twice| × 5 / 10^(2·places + 1), written out exactly.
  const digits = ((twice < 0n ? -twice : twice) * 5n).toString();
  const shift = 2 * places + 1;
  const padded = digits.padStart(shift + 1, '0');
  return new Decimal(`${padded.slice(0, padded.length - shift)}.${padded.slice(padded.length - shift)}`);
}

/** The area in m² of a rectangle: length × width, both more than zero. */
export function rectangleArea(lengthM: Numeric, widthM: Numeric, name = 'area'): Decimal {
  return positive(lengthM, `lengthM of ${name}`).times(positive(widthM, `widthM of ${name}`));
}
