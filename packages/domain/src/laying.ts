import { Decimal, Numeric, toDecimal, nonNegative, positive, HUNDRED } from './decimal';
import { DomainError } from './errors';

/** Magnus coefficient a = 17.62 (over water). [pub] WMO-No. 8, Guide to Instruments and Methods of Observation. */
export const MAGNUS_A = 17.62;
/** Magnus coefficient b = 243.12 °C (over water). [pub] WMO-No. 8. */
export const MAGNUS_B_C = 243.12;
/** Air temperatures the Magnus formula is given for, −45 to 60 °C over water. [pub] WMO-No. 8; the range [memory]. */
export const MAGNUS_RANGE_C = { min: -45, max: 60 } as const;

/** Minimum air and deck temperature for laying resin, 5 °C. [practice] TRADE.md "When resin may be laid". */
export const MIN_LAYING_TEMPERATURE_C = 5;

/** The limits of a laying check. */
export interface LayingRules {
  /** lowest air temperature, °C */
  minAirC: Numeric;
  /** lowest deck (surface) temperature, °C */
  minSurfaceC: Numeric;
  /** how far the deck must be above the dew point, K */
  dewPointMarginK: Numeric;
  /** highest relative humidity, % */
  maxRelativeHumidityPct: Numeric;
}

/**
 * The default laying check:
 * - 5 °C minimum air and deck: [practice] TRADE.md;
 * - deck ≥ dew point + 3 K: [pub] ISO 8502-4 (method), ISO 12944-7;
 * - relative humidity ≤ 85 %: [practice], as used with ISO 12944-7.
 */
export const DEFAULT_LAYING_RULES: Readonly<LayingRules> = Object.freeze({
  minAirC: MIN_LAYING_TEMPERATURE_C,
  minSurfaceC: MIN_LAYING_TEMPERATURE_C,
  dewPointMarginK: 3,
  maxRelativeHumidityPct: 85,
});

/** One catalyst band: from `fromC` (inclusive) up to the next band's `fromC`, dose `percent` of resin + topcoat weight. */
export interface CatalystBand {
  fromC: Numeric;
  percent: Numeric;
}

/**
 * Catalyst dose by air temperature, % of resin + topcoat weight: about 3 % cold, 2 % around
 * 20 °C, 1 % hot. [practice] TRADE.md "catalyst (MEKP)". The first band starts at the minimum
 * laying temperature.
 */
export const DEFAULT_CATALYST_BANDS: readonly CatalystBand[] = Object.freeze([
  { fromC: 5, percent: 3 },
  { fromC: 10, percent: 2.5 },
  { fromC: 15, percent: 2 },
  { fromC: 25, percent: 1.5 },
  { fromC: 30, percent: 1 },
]);

/** A catalyst dose is never under 1 % nor over 4 % of resin + topcoat weight. [practice] TRADE.md. */
export const CATALYST_LIMITS_PCT = { min: 1, max: 4 } as const;

/** Design fall 1:40 and minimum finished fall 1:80. [pub] BS 6229:2018. */
export const FALL_RATIOS = { design: 40, minimumFinished: 80 } as const;

/**
 * Rough working time (pot life) of catalysed resin by air temperature at the default doses.
 * [practice] rough figures, no source: the resin's data sheet rules.
 */
export const WORKING_TIME_BANDS: readonly { fromC: number; minMinutes: number; maxMinutes: number }[] = Object.freeze([
  { fromC: 5, minMinutes: 25, maxMinutes: 40 },
  { fromC: 10, minMinutes: 20, maxMinutes: 30 },
  { fromC: 15, minMinutes: 15, maxMinutes: 25 },
  { fromC: 25, minMinutes: 10, maxMinutes: 20 },
  { fromC: 30, minMinutes: 8, maxMinutes: 15 },
]);

/**
 * Roof slope categories of ETAG 005: S1 < 5 %, S2 5–10 %, S3 10–30 %, S4 > 30 %.
 * [pub] ETAG 005 (now EAD 030350-00-0402); the middle bands [memory].
 */
export const SLOPE_CATEGORY_LIMITS_PCT = { s2From: 5, s3From: 10, s4Above: 30 } as const;

/** One decimal place for messages. */
function show(d: Decimal): string {
  return d.toDecimalPlaces(1).toString();
}

/**
 * Dew point in °C by the Magnus formula: γ = ln(RH/100) + a·T/(b+T); Td = b·γ/(a−γ),
 * a = 17.62, b = 243.12 °C. RH must be above 0 and at most 100 %.
 */
export function dewPointC(airC: Numeric, relativeHumidityPct: Numeric): Decimal {
  const t = toDecimal(airC, 'air temperature (°C)');
  const rh = positive(relativeHumidityPct, 'relative humidity (%)');
  if (rh.gt(HUNDRED)) {
    throw new DomainError(`Relative humidity cannot be above 100 % (got ${rh.toString()} %).`);
  }
  if (t.lt(MAGNUS_RANGE_C.min) || t.gt(MAGNUS_RANGE_C.max)) {
    throw new DomainError(
      `The dew point formula holds from ${MAGNUS_RANGE_C.min} to ${MAGNUS_RANGE_C.max} °C (got ${t.toString()} °C).`,
    );
  }
  const a = new Decimal(MAGNUS_A);
  const b = new Decimal(MAGNUS_B_C);
  const gamma = rh.div(HUNDRED).ln().plus(a.times(t).div(b.plus(t)));
  return b.times(gamma).div(a.minus(gamma));
}

/** What a laying check found. `dewPointC` is given so the crew can see the margin. */
export interface LayingCheck {
  ok: boolean;
  problems: string[];
  dewPointC: Decimal;
}

/**
 * Whether a day's air, deck temperature, humidity and rain allow resin work. Refuses air or deck
 * below 5 °C, a deck less than 3 °C above the dew point, humidity above 85 % and rain (defaults of
 * DEFAULT_LAYING_RULES). Each problem is a sentence a crew understands.
 */
export function checkLayingConditions(
  conditions: { airC: Numeric; surfaceC: Numeric; relativeHumidityPct: Numeric; raining: boolean },
  rules: LayingRules = DEFAULT_LAYING_RULES,
): LayingCheck {
  const air = toDecimal(conditions.airC, 'air temperature (°C)');
  const deck = toDecimal(conditions.surfaceC, 'deck temperature (°C)');
  const rh = toDecimal(conditions.relativeHumidityPct, 'relative humidity (%)');
  const minAir = toDecimal(rules.minAirC, 'minimum air temperature (°C)');
  const minDeck = toDecimal(rules.minSurfaceC, 'minimum deck temperature (°C)');
  const margin = nonNegative(rules.dewPointMarginK, 'dew point margin (K)');
  const maxRh = positive(rules.maxRelativeHumidityPct, 'maximum relative humidity (%)');
  const dew = dewPointC(air, rh);
  const problems: string[] = [];

  if (conditions.raining) {
    problems.push('It is raining: resin cannot be laid on a wet deck. Wait until the rain stops and the deck is dry.');
  }
  if (air.lt(minAir)) {
    problems.push(
      `The air is ${show(air)} °C; resin needs at least ${show(minAir)} °C to cure. Wait until it is warmer.`,
    );
  }
  if (deck.lt(minDeck)) {
    problems.push(
      `The deck is ${show(deck)} °C; it needs to be at least ${show(minDeck)} °C before resin goes on.`,
    );
  }
  const above = deck.minus(dew);
  if (above.lt(margin)) {
    problems.push(
      `The deck (${show(deck)} °C) is only ${show(above)} °C above the dew point (${show(dew)} °C); ` +
        `it must be at least ${show(margin)} °C above it, or damp will form under the resin.`,
    );
  }
  if (rh.gt(maxRh)) {
    problems.push(`The humidity is ${show(rh)} %; resin should not be laid above ${show(maxRh)} %.`);
  }
  return { ok: problems.length === 0, problems, dewPointC: dew };
}

/** Checks catalyst bands (at least one, rising temperatures, each dose within 1–4 %) and returns them in Decimals. */
export function checkCatalystBands(bands: readonly CatalystBand[]): { fromC: Decimal; percent: Decimal }[] {
  if (bands.length === 0) {
    throw new DomainError('The catalyst bands are empty: give at least one band.');
  }
  const out = bands.map((band, i) => ({
    fromC: toDecimal(band.fromC, `fromC of catalyst band ${i + 1}`),
    percent: toDecimal(band.percent, `percent of catalyst band ${i + 1}`),
  }));
  out.forEach((band, i) => {
    if (band.percent.lt(CATALYST_LIMITS_PCT.min) || band.percent.gt(CATALYST_LIMITS_PCT.max)) {
      throw new DomainError(
        `Catalyst band ${i + 1} gives ${band.percent.toString()} %; a dose must stay between ${CATALYST_LIMITS_PCT.min} % and ${CATALYST_LIMITS_PCT.max} % of resin + topcoat.`,
      );
    }
    const before = out[i - 1];
    if (before && !band.fromC.gt(before.fromC)) {
      throw new DomainError('The catalyst bands must be in rising order of temperature.');
    }
  });
  return out;
}

/**
 * Catalyst dose as % of resin + topcoat weight for the air temperature, from the bands (each
 * from its `fromC` up to the next band). Below the minimum laying temperature, or below the
 * first band, it throws DomainError (`too-cold`): resin is not laid then.
 */
export function catalystPercent(airC: Numeric, bands: readonly CatalystBand[] = DEFAULT_CATALYST_BANDS): Decimal {
  const air = toDecimal(airC, 'air temperature (°C)');
  const checked = checkCatalystBands(bands);
  const first = checked[0] as { fromC: Decimal; percent: Decimal };
  const lowest = Decimal.max(first.fromC, MIN_LAYING_TEMPERATURE_C);
  if (air.lt(lowest)) {
    throw new DomainError(
      `The air is ${show(air)} °C, below the ${show(lowest)} °C minimum for laying resin: no catalyst dose is given.`,
      'too-cold',
    );
  }
  let dose = first.percent;
  for (const band of checked) {
    if (air.gte(band.fromC)) {
      dose = band.percent;
    }
  }
  return dose;
}

/** A fall check: ok, warning or error, with a sentence saying why. */
export interface FallCheck {
  level: 'ok' | 'warning' | 'error';
  message: string;
}

/**
 * A roof's fall against BS 6229:2018: 1:40 or steeper is ok; flatter than 1:40 but not flatter
 * than 1:80 warns (the finished fall may end up under 1:80); flatter than 1:80, or level, is an
 * error. Rise and run in the same unit.
 */
export function checkFall(rise: Numeric, run: Numeric): FallCheck {
  const r = nonNegative(rise, 'rise');
  const l = positive(run, 'run');
  const { design, minimumFinished } = FALL_RATIOS;
  if (r.isZero()) {
    return {
      level: 'error',
      message: `The roof is level: BS 6229:2018 asks for a design fall of 1:${design} so the finished roof falls at least 1:${minimumFinished}. Add firrings or tapered boards.`,
    };
  }
  const fall = `1:${show(l.div(r))}`;
  if (r.times(design).gte(l)) {
    return { level: 'ok', message: `A fall of ${fall} meets the 1:${design} design fall of BS 6229:2018.` };
  }
  if (r.times(minimumFinished).gte(l)) {
    return {
      level: 'warning',
      message: `A fall of ${fall} is flatter than the 1:${design} design fall of BS 6229:2018; with any sag or building error the finished roof may fall less than 1:${minimumFinished} and hold water. Check the levels.`,
    };
  }
  return {
    level: 'error',
    message: `A fall of ${fall} is flatter than 1:${minimumFinished}, the least finished fall BS 6229:2018 allows: water will pond. Add firrings or tapered boards.`,
  };
}

/** ETAG 005 roof slope category. */
export type SlopeCategory = 'S1' | 'S2' | 'S3' | 'S4';

/** The ETAG 005 slope category of a roof from rise and run (same unit): S1 < 5 %, S2 5–10 %, S3 10–30 %, S4 > 30 %. */
export function slopeCategory(rise: Numeric, run: Numeric): SlopeCategory {
  const pct = nonNegative(rise, 'rise').div(positive(run, 'run')).times(HUNDRED);
  if (pct.lt(SLOPE_CATEGORY_LIMITS_PCT.s2From)) {
    return 'S1';
  }
  if (pct.lt(SLOPE_CATEGORY_LIMITS_PCT.s3From)) {
    return 'S2';
  }
  if (pct.lte(SLOPE_CATEGORY_LIMITS_PCT.s4Above)) {
    return 'S3';
  }
  return 'S4';
}

/** A rough working time, in whole minutes, with a sentence for the crew. */
export interface WorkingTimeHint {
  minMinutes: number;
  maxMinutes: number;
  text: string;
}

/**
 * Rough working time (pot life) of catalysed resin at an air temperature, from WORKING_TIME_BANDS
 * ([practice] rough figures). Below the minimum laying temperature it throws DomainError (`too-cold`).
 */
export function workingTimeHint(airC: Numeric): WorkingTimeHint {
  const air = toDecimal(airC, 'air temperature (°C)');
  if (air.lt(MIN_LAYING_TEMPERATURE_C)) {
    throw new DomainError(
      `The air is ${show(air)} °C, below the ${MIN_LAYING_TEMPERATURE_C} °C minimum for laying resin.`,
      'too-cold',
    );
  }
  let band = WORKING_TIME_BANDS[0] as (typeof WORKING_TIME_BANDS)[number];
  for (const b of WORKING_TIME_BANDS) {
    if (air.gte(b.fromC)) {
      band = b;
    }
  }
  return {
    minMinutes: band.minMinutes,
    maxMinutes: band.maxMinutes,
    text:
      `At ${show(air)} °C expect roughly ${band.minMinutes}–${band.maxMinutes} minutes of working time once the catalyst is in. ` +
      'Mix only what can be laid in that time, keep mixed resin out of the sun, and go by the resin’s data sheet.',
  };
}
