import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { IsDecimalValue, IsIsoDate, trim, trimToNull } from '../../costing/validation';
import type { Named } from '../dto/job-response';

export class CreateLabourEntryDto {
  @ApiProperty({ example: '2026-05-18', description: 'the day the hours were worked (not after today)' })
  @IsIsoDate()
  workedOn: string;

  @ApiProperty({ example: '7.5', description: 'hours worked, more than 0 and at most 24, to 2 decimal places' })
  @IsDecimalValue({ min: 0, exclusiveMin: true, max: 24, places: 2 })
  hours: string;

  @ApiProperty({ example: 'Jonah Pell', description: 'who worked (a crew member’s name, free text)' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  crewMember: string;

  @ApiPropertyOptional({ example: 'Second coat of topcoat after the rain stopped', nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(1000)
  note?: string | null;
}

export class RemoveLabourEntryQuery {
  @ApiPropertyOptional({ example: 'Booked on the wrong job', description: 'why the entry is struck out' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(500)
  reason?: string | null;
}

export interface LabourEntryResponse {
  id: string;
  workedOn: string;
  /** decimal string, hours */
  hours: string;
  crewMember: string;
  note: string | null;
  createdBy: Named | null;
  createdAt: string;
  /** null while the entry counts; once struck out, who did it, when and why */
  removed: { at: string; by: Named | null; reason: string | null } | null;
}

/** A job's time sheet. Hours only: what they cost is in the reconciliation, for owners and estimators. */
export interface JobLabourResponse {
  jobId: string;
  /** whether hours may be recorded or struck out now (scheduled, in progress or complete) */
  open: boolean;
  /** why not, when closed */
  closedReason: string | null;
  /** the accepted estimate's labour hours (null without one) */
  estimatedHours: string | null;
  /** hours of the entries that count */
  recordedHours: string;
  byCrewMember: { crewMember: string; hours: string }[];
  /** newest day first; struck-out entries are kept and marked */
  entries: LabourEntryResponse[];
}
