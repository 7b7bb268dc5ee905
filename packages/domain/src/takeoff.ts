import { Decimal, Numeric, nonNegative, positive, percentToFraction, ONE } from './decimal';
import { DomainError } from './errors';

/** Standard trim length, 3 m. [practice] TRADE.md "trim lengths". */
export const DEFAULT_TRIM_LENGTH_M = 3;
/** Lap of one trim length over the next, 50 mm. [practice] TRADE.md "trim lengths". */
export const DEFAULT_TRIM_LAP_M = 0.05;
/** Lap of one run of mat over the next, about 50 mm. [practice] TRADE.md step 4. */
export const DEFAULT_MAT_LAP_M = 0.05;
/**
 * Density of E-glass, 2.56 g/cm³, for the rule of mixtures.
 * [pub] rule of mixtures as in ISO 12215-5 Annex C; the constant itself [memory].
 */
export const GLASS_DENSITY_G_PER_CM3 = 2.56;
/**
 * Density of cured polyester resin, 1.2 g/cm³, for the rule of mixtures.
 * [pub] rule of mixtures as in ISO 12215-5 Annex C; the constant itself [memory].
 */
export const RESIN_DENSITY_G_PER_CM3 = 1.2;

const GRAMS_PER_KG = new Decimal(1000);

/** Grams per m² as kg per m²: 450 → 0.45. */
export function gsmToKgPerM2(gsm: Numeric): Decimal {
  return nonNegative(gsm, 'mat weight (g/m²)').div(GRAMS_PER_KG);
}

/**
 * How many trim lengths one straight run needs: n lengths cover n·L − (n−1)·lap, so
 * n = ⌈(run − lap) / (L − lap)⌉, at least 1 for any run above zero; 0 m needs 0.
 */
export function trimLengthsForRun(runM: Numeric, opts: { lengthM?: Numeric; lapM?: Numeric } = {}): number {
  const run = nonNegative(runM, 'run length (m)');
  const length = positive(opts.lengthM ?? DEFAULT_TRIM_LENGTH_M, 'trim length (m)');
  const lap = nonNegative(opts.lapM ?? DEFAULT_TRIM_LAP_M, 'trim lap (m)');
  if (lap.gte(length)) {
    throw new DomainError(
      `The trim lap (${lap.toString()} m) must be shorter than the trim length (${length.toString()} m).`,
    );
  }
  return lengthsForRun(run, new TrimStep(length, lap));
}

/** A trim length less its lap: what each further length adds to a run. Worked out once per build-up. */
export class TrimStep {
  readonly step: Decimal;
  private readonly stepNumber: number;
  private readonly lapNumber: number;

  constructor(
    readonly length: Decimal,
    readonly lap: Decimal,
  ) {
    this.step = length.minus(lap);
    this.stepNumber = this.step.toNumber();
    this.lapNumber = lap.toNumber();
  }

  /** ⌈(run − lap) / step⌉ for a run longer than one length, exact. */
  lengthsBeyondOne(run: Decimal): number {
    // A guess in binary floats is right unless the quotient lies within rounding of a whole number;
    // only then are exact decimal products needed: step·(n−1) < run − lap ≤ step·n.
    const q = (run.toNumber() - this.lapNumber) / this.stepNumber;
    const n = Math.ceil(q);
    if (Math.abs(q - Math.round(q)) > 1e-9 * Math.max(1, q)) {
      return n;
    }
    const need = run.minus(this.lap);
    let exact = Math.max(1, n);
    while (this.step.times(exact).lt(need)) {
      exact += 1;
    }
    while (exact > 1 && this.step.times(exact - 1).gte(need)) {
      exact -= 1;
    }
    return exact;
  }
}

/** Trim lengths for a run already checked, with the step of a checked build-up. */
export function lengthsForRun(run: Decimal, step: TrimStep): number {
  if (run.lte(step.length)) {
    return run.isZero() ? 0 : 1;
  }
  return step.lengthsBeyondOne(run);
}

/**
 * The m² of mat to buy for an area: area × layers × rollWidth / (rollWidth − lap) × (1 + wastage/100).
 * The roll-width factor pays for the lap between runs.
 */
export function matAreaForDeck(
  areaM2: Numeric,
  opts: { rollWidthM: Numeric; lapM?: Numeric; layers?: Numeric; wastagePct?: Numeric },
): Decimal {
  const area = nonNegative(areaM2, 'area (m²)');
  const width = positive(opts.rollWidthM, 'roll width (m)');
  const lap = nonNegative(opts.lapM ?? DEFAULT_MAT_LAP_M, 'mat lap (m)');
  const layers = positive(opts.layers ?? 1, 'layers');
  const wastage = nonNegative(opts.wastagePct ?? 0, 'mat wastage (%)');
  if (!layers.isInteger()) {
    throw new DomainError(`layers must be a whole number (got ${layers.toString()}).`);
  }
  if (lap.gte(width)) {
    throw new DomainError(
      `The mat lap (${lap.toString()} m) must be narrower than the roll (${width.toString()} m).`,
    );
  }
  return area
    .times(layers)
    .times(width)
    .div(width.minus(lap))
    .times(ONE.plus(percentToFraction(wastage)));
}

/** kg of base resin to wet out mat: matM2 × gsm / 1000 × resin-to-glass ratio. */
export function resinForMat(matM2: Numeric, matGsm: Numeric, resinToGlass: Numeric): Decimal {
  const mat = nonNegative(matM2, 'mat (m²)');
  const kgPerM2 = gsmToKgPerM2(positive(matGsm, 'mat weight (g/m²)'));
  const ratio = positive(resinToGlass, 'resin-to-glass ratio');
  return mat.times(kgPerM2).times(ratio);
}

/** The glass weight fraction of a laminate laid at a resin-to-glass ratio: 1 / (1 + ratio). 2.5 → 0.2857… */
export function glassWeightFraction(resinToGlass: Numeric): Decimal {
  const ratio = nonNegative(resinToGlass, 'resin-to-glass ratio');
  return ONE.div(ONE.plus(ratio));
}

/**
 * Cured thickness in mm of one layer of mat by the rule of mixtures:
 * t = w · (1/ρg + (1/ψ − 1)/ρr), w in kg/m², ψ the glass weight fraction (0 < ψ ≤ 1),
 * ρg and ρr in g/cm³ (kg/m² ÷ g/cm³ = mm).
 */
export function laminateThicknessMm(matGsm: Numeric, glassWeightFractionValue: Numeric): Decimal {
  const w = gsmToKgPerM2(positive(matGsm, 'mat weight (g/m²)'));
  const psi = positive(glassWeightFractionValue, 'glass weight fraction');
  if (psi.gt(1)) {
    throw new DomainError(
      `The glass weight fraction is a fraction between 0 and 1 (got ${psi.toString()}); 30 % is 0.3.`,
    );
  }
  const glass = ONE.div(GLASS_DENSITY_G_PER_CM3);
  const resin = ONE.div(psi).minus(ONE).div(RESIN_DENSITY_G_PER_CM3);
  return w.times(glass.plus(resin));
}
