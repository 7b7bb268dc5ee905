import { Decimal } from '@potlife/domain';
import { unitLabel } from './material-words';

// Money and quantities arrive from the API as decimal strings. These only format them for
// reading; nothing here computes a rule.

function group(integer: string): string {
  return integer.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

function parse(value: string | null | undefined): Decimal | null {
  if (value === null || value === undefined || value.trim() === '') {
    return null;
  }
  try {
    const d = new Decimal(value);
    return d.isFinite() ? d : null;
  } catch {
    return null;
  }
}

/** "1234.5" → "£1,234.50"; "-16" → "−£16.00"; null → "—". */
export function formatMoney(value: string | null | undefined): string {
  const d = parse(value);
  if (d === null) {
    return '—';
  }
  const [integer = '0', pence = '00'] = d.abs().toFixed(2).split('.');
  return `${d.isNegative() && !d.isZero() ? '−' : ''}£${group(integer)}.${pence}`;
}

/** A quantity without trailing zeros, grouped: "1250.500" → "1,250.5". */
export function formatNumber(value: string | null | undefined): string {
  const d = parse(value);
  if (d === null) {
    return '—';
  }
  const [integer = '0', fraction] = d.abs().toString().split('.');
  return `${d.isNegative() && !d.isZero() ? '−' : ''}${group(integer)}${fraction ? `.${fraction}` : ''}`;
}

/** "25.000", "kg" → "25 kg"; "30", "m2" → "30 m²". */
export function formatQuantity(value: string | null | undefined, unit: string): string {
  const text = formatNumber(value);
  return text === '—' ? text : `${text} ${unitLabel(unit)}`;
}

/** A signed quantity with its sign always shown: "+2 kg", "−5 kg", "0 kg". */
export function formatSignedQuantity(value: string | null | undefined, unit: string): string {
  const d = parse(value);
  if (d === null) {
    return '—';
  }
  return `${d.isPositive() && !d.isZero() ? '+' : ''}${formatQuantity(value, unit)}`;
}

/** A signed amount: "+£12.00", "−£3.20". */
export function formatSignedMoney(value: string | null | undefined): string {
  const d = parse(value);
  if (d === null) {
    return '—';
  }
  return `${d.isPositive() && !d.isZero() ? '+' : ''}${formatMoney(value)}`;
}

/** Sign of a decimal string: -1, 0 or 1 (0 for anything unreadable). */
export function signOf(value: string | null | undefined): -1 | 0 | 1 {
  const d = parse(value);
  if (d === null || d.isZero()) {
    return 0;
  }
  return d.isNegative() ? -1 : 1;
}

/** Sorts decimal strings as numbers, for tables sorted on the client. */
export function compareDecimals(a: string | null | undefined, b: string | null | undefined): number {
  const x = parse(a);
  const y = parse(b);
  if (x === null || y === null) {
    return x === null ? (y === null ? 0 : -1) : 1;
  }
  return x.comparedTo(y);
}

/** A decimal typed by a person: digits with an optional point, optionally signed. */
export function isDecimalText(value: string, { signed = false, scale = 3 } = {}): boolean {
  const pattern = new RegExp(`^${signed ? '-?' : ''}\\d+(\\.\\d{1,${scale}})?$`);
  return pattern.test(value.trim());
}
