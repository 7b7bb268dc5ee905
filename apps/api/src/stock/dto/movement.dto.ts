import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, MinLength, ValidateIf } from 'class-validator';
import type { MovementKind } from '@potlife/domain';
import { MOVEMENT_KINDS, WRITE_OFF_REASONS, WriteOffReason } from '../entities/stock-movement.entity';
import { LotResponse } from './lot.dto';
import { IsCalendarDate, IsDecimalString, QUANTITY, Trim, TrimOrUndefined } from './validators';

const toInt = ({ value }: { value: unknown }) => (typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value);

export class MovementResponse {
  @ApiProperty() id: string;
  @ApiProperty({ description: 'shared by the movements one request posted (both legs of a transfer, every line of a receipt)' }) operationId: string;
  @ApiProperty({ enum: MOVEMENT_KINDS }) kind: MovementKind;
  @ApiProperty() lotId: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty() materialId: string;
  @ApiProperty() materialName: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty({ description: 'the location whose balance this line changes' }) locationId: string;
  @ApiProperty() locationName: string;
  @ApiPropertyOptional({ nullable: true, type: String }) fromLocationId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) fromLocationName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) toLocationId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) toLocationName: string | null;
  @ApiProperty({ example: '-5.000', description: 'signed: + into the location, − out of it' }) quantity: string;
  @ApiProperty({ example: '3.2000' }) unitCost: string;
  @ApiProperty({ example: '-16.00' }) value: string;
  @ApiPropertyOptional({ nullable: true, type: String }) reason: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) note: string | null;
  @ApiProperty() userId: string;
  @ApiProperty() userName: string;
  @ApiProperty() createdAt: string;
  @ApiPropertyOptional({ nullable: true, type: String }) jobId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) receiptLineId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) receiptId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) countId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) reversesMovementId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) reversedByMovementId: string | null;
}

export class MovementPageResponse {
  @ApiProperty({ type: [MovementResponse] }) items: MovementResponse[];
  @ApiProperty() total: number;
}

/** What a stock-changing request answers: the movements it appended, the lot after them, and any warnings. */
export class MovementResultResponse {
  @ApiProperty() operationId: string;
  @ApiProperty({ type: [MovementResponse] }) movements: MovementResponse[];
  @ApiProperty({ type: LotResponse }) lot: LotResponse;
  @ApiProperty({ type: [String], description: 'e.g. a flammables cabinet nearly full' }) warnings: string[];
}

export const POSTED_KINDS = ['transfer', 'adjustment', 'write-off'] as const;
export type PostedKind = (typeof POSTED_KINDS)[number];

/**
 * A transfer (lotId, fromLocationId, toLocationId, quantity > 0), an adjustment (lotId,
 * locationId, signed quantity, reason) or a write-off (lotId, locationId, quantity > 0, reason
 * expired | damaged | temperature). Issues and returns are posted by jobs.
 */
export class CreateMovementDto {
  @ApiProperty({ enum: POSTED_KINDS })
  @IsIn(POSTED_KINDS, { message: `must be one of ${POSTED_KINDS.join(', ')} (issues and returns are posted from a job)` })
  kind: PostedKind;

  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) lotId: string;

  @ApiProperty({ example: '5', description: 'transfer, write-off: more than 0; adjustment: signed, not 0' })
  @IsDecimalString({ ...QUANTITY, signed: true, nonZero: true })
  quantity: string;

  @ApiPropertyOptional({ description: 'transfer: where from' })
  @ValidateIf((o: CreateMovementDto) => o.kind === 'transfer' || o.fromLocationId !== undefined)
  @IsUUID('all', { message: 'must be an id (a transfer needs fromLocationId)' })
  fromLocationId?: string;

  @ApiPropertyOptional({ description: 'transfer: where to' })
  @ValidateIf((o: CreateMovementDto) => o.kind === 'transfer' || o.toLocationId !== undefined)
  @IsUUID('all', { message: 'must be an id (a transfer needs toLocationId)' })
  toLocationId?: string;

  @ApiPropertyOptional({ description: 'adjustment, write-off: the location whose balance changes' })
  @ValidateIf((o: CreateMovementDto) => o.kind === 'adjustment' || o.kind === 'write-off' || o.locationId !== undefined)
  @IsUUID('all', { message: 'must be an id (an adjustment or write-off needs locationId)' })
  locationId?: string;

  @ApiPropertyOptional({ description: 'write-off: expired | damaged | temperature; adjustment: why, in words' })
  @ValidateIf((o: CreateMovementDto) => o.kind === 'adjustment' || o.kind === 'write-off' || o.reason !== undefined)
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must say why' })
  @MaxLength(120)
  reason?: string;

  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) note?: string;
}

export class ReverseMovementDto {
  @ApiProperty({ example: 'Booked to the wrong lot' })
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must say why' })
  @MaxLength(2000)
  note: string;
}

export class MovementsQueryDto {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) lotId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) materialId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) locationId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) jobId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) countId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) receiptId?: string;
  @ApiPropertyOptional({ enum: MOVEMENT_KINDS }) @IsOptional() @IsIn(MOVEMENT_KINDS, { message: `must be one of ${MOVEMENT_KINDS.join(', ')}` }) kind?: MovementKind;
  @ApiPropertyOptional({ description: 'from this date (YYYY-MM-DD), inclusive' }) @IsOptional() @IsCalendarDate() from?: string;
  @ApiPropertyOptional({ description: 'to this date (YYYY-MM-DD), inclusive' }) @IsOptional() @IsCalendarDate() to?: string;
  @ApiPropertyOptional({ default: 100 }) @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number' }) @Min(1) @Max(1000) limit?: number;
  @ApiPropertyOptional({ default: 0 }) @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number' }) @Min(0) offset?: number;
}

export { WRITE_OFF_REASONS };
export type { WriteOffReason };
