import DecimalJs from 'decimal.js';
import { DomainError } from './errors';

/**
 * The Decimal constructor of @potlife/domain: 40 significant digits, half-up rounding, plain notation
 * for every value a roof can produce. A clone, so the global decimal.js settings of the apps that
 * use it are left alone.
 */
export const Decimal = DecimalJs.clone({
  precision: 40,
  rounding: DecimalJs.ROUND_HALF_UP,
  toExpNeg: -40,
  toExpPos: 40,
});
export type Decimal = DecimalJs;

/** Every quantity and amount @potlife/domain accepts: a decimal string, a number or a Decimal. */
export type Numeric = string | number | Decimal;

/** Pence in a pound: money is kept to two decimal places. */
export const MONEY_DECIMAL_PLACES = 2;

export const ZERO = new Decimal(0);
export const ONE = new Decimal(1);
export const HUNDRED = new Decimal(100);

/**
 * A Numeric as a Decimal. Throws DomainError naming the value when it is not a finite number.
 * @param name how the value is called in the message, e.g. `lengthM of area "Rear"`.
 */
export function toDecimal(value: Numeric, name = 'value'): Decimal {
  if (value instanceof Decimal) {
    // decimal.js counts an instance of any of its constructors; one from elsewhere (the global
    // Decimal, 20 digits) is copied so what follows works to this library's 40 digits.
    if (!value.isFinite()) {
      throw new DomainError(`${name} must be a finite number, not ${value.toString()}.`);
    }
    return value.constructor === Decimal ? value : new Decimal(value);
  }
  let d: Decimal;
  try {
    d = new Decimal(typeof value === 'string' ? value.trim() : value);
  } catch {
    throw new DomainError(`${name} must be a number, not ${JSON.stringify(value)}.`);
  }
  if (!d.isFinite()) {
    throw new DomainError(`${name} must be a finite number, not ${d.toString()}.`);
  }
  return d;
}

/** A Numeric that must be zero or more. */
export function nonNegative(value: Numeric, name: string): Decimal {
  const d = toDecimal(value, name);
  if (d.isNegative() && !d.isZero()) {
    throw new DomainError(`${name} must not be negative (got ${d.toString()}).`);
  }
  return d;
}

/** A Numeric that must be more than zero. */
export function positive(value: Numeric, name: string): Decimal {
  const d = toDecimal(value, name);
  if (d.isNegative() || d.isZero()) {
    throw new DomainError(`${name} must be more than zero (got ${d.toString()}).`);
  }
  return d;
}

/** A whole number of zero or more (a count of pipes, lengths, days). */
export function count(value: Numeric, name: string): number {
  const d = nonNegative(value, name);
  if (!d.isInteger()) {
    throw new DomainError(`${name} must be a whole number (got ${d.toString()}).`);
  }
  return d.toNumber();
}

/** A percentage given as a fraction: 12.5 → 0.125. */
export function percentToFraction(pct: Decimal): Decimal {
  return pct.div(HUNDRED);
}

/** Money to the penny, half up. Call it once, at the end of a computation. */
export function roundMoney(amount: Numeric): Decimal {
  return toDecimal(amount, 'amount').toDecimalPlaces(MONEY_DECIMAL_PLACES, Decimal.ROUND_HALF_UP);
}
