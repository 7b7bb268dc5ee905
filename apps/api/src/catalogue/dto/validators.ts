import { Decimal } from '@potlife/domain';
import { Transform } from 'class-transformer';
import { registerDecorator, ValidateIf, ValidationOptions } from 'class-validator';

/** Strings are trimmed before they are checked; anything else is left for the type check to refuse. */
export const Trim = () => Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));

/** Trimmed, and an empty string becomes null: for optional text a form may send as "". */
export const TrimToNull = () =>
  Transform(({ value }: { value: unknown }) => {
    if (typeof value !== 'string') {
      return value;
    }
    const t = value.trim();
    return t === '' ? null : t;
  });

/** The field may be left out, but not sent as null (it has a value in the database). */
export const OptionalNotNull = () => ValidateIf((_o: object, v: unknown) => v !== undefined);

const DECIMAL = /^-?\d{1,15}(\.\d{1,15})?$/;

export interface DecimalRule {
  /** Smallest allowed value, inclusive. */
  min?: string;
  /** Value must be greater than this. */
  gt?: string;
  /** Largest allowed value, inclusive. */
  max?: string;
  /** Most decimal places. */
  scale: number;
}

/** Why a value is not a decimal string that fits the rule, or null when it is fine. Used by DTOs and CSV rows alike. */
export function decimalProblem(value: unknown, rule: DecimalRule): string | null {
  if (typeof value !== 'string' || !DECIMAL.test(value.trim())) {
    return `must be a number written as a string, e.g. "25" or "2.5"`;
  }
  const d = new Decimal(value.trim());
  if (rule.gt !== undefined && !d.greaterThan(rule.gt)) {
    return `must be greater than ${rule.gt}`;
  }
  if (rule.min !== undefined && d.lessThan(rule.min)) {
    return `must be at least ${rule.min}`;
  }
  if (rule.max !== undefined && d.greaterThan(rule.max)) {
    return `must be at most ${rule.max}`;
  }
  if (d.decimalPlaces() > rule.scale) {
    return rule.scale === 0 ? 'must be a whole number' : `must have at most ${rule.scale} decimal place${rule.scale === 1 ? '' : 's'}`;
  }
  return null;
}

/** A decimal string (never a JS number: quantities and money cross the wire as strings). */
export function IsDecimalString(rule: DecimalRule, options?: ValidationOptions) {
  return (target: object, propertyName: string) => {
    registerDecorator({
      name: 'isDecimalString',
      target: target.constructor,
      propertyName,
      options,
      validator: {
        validate: (value: unknown) => decimalProblem(value, rule) === null,
        defaultMessage: (args) => decimalProblem(args?.value, rule) ?? 'is not valid',
      },
    });
  };
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** A real calendar date written YYYY-MM-DD (2025-02-30 is refused). */
export function isIsoDate(value: unknown): value is string {
  if (typeof value !== 'string' || !ISO_DATE.test(value)) {
    return false;
  }
  const d = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
}

export function IsIsoDate(options?: ValidationOptions) {
  return (target: object, propertyName: string) => {
    registerDecorator({
      name: 'isIsoDate',
      target: target.constructor,
      propertyName,
      options: { message: 'must be a date written YYYY-MM-DD', ...options },
      validator: { validate: (value: unknown) => isIsoDate(value) },
    });
  };
}

const PLAIN_DECIMAL = /^(-?)(\d+)(?:\.(\d+))?$/;

/** A decimal string without trailing (or leading) zeros ("25.000" → "25", "05.0" → "5", "-0.0" → "0"). */
export function plainDecimal(value: string): string;
export function plainDecimal(value: string | null): string | null;
export function plainDecimal(value: string | null): string | null {
  if (value === null) {
    return null;
  }
  // String work for the usual case: an import normalises thousands of these.
  const m = PLAIN_DECIMAL.exec(value.trim());
  if (!m) {
    return new Decimal(value).toString();
  }
  const int = m[2]!.replace(/^0+(?=\d)/, '');
  const frac = (m[3] ?? '').replace(/0+$/, '');
  const plain = frac === '' ? int : `${int}.${frac}`;
  return m[1] === '-' && /[1-9]/.test(plain) ? `-${plain}` : plain;
}

/** Money to the penny as a string ("82.5" → "82.50"). */
export function money(value: string): string {
  return new Decimal(value).toFixed(2);
}

/** Today's date in the server's calendar, YYYY-MM-DD. */
export function today(): string {
  const d = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** A search term for ILIKE with its wildcards escaped. */
export function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
