import { Decimal, Numeric, nonNegative, positive, ZERO } from './decimal';
import { DomainError } from './errors';

/** One size of pack and how many of it to buy. */
export interface PackCount {
  size: Decimal;
  count: number;
}

/** The packs to buy for a quantity: largest size first; `total` bought, `leftover` = total − quantity. */
export interface PackChoice {
  packs: PackCount[];
  total: Decimal;
  leftover: Decimal;
}

/** The largest search choosePacks will make, in steps of the pack sizes' common unit. */
export const MAX_PACK_SEARCH_STEPS = 2_000_000;

function gcd(a: number, b: number): number {
  let x = a;
  let y = b;
  while (y !== 0) {
    [x, y] = [y, x % y];
  }
  return x;
}

/**
 * The packs to buy for a quantity from the sizes on offer: least leftover first, then fewest packs;
 * among equal choices, the one with more of the larger packs. Exact in decimal (0.5 kg packs work).
 * A quantity of 0 buys nothing.
 */
export function choosePacks(quantity: Numeric, packSizes: readonly Numeric[]): PackChoice {
  const q = nonNegative(quantity, 'quantity');
  if (!Array.isArray(packSizes) || packSizes.length === 0) {
    throw new DomainError('Give at least one pack size.');
  }
  const sizes: Decimal[] = [];
  for (const [i, s] of packSizes.entries()) {
    const d = positive(s, `pack size ${i + 1}`);
    if (!sizes.some((x) => x.eq(d))) {
      sizes.push(d);
    }
  }
  sizes.sort((a, b) => b.comparedTo(a));
  if (q.isZero()) {
    return { packs: [], total: ZERO, leftover: ZERO };
  }

  // Work in whole steps of the sizes' greatest common unit.
  const places = Math.max(...sizes.map((s) => s.decimalPlaces()));
  const scale = new Decimal(10).pow(places);
  const scaled = sizes.map((s) => s.times(scale).toNumber());
  if (scaled.some((u) => !Number.isSafeInteger(u))) {
    throw new DomainError('These pack sizes are too large or too finely divided to combine.');
  }
  const g = scaled.reduce(gcd);
  const units = scaled.map((u) => u / g);
  const step = new Decimal(g).div(scale);
  const need = q.div(step).ceil();
  const largest = units[0] as number;
  const second = units[1] ?? 0;

  // An optimal choice holds fewer than `largest` packs of the other sizes (any `largest` of them
  // contain a group that sums to a whole number of largest packs, which would be fewer packs), so
  // everything beyond (largest − 1) × second steps is covered by largest packs.
  const otherLimit = (largest - 1) * second;
  if (otherLimit + 2 * largest > MAX_PACK_SEARCH_STEPS) {
    throw new DomainError('These pack sizes are too close together or too finely divided to combine.');
  }
  let preLargest = ZERO;
  if (need.gt(otherLimit + largest)) {
    preLargest = need.minus(otherLimit).div(largest).floor();
  }
  const rest = need.minus(preLargest.times(largest)).toNumber();

  const counts = new Map<number, number>();
  if (rest > 0) {
    const limit = rest + largest - 1;
    const best = new Array<number>(limit + 1).fill(Number.POSITIVE_INFINITY);
    const pick = new Array<number>(limit + 1).fill(0);
    best[0] = 0;
    for (let t = 1; t <= limit; t++) {
      for (const u of units) {
        const before = t >= u ? (best[t - u] as number) : Number.POSITIVE_INFINITY;
        if (before + 1 < (best[t] as number)) {
          best[t] = before + 1;
          pick[t] = u;
        }
      }
    }
    let t = rest;
    while (!Number.isFinite(best[t] as number)) {
      t++;
    }
    while (t > 0) {
      const u = pick[t] as number;
      counts.set(u, (counts.get(u) ?? 0) + 1);
      t -= u;
    }
  }
  counts.set(largest, (counts.get(largest) ?? 0) + preLargest.toNumber());

  const packs: PackCount[] = [];
  let total = ZERO;
  units.forEach((u, i) => {
    const c = counts.get(u) ?? 0;
    if (c > 0) {
      const size = sizes[i] as Decimal;
      packs.push({ size, count: c });
      total = total.plus(size.times(c));
    }
  });
  return { packs, total, leftover: total.minus(q) };
}

/**
 * What to order for a shortfall: nothing if there is none, otherwise packs for the shortfall or the
 * reorder quantity, whichever is more. `leftover` is what remains once the shortfall is covered.
 */
export function shortfallToOrder(
  shortfall: Numeric,
  packSizes: readonly Numeric[],
  reorderQuantity?: Numeric,
): PackChoice {
  const s = nonNegative(shortfall, 'shortfall');
  const r = nonNegative(reorderQuantity ?? 0, 'reorder quantity');
  if (s.isZero()) {
    return choosePacks(0, packSizes);
  }
  const choice = choosePacks(Decimal.max(s, r), packSizes);
  return { ...choice, leftover: choice.total.minus(s) };
}
