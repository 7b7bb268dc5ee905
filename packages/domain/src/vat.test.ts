import { describe, expect, it } from 'vitest';
import { DomainError } from './errors';
import { UK_VAT_STANDARD_RATE_PCT, vatOnInvoice } from './vat';

describe('vatOnInvoice: rounded down to the whole penny (HMRC VAT Notice 700 §17.5)', () => {
  it('uses the UK standard rate of 20 % (HMRC)', () => {
    expect(UK_VAT_STANDARD_RATE_PCT).toBe(20);
  });

  it.each([
    ['100', 20, '20'],
    ['0', 20, '0'],
    ['0.04', 20, '0'], // 0.8p rounds down to nothing
    ['10.99', 20, '2.19'], // 2.198: down, where half-up would give 2.20
    ['99.99', 20, '19.99'], // 19.998
    ['1234.56', 20, '246.91'], // 246.912
    ['100', 0, '0'], // zero-rated
    ['100', 5, '5'], // reduced rate
    ['123.45', '17.5', '21.6'], // 21.60375, an old standard rate
    ['-10.99', 20, '-2.19'], // a credit note mirrors its invoice
    [0.1, 20, '0.02'], // a binary float taken as the decimal 0.1
  ])('VAT on £%s at %s %% = £%s', (net, rate, vat) => {
    expect(vatOnInvoice(net, rate).toString()).toBe(vat);
  });

  it.each([
    ['100', -20],
    ['ten pounds', 20],
  ])('refuses £%s at %s %%', (net, rate) => {
    expect(() => vatOnInvoice(net, rate)).toThrow(DomainError);
  });
});
