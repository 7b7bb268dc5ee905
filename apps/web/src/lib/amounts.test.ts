import { describe, expect, it } from 'vitest';
import {
  compareDecimals,
  formatMoney,
  formatQuantity,
  formatSignedMoney,
  formatSignedQuantity,
} from './amounts';

// Display only: the API sends decimal strings; these put them the way a UK reader expects
// (pounds with pence, thousands grouped). Common practice, no source.
describe('amounts as read on screen', () => {
  it.each([
    ['0', '£0.00'],
    ['1234.5', '£1,234.50'],
    ['-16', '−£16.00'],
    ['0.005', '£0.01'],
    ['1000000', '£1,000,000.00'],
    ['not a number', '—'],
  ])('formatMoney(%s) is %s', (value, text) => {
    expect(formatMoney(value)).toBe(text);
  });

  it.each([
    ['25.000', 'kg', '25 kg'],
    ['199.680', 'm2', '199.68 m²'],
    ['1250.5', 'each', '1,250.5 each'],
  ])('formatQuantity(%s, %s) is %s', (value, unit, text) => {
    expect(formatQuantity(value, unit)).toBe(text);
  });

  it('signs differences', () => {
    expect(formatSignedQuantity('-2.000', 'm')).toBe('−2 m');
    expect(formatSignedQuantity('3', 'kg')).toBe('+3 kg');
    expect(formatSignedMoney('-0.56')).toBe('−£0.56');
    expect(formatSignedMoney('0')).toBe('£0.00');
  });

  it('sorts decimal strings as numbers, not as text', () => {
    expect(['10', '9.5', '100', '-1'].sort(compareDecimals)).toEqual(['-1', '9.5', '10', '100']);
  });
});
