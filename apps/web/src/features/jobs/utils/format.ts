import { Decimal } from '@potlife/domain';
import { formatMoney as formatSharedMoney } from '../../../lib/amounts';

// Amounts and quantities arrive as decimal strings (or come from the domain as Decimals): these
// write them for people. Nothing here computes a rule.

function groupThousands(fixed: string): string {
  const [whole = '0', fraction] = fixed.split('.');
  const sign = whole.startsWith('-') ? '-' : '';
  const digits = sign ? whole.slice(1) : whole;
  const grouped = digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${sign}${grouped}${fraction !== undefined ? `.${fraction}` : ''}`;
}

function toDecimal(value: string | Decimal | number): Decimal | null {
  try {
    const d = value instanceof Decimal ? value : new Decimal(value);
    return d.isFinite() ? d : null;
  } catch {
    return null;
  }
}

/** £1,234.50 (the app's one money format). */
export function formatMoney(value: string | null | undefined): string {
  return formatSharedMoney(value);
}

/** A quantity to at most `places` decimals, trailing zeros dropped: "12.5", "1,204". */
export function formatNumber(value: string | Decimal | number | null | undefined, places = 2): string {
  if (value === null || value === undefined) {
    return '—';
  }
  const d = toDecimal(value);
  if (d === null) {
    return '—';
  }
  return groupThousands(d.toDecimalPlaces(places).toString());
}

const UNIT_LABELS: Record<string, string> = { m2: 'm²', kg: 'kg', m: 'm', L: 'L', l: 'L', each: '' };

export function unitLabel(unit: string): string {
  return UNIT_LABELS[unit] ?? unit;
}

/** "12.5 kg", "4 each" → "4". */
export function formatQuantity(value: string | Decimal | null | undefined, unit: string, places = 2): string {
  const label = unitLabel(unit);
  const n = formatNumber(value, places);
  return label && n !== '—' ? `${n} ${label}` : n;
}

/** "8.25 m" */
export function formatLength(value: string | Decimal | null | undefined): string {
  return formatQuantity(value, 'm', 2);
}

/** "41.6 m²" */
export function formatArea(value: string | Decimal | null | undefined): string {
  return formatQuantity(value, 'm2', 2);
}
