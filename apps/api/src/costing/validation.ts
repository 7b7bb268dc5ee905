import { Decimal } from '@potlife/domain';
import { Transform } from 'class-transformer';
import { ValidateBy, ValidationOptions } from 'class-validator';

const DECIMAL = /^-?\d{1,12}(\.\d{1,8})?$/;

export interface DecimalOptions {
  min?: number | string;
  max?: number | string;
  /** the lowest value is not allowed itself (more than min) */
  exclusiveMin?: boolean;
  /** at most this many decimal places (the column's scale) */
  places?: number;
}

function describe(o: DecimalOptions): string {
  const parts: string[] = [];
  if (o.min !== undefined) {
    parts.push(`${o.exclusiveMin ? 'more than' : 'at least'} ${String(o.min)}`);
  }
  if (o.max !== undefined) {
    parts.push(`at most ${String(o.max)}`);
  }
  const range = parts.length ? ` ${parts.join(' and ')}` : '';
  return o.places !== undefined ? `${range}, with at most ${o.places} decimal places` : range;
}

/** Whether a value is a plain decimal string within the bounds. */
export function isDecimalWithin(value: unknown, o: DecimalOptions = {}): value is string {
  if (typeof value !== 'string' || !DECIMAL.test(value)) {
    return false;
  }
  const d = new Decimal(value);
  if (o.places !== undefined && d.decimalPlaces() > o.places) {
    return false;
  }
  if (o.min !== undefined && (o.exclusiveMin ? d.lte(o.min) : d.lt(o.min))) {
    return false;
  }
  if (o.max !== undefined && d.gt(o.max)) {
    return false;
  }
  return true;
}

/**
 * A quantity or amount: a decimal string such as "12.5" (a JSON number is accepted and kept as
 * its string), within the bounds. Quantities and money never become JS numbers on the server.
 */
export function IsDecimalValue(o: DecimalOptions = {}, v?: ValidationOptions): PropertyDecorator {
  const transform = Transform(({ value }: { value: unknown }) =>
    typeof value === 'number' && Number.isFinite(value) ? String(value) : value,
  );
  const validate = ValidateBy(
    {
      name: 'isDecimalValue',
      validator: {
        validate: (value: unknown) => isDecimalWithin(value, o),
        defaultMessage: () => `must be a decimal number${describe(o)}, written like "12.5"`,
      },
    },
    v,
  );
  return (target: object, key: string | symbol) => {
    transform(target, key);
    validate(target, key);
  };
}

/** A calendar date written YYYY-MM-DD that exists. */
export function IsIsoDate(v?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isIsoDate',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isIsoDate(value),
        defaultMessage: () => 'must be a date written YYYY-MM-DD',
      },
    },
    v,
  );
}

export function isIsoDate(value: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) {
    return false;
  }
  const d = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
}

/** Trims strings; leaves everything else for the validators to refuse. */
export const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
/** Trims strings; an empty string becomes null (a cleared optional field). */
export const trimToNull = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? (value.trim() === '' ? null : value.trim()) : value;
