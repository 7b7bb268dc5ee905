import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { JOB_STATUSES, JobStatus } from '@potlife/domain';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, MinLength } from 'class-validator';
import { IsIsoDate, trim, trimToNull } from '../../costing/validation';
import { SUBSTRATES, Substrate } from '../entities/job.entity';

export class CreateJobDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be the id of a customer' })
  customerId: string;

  @ApiPropertyOptional({
    example: 'Rear extension flat roof',
    description: 'defaults to “Flat roof” and the first line of the site address',
  })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(160)
  title?: string | null;

  @ApiProperty({ example: '14 Wren Close, Hollowmere HM3 8LB' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(500)
  siteAddress: string;

  @ApiProperty({ enum: SUBSTRATES })
  @IsIn(SUBSTRATES, { message: `must be one of ${SUBSTRATES.join(', ')}` })
  substrate: Substrate;

  @ApiPropertyOptional({ example: '2026-05-18', nullable: true })
  @IsOptional()
  @IsIsoDate()
  scheduledOn?: string | null;

  @ApiPropertyOptional({
    format: 'uuid',
    nullable: true,
    description: 'an owner or estimator of the company; defaults to the caller',
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a user' })
  estimatorId?: string | null;

  @ApiPropertyOptional({ example: 'Jonah and Bea', nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(160)
  crew?: string | null;

  @ApiPropertyOptional({ example: 'Slate grey', nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(60)
  topcoatColour?: string | null;

  @ApiPropertyOptional({ format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a build-up' })
  buildUpId?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(4000)
  notes?: string | null;
}

export class UpdateJobDto {
  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a customer' })
  customerId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(160)
  title?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(500)
  siteAddress?: string;

  @ApiPropertyOptional({ enum: SUBSTRATES })
  @IsOptional()
  @IsIn(SUBSTRATES, { message: `must be one of ${SUBSTRATES.join(', ')}` })
  substrate?: Substrate;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @IsIsoDate()
  scheduledOn?: string | null;

  @ApiPropertyOptional({ format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a user' })
  estimatorId?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(160)
  crew?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(60)
  topcoatColour?: string | null;

  @ApiPropertyOptional({ format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a build-up' })
  buildUpId?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(4000)
  notes?: string | null;
}

export class ChangeStatusDto {
  @ApiProperty({ enum: JOB_STATUSES })
  @IsIn(JOB_STATUSES, { message: `must be one of ${JOB_STATUSES.join(', ')}` })
  status: JobStatus;

  @ApiPropertyOptional({ example: 'Customer chose a cheaper quote' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(1000)
  reason?: string | null;
}

export const JOB_SORTS = [
  'number',
  '-number',
  'scheduledOn',
  '-scheduledOn',
  'createdAt',
  '-createdAt',
  'value',
  '-value',
  'status',
  'customer',
  '-customer',
] as const;
export type JobSort = (typeof JOB_SORTS)[number];

export class ListJobsQuery {
  @ApiPropertyOptional({ description: 'one status or several, comma-separated', example: 'won,scheduled' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  status?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a customer' })
  customerId?: string;

  @ApiPropertyOptional({ description: 'scheduled on or after' })
  @IsOptional()
  @IsIsoDate()
  from?: string;

  @ApiPropertyOptional({ description: 'scheduled on or before' })
  @IsOptional()
  @IsIsoDate()
  to?: string;

  @ApiPropertyOptional({ description: 'part of the reference, title, site address or customer name' })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(100)
  q?: string;

  @ApiPropertyOptional({ enum: JOB_SORTS, default: '-number' })
  @IsOptional()
  @IsIn(JOB_SORTS, { message: `must be one of ${JOB_SORTS.join(', ')}` })
  sort?: JobSort;

  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page?: number;

  @ApiPropertyOptional({ default: 25 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(200)
  pageSize?: number;
}

export class CalendarQuery {
  @ApiProperty({ example: '2026-05-01' })
  @IsIsoDate()
  from: string;

  @ApiProperty({ example: '2026-05-31' })
  @IsIsoDate()
  to: string;
}

export class UpdateSettingsDto {
  @ApiPropertyOptional({
    example: 7,
    description: 'reserved stock must still be in date this many days after the job date',
  })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(365)
  reservationMarginDays?: number;

  @ApiPropertyOptional({ example: 30, description: 'a quote holds for this many days' })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(365)
  quoteValidityDays?: number;
}
