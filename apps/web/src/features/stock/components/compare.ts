import { compareDecimals } from '../../../lib/amounts';

/** Columns holding decimal strings sort as numbers. */
export function decimalColumns(columns: readonly string[]) {
  return (column: string, a: unknown, b: unknown): number | undefined =>
    columns.includes(column) ? compareDecimals(a as string | null, b as string | null) : undefined;
}
