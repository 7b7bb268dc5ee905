import { ApiProperty } from '@nestjs/swagger';
import { IsIn, IsString, MaxLength } from 'class-validator';
import { MATERIAL_CSV_HELP } from '../material-csv';

export const IMPORT_MODES = ['preview', 'commit'] as const;
export type ImportMode = (typeof IMPORT_MODES)[number];

/** `?mode=preview` checks the file and writes nothing; `?mode=commit` writes every row or none. */
export class ImportQuery {
  @ApiProperty({ enum: IMPORT_MODES })
  @IsIn(IMPORT_MODES, { message: 'must be preview or commit' })
  mode: ImportMode;
}

/** Most characters of a CSV text in a JSON body (the API takes JSON bodies up to 2 MB). */
export const MAX_CSV_CHARS = 2_000_000;

/**
 * The body of POST /api/materials/import: the CSV file's text as one JSON string,
 * `{"csv": "code,name,kind,…\r\nRES-25,…"}`. Comma-separated, first row the column names,
 * UTF-8 (a byte-order mark is fine); exactly what GET /api/materials/export.csv writes.
 */
export class ImportMaterialsDto {
  @ApiProperty({ description: `The CSV text. Columns:\n${MATERIAL_CSV_HELP}` })
  @IsString()
  @MaxLength(MAX_CSV_CHARS)
  csv: string;
}

export class ImportRowError {
  @ApiProperty({ description: 'The CSV column, or "row" for the row as a whole' }) field: string;
  @ApiProperty() message: string;
}

export class ImportRowResult {
  @ApiProperty({ description: 'Spreadsheet row number: the header is row 1, the first data row 2' }) row: number;
  @ApiProperty({ enum: ['create', 'update', 'unchanged'] }) action: 'create' | 'update' | 'unchanged';
  @ApiProperty({ description: 'The material code of the row' }) code: string;
  @ApiProperty({ description: 'The material name of the row' }) name: string;
  @ApiProperty({ type: [ImportRowError] }) errors: ImportRowError[];
}

/** What preview and commit answer. After a commit, `committed` is true and the counts are what was written. */
export class ImportResult {
  @ApiProperty({ type: [ImportRowResult] }) rows: ImportRowResult[];
  @ApiProperty({ description: 'Rows without errors' }) valid: number;
  @ApiProperty({ description: 'Rows with errors' }) invalid: number;
  @ApiProperty() created: number;
  @ApiProperty() updated: number;
  @ApiProperty() unchanged: number;
  @ApiProperty() committed: boolean;
}
