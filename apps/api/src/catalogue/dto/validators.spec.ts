import { Decimal } from '@potlife/domain';
import { decimalProblem, isIsoDate, likePattern, plainDecimal } from './validators';

describe('plainDecimal', () => {
  it.each([
    ['25.000', '25'],
    ['5.0', '5'],
    ['0.50', '0.5'],
    ['007', '7'],
    ['-20.0', '-20'],
    ['-0.0', '0'],
    ['0', '0'],
    ['66.56', '66.56'],
    [' 1.040 ', '1.04'],
    ['1e3', '1000'],
  ])('%j → %j, as decimal.js writes it', (value, expected) => {
    expect(plainDecimal(value)).toBe(expected);
    expect(new Decimal(plainDecimal(value)).equals(value.trim())).toBe(true);
  });

  it('keeps null', () => {
    expect(plainDecimal(null)).toBeNull();
  });
});

describe('decimalProblem', () => {
  const pack = { gt: '0', max: '99999999', scale: 3 };
  it.each([
    ['25', pack, null],
    ['0.001', pack, null],
    ['0', pack, 'must be greater than 0'],
    ['-1', pack, 'must be greater than 0'],
    ['1.0001', pack, 'must have at most 3 decimal places'],
    ['100000000', pack, 'must be at most 99999999'],
    [25, pack, 'must be a number written as a string, e.g. "25" or "2.5"'],
    ['1e3', pack, 'must be a number written as a string, e.g. "25" or "2.5"'],
    ['twenty', pack, 'must be a number written as a string, e.g. "25" or "2.5"'],
    ['-60', { min: '-60', max: '120', scale: 1 }, null],
    ['-60.5', { min: '-60', max: '120', scale: 1 }, 'must be at least -60'],
    ['5.25', { min: '-60', max: '120', scale: 1 }, 'must have at most 1 decimal place'],
  ])('%j with %j → %j', (value, rule, expected) => {
    expect(decimalProblem(value, rule)).toBe(expected);
  });
});

describe('isIsoDate and likePattern', () => {
  it.each([
    ['2024-02-29', true],
    ['2025-02-29', false],
    ['2025-13-01', false],
    ['2025-1-01', false],
    [20250101, false],
  ])('isIsoDate(%j) = %j', (value, expected) => {
    expect(isIsoDate(value)).toBe(expected);
  });

  it('escapes the wildcards of ILIKE', () => {
    expect(likePattern('50%_off\\')).toBe('%50\\%\\_off\\\\%');
  });
});
