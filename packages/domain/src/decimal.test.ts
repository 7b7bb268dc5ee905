import DecimalJs from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { Decimal, toDecimal, roundMoney, nonNegative, positive, count, percentToFraction } from './decimal';
import { DomainError } from './errors';

describe('toDecimal', () => {
  it.each([
    ['0', '0'],
    [0, '0'],
    ['-1.5', '-1.5'],
    [' 2.50 ', '2.5'],
    [0.1, '0.1'], // a binary float is taken by its shortest decimal form
    [new Decimal('123.456'), '123.456'],
    [new DecimalJs('7.25'), '7.25'], // a Decimal from another decimal.js constructor
    ['1e-30', '0.000000000000000000000000000001'], // plain notation, never exponents
  ])('%s → %s', (input, expected) => {
    expect(toDecimal(input).toString()).toBe(expected);
  });

  it.each([['abc'], [''], [Number.NaN], [Number.POSITIVE_INFINITY], ['Infinity'], [new Decimal(Number.NaN)]])(
    'refuses %s',
    (input) => {
      expect(() => toDecimal(input, 'length')).toThrow(DomainError);
      expect(() => toDecimal(input, 'length')).toThrow(/length/);
    },
  );

  it('copies a Decimal from another constructor so it works to 40 digits', () => {
    const foreign = new DecimalJs(1);
    const d = toDecimal(foreign);
    expect(d).not.toBe(foreign);
    expect(d.div(3).toString()).toHaveLength(42);
    const own = new Decimal(1);
    expect(toDecimal(own)).toBe(own);
  });

  it('leaves the global decimal.js settings alone', () => {
    expect(DecimalJs.precision).toBe(20);
    expect(DecimalJs.rounding).toBe(DecimalJs.ROUND_HALF_UP);
    expect(Decimal.precision).toBe(40);
    expect(new Decimal(1).div(3).toString()).toHaveLength(42); // "0." + 40 digits
  });
});

describe('range helpers', () => {
  it.each([
    ['nonNegative', '0', true, nonNegative],
    ['nonNegative', '-0', true, nonNegative],
    ['nonNegative', '-0.0001', false, nonNegative],
    ['positive', '0', false, positive],
    ['positive', '0.0001', true, positive],
    ['positive', '-3', false, positive],
  ] as const)('%s(%s) accepts: %s', (_name, input, ok, fn) => {
    if (ok) {
      expect(() => fn(input, 'x')).not.toThrow();
    } else {
      expect(() => fn(input, 'x')).toThrow(DomainError);
    }
  });

  it.each([
    ['0', 0],
    ['12', 12],
  ])('count(%s) = %i', (input, n) => {
    expect(count(input, 'pipes')).toBe(n);
  });

  it.each([['1.5'], ['-1']])('count refuses %s', (input) => {
    expect(() => count(input, 'pipes')).toThrow(/pipes/);
  });

  it.each([
    ['12.5', '0.125'],
    ['0', '0'],
    ['100', '1'],
  ])('%s %% → %s', (pct, fraction) => {
    expect(percentToFraction(new Decimal(pct)).toString()).toBe(fraction);
  });
});

describe('roundMoney: to the penny, half up', () => {
  it.each([
    ['0', '0'],
    ['1.005', '1.01'], // half up, where a binary float would give 1.00
    ['1.00499999', '1'],
    ['2.675', '2.68'],
    ['-1.005', '-1.01'], // half away from zero for credits
    ['10', '10'],
  ])('%s → %s', (input, expected) => {
    expect(roundMoney(input).toString()).toBe(expected);
  });
});
