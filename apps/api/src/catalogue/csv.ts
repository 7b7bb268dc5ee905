import { BadRequestException } from '@nestjs/common';
import Papa from 'papaparse';

/** Most data rows one import takes (a 2 MB JSON body holds about 8,000 catalogue rows). */
export const MAX_CSV_ROWS = 20_000;

/** One data row of a CSV file: `row` is its spreadsheet row number (the header is row 1). */
export interface CsvRecord {
  row: number;
  /** Cells by column name (lower case), trimmed, formula escapes removed. Only the header's columns. */
  cells: Map<string, string>;
  /** A problem with the row's shape (too few or too many cells, a broken quote). */
  problem: string | null;
}

export interface CsvTable {
  columns: string[];
  records: CsvRecord[];
}

/** A whole-file problem (no header, a missing or unknown column): 400 naming the `csv` field. */
export function csvFileError(message: string): BadRequestException {
  return new BadRequestException({ message: `csv: ${message}`, code: 'validation_failed' });
}

/** A spreadsheet escapes a formula-like cell with a leading apostrophe (see toCsv); this undoes it. */
export function unescapeCell(value: string): string {
  return /^'[=+\-@\t\r]/.test(value) ? value.slice(1) : value;
}

/**
 * Parses a CSV text whose first row names its columns (any order, any case). Refuses the file when
 * a required column is missing or a column is not one of `known`; row-level shape problems are
 * kept on the row. Rows with every cell empty are skipped (their numbers still count).
 */
export function parseCsv(text: string, known: readonly string[], required: readonly string[]): CsvTable {
  const body = text.replace(/^\uFEFF/, '');
  if (body.trim() === '') {
    throw csvFileError(`the file is empty; its first row must name the columns: ${known.join(', ')}`);
  }
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: false, delimiter: ',' });
  const data = parsed.data;
  const header = (data[0] ?? []).map((h) => h.trim().toLowerCase());
  const unknown = header.filter((h) => !known.includes(h));
  if (unknown.length > 0) {
    throw csvFileError(
      `the first row must name the columns; ${unknown.map((u) => JSON.stringify(u.slice(0, 40))).join(', ')} ${unknown.length === 1 ? 'is' : 'are'} not one of ${known.join(', ')}`,
    );
  }
  const twice = header.filter((h, i) => header.indexOf(h) !== i);
  if (twice.length > 0) {
    throw csvFileError(`the column ${twice[0]} appears twice in the first row`);
  }
  const missing = required.filter((r) => !header.includes(r));
  if (missing.length > 0) {
    throw csvFileError(`the first row lacks the column${missing.length === 1 ? '' : 's'} ${missing.join(', ')}`);
  }
  const rowProblems = new Map<number, string>();
  for (const e of parsed.errors) {
    if (e.row !== undefined && e.row !== null && e.type === 'Quotes') {
      rowProblems.set(e.row, 'a quoted cell is not closed');
    }
  }
  const records: CsvRecord[] = [];
  for (let i = 1; i < data.length; i++) {
    const raw = data[i] ?? [];
    if (raw.every((c) => c.trim() === '')) {
      continue;
    }
    const cells = new Map<string, string>();
    header.forEach((h, j) => cells.set(h, unescapeCell((raw[j] ?? '').trim())));
    let problem = rowProblems.get(i) ?? null;
    if (problem === null && raw.length !== header.length) {
      problem = `the row has ${raw.length} cells but the first row names ${header.length} columns`;
    }
    records.push({ row: i + 1, cells, problem });
  }
  if (records.length > MAX_CSV_ROWS) {
    throw csvFileError(`the file has ${records.length} rows; split it into files of at most ${MAX_CSV_ROWS}`);
  }
  return { columns: header, records };
}

/**
 * A CSV text of `rows` under `columns`, with a byte-order mark so spreadsheets read it as UTF-8.
 * Cells a spreadsheet would run as a formula (=, +, @, or - before something not a number) get a
 * leading apostrophe; parseCsv takes it off again, so an export imports unchanged.
 */
export function toCsv(columns: readonly string[], rows: readonly Record<string, string>[]): string {
  return (
    '\uFEFF' +
    Papa.unparse(
      { fields: [...columns], data: rows.map((r) => columns.map((c) => r[c] ?? '')) },
      { escapeFormulae: /^([=+@\t\r]|-(?!\d*\.?\d+$))/, newline: '\r\n' },
    ) +
    '\r\n'
  );
}

/** A problem with one cell of a row, named by its column. */
export interface RowError {
  field: string;
  message: string;
}

/** What preview and commit answer for one row. */
export type RowAction = 'create' | 'update' | 'unchanged';

/** "Row 4: kind: must be…; Row 9: …", at most `limit` rows, for a 422 message. */
export function describeBadRows(rows: readonly { row: number; errors: readonly RowError[] }[], limit = 20): string {
  const bad = rows.filter((r) => r.errors.length > 0);
  const shown = bad
    .slice(0, limit)
    .map((r) => `Row ${r.row}: ${r.errors.map((e) => `${e.field}: ${e.message}`).join('; ')}`)
    .join('. ');
  return bad.length > limit ? `${shown}. And ${bad.length - limit} more rows.` : `${shown}.`;
}
