import { registerDecorator, ValidationOptions } from 'class-validator';
import { DecimalRule, decimalProblem } from './validators';

/**
 * A field check: why a value is wrong, or null when it is fine. The same functions back the
 * request bodies (through `@Check`) and the CSV rows (called directly, which is much faster
 * than class-transformer and class-validator for thousands of rows).
 */
export type FieldCheck = (value: unknown) => string | null;

/** A class-validator decorator running a FieldCheck; the message is the check's reason. */
export function Check(check: FieldCheck, options?: ValidationOptions) {
  return (target: object, propertyName: string) => {
    registerDecorator({
      name: 'potlifeCheck',
      target: target.constructor,
      propertyName,
      options,
      validator: {
        validate: (value: unknown) => check(value) === null,
        defaultMessage: (args) => check(args?.value) ?? 'is not valid',
      },
    });
  };
}

export const checks = {
  text:
    (max: number, opts: { min?: number; pattern?: RegExp; patternMessage?: string } = {}): FieldCheck =>
    (v) => {
      if (typeof v !== 'string') {
        return 'must be text';
      }
      if (v.length < (opts.min ?? 0)) {
        return 'must not be empty';
      }
      if (v.length > max) {
        return `must be at most ${max} characters`;
      }
      if (opts.pattern && !opts.pattern.test(v)) {
        return opts.patternMessage ?? 'has the wrong format';
      }
      return null;
    },
  oneOf:
    (values: readonly string[]): FieldCheck =>
    (v) =>
      typeof v === 'string' && values.includes(v) ? null : `must be one of ${values.join(', ')}`,
  bool: (): FieldCheck => (v) => (typeof v === 'boolean' ? null : 'must be true or false'),
  int:
    (min: number, max: number, unit: string): FieldCheck =>
    (v) => {
      if (typeof v !== 'number' || !Number.isInteger(v)) {
        return `must be a whole number of ${unit}`;
      }
      return v < min ? `must be at least ${min}` : v > max ? `must be at most ${max}` : null;
    },
  decimal:
    (rule: DecimalRule): FieldCheck =>
    (v) =>
      decimalProblem(v, rule),
};
