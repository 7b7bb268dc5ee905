// Dates and sizes as the users read them (British English, 24-hour clock).

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const dateTimeFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

function toDate(value: string | Date): Date | null {
  const date = value instanceof Date ? value : new Date(value);
  return Number.isNaN(date.getTime()) ? null : date;
}

export function formatDate(value: string | Date): string {
  const date = toDate(value);
  return date ? dateFormat.format(date) : '—';
}

export function formatDateTime(value: string | Date): string {
  const date = toDate(value);
  return date ? dateTimeFormat.format(date) : '—';
}

export function formatBytes(size: number): string {
  if (!Number.isFinite(size) || size < 0) {
    return '—';
  }
  if (size < 1024) {
    return `${size} B`;
  }
  if (size < 1024 * 1024) {
    return `${(size / 1024).toFixed(size < 10 * 1024 ? 1 : 0)} kB`;
  }
  return `${(size / (1024 * 1024)).toFixed(1)} MB`;
}

/** Sorts by a key, for tables sorted on the client. */
export function compareValues(a: unknown, b: unknown): number {
  if (typeof a === 'number' && typeof b === 'number') {
    return a - b;
  }
  return String(a ?? '').localeCompare(String(b ?? ''), 'en-GB', { sensitivity: 'base', numeric: true });
}
