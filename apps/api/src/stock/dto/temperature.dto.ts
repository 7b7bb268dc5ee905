import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional, IsString, IsUUID, MaxLength, MinLength } from 'class-validator';
import { IsDecimalString, IsInstant, TrimOrUndefined } from './validators';

export class CreateReadingDto {
  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) locationId: string;

  @ApiProperty({ example: '18.5', description: '°C' })
  @IsDecimalString({ scale: 2, integerDigits: 3, signed: true })
  temperatureC: string;

  @ApiProperty({ example: '2025-06-02T07:30:00Z', description: 'when it was read, with its time zone' })
  @IsInstant()
  takenAt: string;

  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) note?: string;
}

export class ImportReadingsDto {
  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) locationId: string;

  @ApiProperty({
    example: 'timestamp,temperature\n2025-06-01T06:00:00Z,17.8\n2025-06-01 12:00,21.4',
    description:
      'a data logger’s CSV with a header row: a timestamp column (timestamp, time, date/time…) and a temperature column (temperature, temp, °C…). ' +
      'Times without a time zone are UK local time; DD/MM/YYYY HH:mm is read as day first.',
  })
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(1_900_000)
  csv: string;

  @ApiPropertyOptional({ description: 'check the file and answer what would happen, saving nothing' })
  @IsOptional()
  @IsBoolean()
  dryRun?: boolean;
}

export class ReadingsQueryDto {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) locationId?: string;
  @ApiPropertyOptional({ description: 'from this moment (default 30 days ago)' }) @IsOptional() @IsInstant() from?: string;
  @ApiPropertyOptional({ description: 'up to this moment (default now)' }) @IsOptional() @IsInstant() to?: string;
}

export class ReadingResponse {
  @ApiProperty() id: string;
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty() takenAt: string;
  @ApiProperty({ example: '18.50' }) temperatureC: string;
  @ApiProperty({ enum: ['manual', 'import'] }) source: string;
  @ApiPropertyOptional({ nullable: true, type: String }) note: string | null;
  @ApiPropertyOptional({ nullable: true, type: Boolean, description: 'outside the band of what is stored there now (chart colouring)' }) outOfBand: boolean | null;
}

export class FlaggedLotResponse {
  @ApiProperty() lotId: string;
  @ApiProperty() materialName: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty({ enum: ['too-warm', 'too-cold'] }) exposure: string;
  @ApiProperty() message: string;
  @ApiProperty() readingId: string;
  @ApiProperty() takenAt: string;
  @ApiProperty({ description: 'false when the lot was flagged already' }) newlyFlagged: boolean;
}

export class TemperatureBandResponse {
  @ApiPropertyOptional({ nullable: true, type: String, description: 'the highest minimum of the materials stored there' }) minC: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'the lowest maximum' }) maxC: string | null;
  @ApiProperty({ type: [String] }) materials: string[];
}

export class RecordReadingResponse {
  @ApiProperty({ type: ReadingResponse }) reading: ReadingResponse;
  @ApiProperty({ type: [FlaggedLotResponse], description: 'lots stored there at that time and outside their range: check before use' }) flaggedLots: FlaggedLotResponse[];
}

export class ImportRowError {
  @ApiProperty({ description: 'the line in the file, the header being line 1' }) row: number;
  @ApiProperty() message: string;
}

export class ImportReadingsResponse {
  @ApiProperty() dryRun: boolean;
  @ApiProperty({ description: 'rows in the file, header excluded' }) rows: number;
  @ApiProperty({ description: 'readings saved (or that would be)' }) imported: number;
  @ApiProperty({ type: [ImportRowError], description: 'rows left out, and why; nothing else is left out' }) errors: ImportRowError[];
  @ApiProperty({ type: [ImportRowError], description: 'rows already held for that moment, skipped' }) duplicates: ImportRowError[];
  @ApiPropertyOptional({ nullable: true, type: String }) firstTakenAt: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) lastTakenAt: string | null;
  @ApiProperty({ type: [FlaggedLotResponse] }) flaggedLots: FlaggedLotResponse[];
}

export class ReadingsChartResponse {
  @ApiPropertyOptional({ nullable: true, type: String }) locationId: string | null;
  @ApiProperty() from: string;
  @ApiProperty() to: string;
  @ApiPropertyOptional({ type: TemperatureBandResponse, nullable: true, description: 'the allowed band for one location; null for all' }) band: TemperatureBandResponse | null;
  @ApiProperty({ type: [ReadingResponse] }) readings: ReadingResponse[];
}
