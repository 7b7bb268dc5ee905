import { Decimal, Numeric, toDecimal, nonNegative, percentToFraction, MONEY_DECIMAL_PLACES } from './decimal';

/** UK VAT standard rate, 20 %. [pub] HMRC. */
export const UK_VAT_STANDARD_RATE_PCT = 20;

/**
 * VAT on an invoice total: net × rate / 100, rounded down to the whole penny (towards zero, so a
 * credit note mirrors its invoice). [pub] HMRC VAT Notice 700 §17.5.
 */
export function vatOnInvoice(netTotal: Numeric, ratePct: Numeric): Decimal {
  const net = toDecimal(netTotal, 'net total');
  const rate = nonNegative(ratePct, 'VAT rate (%)');
  return net.times(percentToFraction(rate)).toDecimalPlaces(MONEY_DECIMAL_PLACES, Decimal.ROUND_DOWN);
}
