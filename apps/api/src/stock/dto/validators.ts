import { Transform } from 'class-transformer';
import { registerDecorator, ValidationArguments, ValidationOptions } from 'class-validator';

/** Trims strings; leaves anything else for the validators to refuse. */
export const Trim = () => Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));

/** Trims strings and turns an empty one into undefined (an optional field left blank). */
export const TrimOrUndefined = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? (value.trim() === '' ? undefined : value.trim()) : value));

export interface DecimalRule {
  /** digits after the point */
  scale: number;
  /** digits before the point */
  integerDigits: number;
  /** allow a minus sign */
  signed?: boolean;
  /** refuse zero */
  nonZero?: boolean;
}

/** A decimal number written as a string ("12.5"), never a JS number: quantities and money stay exact. */
export function IsDecimalString(rule: DecimalRule, options?: ValidationOptions): PropertyDecorator {
  const pattern = new RegExp(`^${rule.signed ? '-?' : ''}\\d{1,${rule.integerDigits}}(\\.\\d{1,${rule.scale}})?$`);
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isDecimalString',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate(value: unknown) {
          return typeof value === 'string' && pattern.test(value) && (!rule.nonZero || !/^-?0+(\.0+)?$/.test(value));
        },
        defaultMessage(args: ValidationArguments) {
          const v = args.value as unknown;
          if (typeof v === 'string' && rule.nonZero && /^-?0+(\.0+)?$/.test(v)) {
            return 'must not be zero';
          }
          return `must be a ${rule.signed ? '' : 'non-negative '}decimal number written as a string, e.g. "${rule.signed ? '-2.5' : '12.5'}", with at most ${rule.scale} decimal places`;
        },
      },
    });
}

/** A calendar date written YYYY-MM-DD (refuses 2025-02-30). */
export function IsCalendarDate(options?: ValidationOptions): PropertyDecorator {
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isCalendarDate',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate(value: unknown) {
          if (typeof value !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value)) {
            return false;
          }
          const d = new Date(`${value}T00:00:00Z`);
          return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
        },
        defaultMessage() {
          return 'must be a calendar date written YYYY-MM-DD';
        },
      },
    });
}

/** A moment with its time zone, ISO 8601 ("2025-06-01T06:00:00Z" or "+01:00"). */
export function IsInstant(options?: ValidationOptions): PropertyDecorator {
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isInstant',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate(value: unknown) {
          return (
            typeof value === 'string' &&
            value.length <= 40 &&
            /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,6})?)?(Z|[+-]\d{2}:\d{2})$/.test(value) &&
            !Number.isNaN(Date.parse(value))
          );
        },
        defaultMessage() {
          return 'must be a date and time with its zone, e.g. "2025-06-01T06:30:00Z"';
        },
      },
    });
}

/** Quantities: numeric(14,3). */
export const QUANTITY: DecimalRule = { scale: 3, integerDigits: 11 };
/** £ per stock unit: numeric(14,4). */
export const UNIT_COST: DecimalRule = { scale: 4, integerDigits: 10 };
