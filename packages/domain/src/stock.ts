import { Decimal, Numeric, nonNegative, toDecimal, roundMoney, count, ZERO } from './decimal';
import { IsoDate, parseDate, formatDate } from './dates';
import { DomainError, unexpected } from './errors';

// ── Shelf life ───────────────────────────────────────────────────────────────

/**
 * Shelf life in days from receipt, the short end of each range so nothing is counted on that
 * the maker may not give: resin and topcoat 3–6 months, catalyst 6–12 months.
 * [practice] TRADE.md "Storage, shelf life and hazards"; the lot's own expiry date rules.
 */
export const DEFAULT_SHELF_LIFE_DAYS = Object.freeze({ 'base-resin': 90, topcoat: 90, catalyst: 180 });

/** Highest storage temperature for resin, topcoat and catalyst, 25 °C. [practice] TRADE.md. */
export const DEFAULT_STORAGE_MAX_C = 25;

/**
 * The expiry date of a lot received on `receivedOn` with a shelf life of `shelfLifeDays`.
 * A lot may be used on its expiry date and is expired from the day after.
 */
export function expiryDate(receivedOn: IsoDate, shelfLifeDays: Numeric): IsoDate {
  const received = parseDate(receivedOn, 'receivedOn');
  const days = count(shelfLifeDays, 'shelf life (days)');
  return formatDate(received.add(days, 'day'));
}

/** Whether a lot is expired on a date: true from the day after its expiry date. */
export function isExpired(expiresOn: IsoDate, onDate: IsoDate): boolean {
  return parseDate(onDate, 'onDate').isAfter(parseDate(expiresOn, 'expiresOn'), 'day');
}

/** Whole days from `onDate` to the expiry date: 0 on the expiry date, negative once expired. */
export function daysToExpiry(expiresOn: IsoDate, onDate: IsoDate): number {
  return parseDate(expiresOn, 'expiresOn').diff(parseDate(onDate, 'onDate'), 'day');
}

/**
 * Whether a lot may be used on a date: not quarantined or flagged (`usable`), and still in date
 * `marginDays` after it (a margin for a job that runs on, or for delivery to site).
 */
export function lotUsableOn(lot: { expiresOn: IsoDate; usable: boolean }, date: IsoDate, marginDays: Numeric = 0): boolean {
  const margin = count(marginDays, 'margin (days)');
  const until = formatDate(parseDate(date, 'date').add(margin, 'day'));
  return lot.usable && !isExpired(lot.expiresOn, until);
}

// ── First expired, first out ─────────────────────────────────────────────────

/** A lot offered to allocateFefo. `usable` is false for a quarantined or temperature-flagged lot. */
export interface FefoLot {
  id: string;
  quantity: Numeric;
  expiresOn: IsoDate;
  usable: boolean;
}

export interface FefoAllocation {
  lotId: string;
  quantity: Decimal;
}

/** Why a lot was passed over. */
export type FefoSkipReason = 'expired' | 'unusable' | 'empty';

export interface FefoResult {
  allocations: FefoAllocation[];
  /** what could not be found in usable, in-date stock */
  shortfall: Decimal;
  skipped: { lotId: string; reason: FefoSkipReason }[];
}

/**
 * First expired, first out: takes `quantity` from the lots still in date on `useBy` and usable,
 * earliest expiry first (lots with the same expiry in the order given), never more than a lot
 * holds. What cannot be found is the shortfall.
 */
export function allocateFefo(lots: readonly FefoLot[], quantity: Numeric, useBy: IsoDate): FefoResult {
  let remaining = nonNegative(quantity, 'quantity');
  const day = parseDate(useBy, 'useBy');
  const seen = new Set<string>();
  const skipped: FefoResult['skipped'] = [];
  const candidates: { id: string; quantity: Decimal; expires: number; order: number }[] = [];
  lots.forEach((lot, order) => {
    if (seen.has(lot.id)) {
      throw new DomainError(`Lot ${lot.id} is listed twice.`);
    }
    seen.add(lot.id);
    const held = nonNegative(lot.quantity, `quantity of lot ${lot.id}`);
    const expires = parseDate(lot.expiresOn, `expiresOn of lot ${lot.id}`);
    if (!lot.usable) {
      skipped.push({ lotId: lot.id, reason: 'unusable' });
    } else if (day.isAfter(expires, 'day')) {
      skipped.push({ lotId: lot.id, reason: 'expired' });
    } else if (held.isZero()) {
      skipped.push({ lotId: lot.id, reason: 'empty' });
    } else {
      candidates.push({ id: lot.id, quantity: held, expires: expires.valueOf(), order });
    }
  });
  candidates.sort((a, b) => a.expires - b.expires || a.order - b.order);
  const allocations: FefoAllocation[] = [];
  for (const lot of candidates) {
    if (remaining.isZero()) {
      break;
    }
    const take = Decimal.min(lot.quantity, remaining);
    allocations.push({ lotId: lot.id, quantity: take });
    remaining = remaining.minus(take);
  }
  return { allocations, shortfall: remaining, skipped };
}

// ── Where a lot may be stored ────────────────────────────────────────────────

/** UN dangerous-goods class of a material as stored, or `none`. Accelerators are stored as class 3. */
export type HazardClass = 'none' | '2' | '3' | '4.1' | '5.1' | '5.2' | '6.1' | '8' | '9';

export const HAZARD_CLASSES: readonly HazardClass[] = Object.freeze(['none', '2', '3', '4.1', '5.1', '5.2', '6.1', '8', '9']);

/** Two classes that may not share a location, and why. */
export interface SegregationRule {
  classes: readonly [HazardClass, HazardClass];
  reason: string;
}

/**
 * Organic peroxide (catalyst, class 5.2) is kept in a dedicated store, away from accelerators and
 * flammable liquids (class 3: resin, topcoat, acetone, accelerator): at least 7.6 m (25 ft) or a
 * 1-hour fire-resisting barrier. [pub] HSE guidance note CS21; NFPA 432 (now NFPA 400).
 */
export const SEGREGATION_RULES: readonly SegregationRule[] = Object.freeze([
  {
    classes: ['5.2', '3'] as const,
    reason:
      'organic peroxide (catalyst, class 5.2) must be kept in its own store, away from accelerators and flammable liquids ' +
      '(class 3: resin, topcoat, acetone), at least 7.6 m (25 ft) away or behind a 1-hour fire-resisting barrier (HSE CS21; NFPA 400). ' +
      'Follow the safety data sheet, local codes and licensed practice.',
  },
]);

export interface SegregationCheck {
  ok: boolean;
  conflictsWith: HazardClass[];
  message: string;
}

function hazardClass(value: string, name: string): HazardClass {
  const found = HAZARD_CLASSES.find((c) => c === value);
  if (found === undefined) {
    throw new DomainError(`${name} is not a known hazard class: ${JSON.stringify(value)}.`);
  }
  return found;
}

/**
 * Whether a lot of one hazard class may go where lots of other classes are already stored.
 * Refuses class 5.2 with class 3, and the reverse (SEGREGATION_RULES).
 */
export function checkSegregation(
  lotHazardClass: HazardClass,
  classesAlreadyStoredAtLocation: readonly HazardClass[],
  rules: readonly SegregationRule[] = SEGREGATION_RULES,
): SegregationCheck {
  const lot = hazardClass(lotHazardClass, 'The lot’s hazard class');
  const present = classesAlreadyStoredAtLocation.map((c) => hazardClass(c, 'A stored hazard class'));
  const conflictsWith: HazardClass[] = [];
  const reasons: string[] = [];
  for (const rule of rules) {
    const [a, b] = rule.classes;
    const other = lot === a ? b : lot === b ? a : undefined;
    if (other !== undefined && present.includes(other) && !conflictsWith.includes(other)) {
      conflictsWith.push(other);
      reasons.push(rule.reason);
    }
  }
  if (conflictsWith.length === 0) {
    return { ok: true, conflictsWith, message: `A class ${lot} lot may be stored here.` };
  }
  const list = conflictsWith.map((c) => `class ${c}`).join(' and ');
  return {
    ok: false,
    conflictsWith,
    message: `A class ${lot} lot cannot go where ${list} is stored: ${reasons.join(' ')}`,
  };
}

/**
 * Flammable liquids in a workroom: at most 50 L, in a fire-resisting cabinet, only a shift's use.
 * [pub] HSE HSG51; DSEAR ACoP L138.
 */
export const FLAMMABLES_WORKROOM_LIMIT_L = 50;
/** Warn once a flammables cabinet would be 90 % full. [practice] Potlife's own, no source. */
export const FLAMMABLES_WARNING_FRACTION = 0.9;

export interface CapacityCheck {
  level: 'ok' | 'warning' | 'refused';
  totalLitres: Decimal;
  message: string;
}

/**
 * Whether `addLitres` more may go into a flammables cabinet holding `currentLitres`: refused over
 * capacity, a warning from 90 % of it, otherwise ok. The capacity defaults to the 50 L of HSE HSG51.
 */
export function checkFlammablesCapacity(
  currentLitres: Numeric,
  addLitres: Numeric,
  capacityLitres: Numeric = FLAMMABLES_WORKROOM_LIMIT_L,
): CapacityCheck {
  const current = nonNegative(currentLitres, 'litres held');
  const add = nonNegative(addLitres, 'litres to add');
  const capacity = nonNegative(capacityLitres, 'capacity (L)');
  if (capacity.isZero()) {
    throw new DomainError('A flammables cabinet needs a capacity above 0 L.');
  }
  const total = current.plus(add);
  const rule = `HSE HSG51 allows at most ${FLAMMABLES_WORKROOM_LIMIT_L} L of flammable liquids in a workroom, kept in a fire-resisting cabinet, and only what a shift needs.`;
  if (total.gt(capacity)) {
    return {
      level: 'refused',
      totalLitres: total,
      message: `That would make ${total.toString()} L, over the ${capacity.toString()} L this cabinet may hold. ${rule} Keep the rest in the outside flammables store.`,
    };
  }
  if (total.gte(capacity.times(FLAMMABLES_WARNING_FRACTION))) {
    return {
      level: 'warning',
      totalLitres: total,
      message: `That makes ${total.toString()} L of the ${capacity.toString()} L this cabinet may hold: nearly full. ${rule}`,
    };
  }
  return { level: 'ok', totalLitres: total, message: `${total.toString()} L of ${capacity.toString()} L.` };
}

/** A storage temperature reading against a material's range. `exposure` other than `none` raises an exposure flag. */
export interface TemperatureCheck {
  ok: boolean;
  exposure: 'none' | 'too-warm' | 'too-cold';
  message: string;
}

/**
 * A storage temperature reading against the range a material may be stored in (inclusive).
 * Outside it, the lots there get an exposure flag: check before use until cleared or quarantined.
 */
export function checkStorageTemperature(readingC: Numeric, minC: Numeric, maxC: Numeric): TemperatureCheck {
  const reading = toDecimal(readingC, 'reading (°C)');
  const min = toDecimal(minC, 'lowest storage temperature (°C)');
  const max = toDecimal(maxC, 'highest storage temperature (°C)');
  if (min.gt(max)) {
    throw new DomainError(`The lowest storage temperature (${min.toString()} °C) is above the highest (${max.toString()} °C).`);
  }
  const flag = 'Flag the lots stored here: check before use until cleared or quarantined.';
  if (reading.gt(max)) {
    return {
      ok: false,
      exposure: 'too-warm',
      message: `${reading.toString()} °C is above the ${max.toString()} °C the material may be stored at. ${flag}`,
    };
  }
  if (reading.lt(min)) {
    return {
      ok: false,
      exposure: 'too-cold',
      message: `${reading.toString()} °C is below the ${min.toString()} °C the material may be stored at. ${flag}`,
    };
  }
  return { ok: true, exposure: 'none', message: `${reading.toString()} °C is within ${min.toString()}–${max.toString()} °C.` };
}

// ── The stock ledger ─────────────────────────────────────────────────────────

/** The kinds of movement on the stock ledger. */
export type MovementKind = 'receipt' | 'transfer' | 'issue' | 'return' | 'adjustment' | 'write-off';

/** One movement as the ledger holds it: quantity signed, + into the location, − out of it. */
export interface Movement {
  kind: MovementKind;
  quantity: Numeric;
}

/** Which way a movement kind may go: receipts and returns come in, issues and write-offs go out. */
export function movementDirection(kind: MovementKind): 'in' | 'out' | 'either' {
  switch (kind) {
    case 'receipt':
    case 'return':
      return 'in';
    case 'issue':
    case 'write-off':
      return 'out';
    case 'transfer':
    case 'adjustment':
      return 'either';
    default:
      return unexpected('movement kind', kind);
  }
}

/**
 * The balance of a ledger: the sum of its signed movement quantities, in order. Refuses a movement
 * of zero, a sign that does not fit the kind, and any point where the balance would go below zero
 * (DomainError `negative-balance`).
 */
export function ledgerBalance(movements: readonly Movement[]): Decimal {
  let balance = ZERO;
  movements.forEach((m, i) => {
    const q = toDecimal(m.quantity, `quantity of movement ${i + 1}`);
    const direction = movementDirection(m.kind);
    if (q.isZero()) {
      throw new DomainError(`Movement ${i + 1} (${m.kind}) moves nothing; leave it out.`);
    }
    if ((direction === 'in' && q.lt(0)) || (direction === 'out' && q.gt(0))) {
      throw new DomainError(
        `Movement ${i + 1} is a ${m.kind}, which ${direction === 'in' ? 'adds to' : 'takes from'} stock, but its quantity is ${q.toString()}.`,
      );
    }
    balance = balance.plus(q);
    if (balance.lt(0)) {
      throw new DomainError(
        `Movement ${i + 1} (${m.kind} of ${q.abs().toString()}) would take the balance to ${balance.toString()}: there is not that much in stock.`,
        'negative-balance',
      );
    }
  });
  return balance;
}

/** What a count found against the ledger. */
export interface CountVariance {
  kind: 'match' | 'surplus' | 'loss';
  /** counted − expected: + found more than the ledger says, − found less */
  varianceQuantity: Decimal;
  /** the variance at unit cost, to the penny (half up) */
  varianceValue: Decimal;
}

/** The variance of a count: counted − expected, valued at unit cost. It becomes an adjustment. */
export function countVariance(expected: Numeric, counted: Numeric, unitCost: Numeric): CountVariance {
  const e = nonNegative(expected, 'expected quantity');
  const c = nonNegative(counted, 'counted quantity');
  const cost = nonNegative(unitCost, 'unit cost');
  const v = c.minus(e);
  return {
    kind: v.isZero() ? 'match' : v.gt(0) ? 'surplus' : 'loss',
    varianceQuantity: v,
    varianceValue: roundMoney(v.times(cost)),
  };
}
