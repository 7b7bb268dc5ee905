import dayjs from 'dayjs';
import timezone from 'dayjs/plugin/timezone';
import utc from 'dayjs/plugin/utc';
import Papa from 'papaparse';

dayjs.extend(utc);
dayjs.extend(timezone);

/** Times written without a time zone are read as the firm's local time. */
export const LOCAL_ZONE = 'Europe/London';
/** Readings below or above these are not storage temperatures (a probe unplugged, a typing slip). Potlife's own. */
export const PLAUSIBLE_C = { min: -60, max: 100 };
export const MAX_ROWS = 50_000;

const TIME_HEADERS = ['timestamp', 'time', 'datetime', 'date/time', 'date time', 'date_time', 'taken at', 'taken_at', 'recorded', 'date'];
const TEMP_HEADERS = ['temperature', 'temp', 'temperature_c', 'temperature (c)', 'temperature (°c)', 'temp (°c)', 'temp °c', 'temp_c', '°c', 'c', 'celsius', 'value'];

export interface ParsedRow {
  row: number;
  takenAt: Date;
  temperatureC: string;
}

export interface ParsedCsv {
  rows: number;
  readings: ParsedRow[];
  errors: { row: number; message: string }[];
}

export class CsvShapeError extends Error {}

// Headings are compared folded: case, spaces, underscores and brackets do not count, so
// "Temp °C", "temp (°C)" and "TEMP_°C" are one heading.
const norm = (h: string) => h.replace(/^\uFEFF/, '').toLowerCase().replace(/[\s_()[\]]+/g, '');
const TIME_KEYS = TIME_HEADERS.map(norm);
const TEMP_KEYS = TEMP_HEADERS.map(norm);

/**
 * A moment from a logger's timestamp: ISO 8601 with a time zone as written; "YYYY-MM-DD HH:mm[:ss]"
 * (or with T) and "DD/MM/YYYY HH:mm[:ss]" as local time in LOCAL_ZONE. Null if not a real moment.
 */
export function parseTimestamp(raw: string): Date | null {
  const s = raw.trim();
  if (/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/i.test(s)) {
    const t = Date.parse(s);
    return Number.isNaN(t) ? null : new Date(t);
  }
  let m = /^(\d{4})-(\d{2})-(\d{2})[ T](\d{1,2}):(\d{2})(?::(\d{2}))?$/.exec(s);
  let parts: [string, string, string, string, string, string] | null = null;
  if (m) {
    parts = [m[1]!, m[2]!, m[3]!, m[4]!, m[5]!, m[6] ?? '00'];
  } else {
    m = /^(\d{1,2})\/(\d{1,2})\/(\d{4})[ T](\d{1,2}):(\d{2})(?::(\d{2}))?$/.exec(s);
    if (m) {
      parts = [m[3]!, m[2]!.padStart(2, '0'), m[1]!.padStart(2, '0'), m[4]!, m[5]!, m[6] ?? '00'];
    }
  }
  if (!parts) {
    return null;
  }
  const [y, mo, d, h, mi, se] = parts;
  const local = `${y}-${mo}-${d}T${h.padStart(2, '0')}:${mi}:${se}`;
  const check = dayjs(local);
  if (!check.isValid() || check.format('YYYY-MM-DDTHH:mm:ss') !== local) {
    return null;
  }
  return dayjs.tz(local, LOCAL_ZONE).toDate();
}

/** A temperature as a decimal string to 2 places ("21,5" is read as 21.5 when the file is not comma-separated; a trailing °C is fine). */
export function parseTemperature(raw: string, commaDecimal: boolean): string | null {
  let s = raw.trim().replace(/\s*°?\s*C$/i, '');
  if (commaDecimal) {
    s = s.replace(',', '.');
  }
  if (!/^-?\d{1,3}(\.\d+)?$/.test(s)) {
    return null;
  }
  const n = Number(s);
  return (Math.round(n * 100) / 100).toFixed(2);
}

/**
 * A data logger's CSV: a header row naming a timestamp column and a temperature column, then
 * one reading per row. Every bad row is listed with its line in the file (the header is line 1);
 * the good rows are returned. Throws CsvShapeError when the file has not the right columns.
 */
export function parseLoggerCsv(csv: string, now: Date = new Date()): ParsedCsv {
  const text = csv.replace(/^\uFEFF/, '');
  // The delimiter is the one the header row uses (a comma can also be a decimal point in the rows).
  const head = text.split(/\r?\n/, 1)[0] ?? '';
  const delimiter = [',', ';', '\t', '|'].find((d) => head.includes(d)) ?? ',';
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false, delimiter });
  const data = parsed.data;
  const header = (data[0] ?? []).map(norm);
  const ti = header.findIndex((h) => TIME_KEYS.includes(h));
  const ci = header.findIndex((h, i) => i !== ti && TEMP_KEYS.includes(h));
  if (ti < 0 || ci < 0) {
    throw new CsvShapeError(
      `the first line must name a timestamp column and a temperature column (e.g. "timestamp,temperature"); found: ${header.filter(Boolean).join(', ') || 'nothing'}`,
    );
  }
  const commaDecimal = delimiter !== ',';
  const body = data.slice(1);
  if (body.length > MAX_ROWS) {
    throw new CsvShapeError(`the file has ${body.length} rows; import at most ${MAX_ROWS} at a time`);
  }
  const readings: ParsedRow[] = [];
  const errors: { row: number; message: string }[] = [];
  let rows = 0;
  const latest = now.getTime() + 5 * 60_000;
  body.forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => c.trim() === '')) {
      return;
    }
    rows += 1;
    const rawTime = cells[ti] ?? '';
    const rawTemp = cells[ci] ?? '';
    const takenAt = parseTimestamp(rawTime);
    if (!takenAt) {
      errors.push({ row, message: `timestamp "${rawTime.slice(0, 40)}" is not a date and time (use 2025-06-01T06:00:00Z or 2025-06-01 07:00)` });
      return;
    }
    if (takenAt.getTime() > latest) {
      errors.push({ row, message: `timestamp ${rawTime.trim()} is in the future` });
      return;
    }
    const temperatureC = parseTemperature(rawTemp, commaDecimal);
    if (temperatureC === null) {
      errors.push({ row, message: `temperature "${rawTemp.slice(0, 20)}" is not a number of °C` });
      return;
    }
    const n = Number(temperatureC);
    if (n < PLAUSIBLE_C.min || n > PLAUSIBLE_C.max) {
      errors.push({ row, message: `temperature ${temperatureC} °C is not a storage temperature (expected ${PLAUSIBLE_C.min} to ${PLAUSIBLE_C.max} °C)` });
      return;
    }
    readings.push({ row, takenAt, temperatureC });
  });
  return { rows, readings, errors };
}
