import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, Max, MaxLength, Min, MinLength, IsInt } from 'class-validator';
import { HAZARD_CLASSES } from '@potlife/domain';
import { LOT_STATUSES, LotStatus } from '../entities/lot.entity';
import { Trim } from './validators';

const toBool = ({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value);
const toInt = ({ value }: { value: unknown }) => (typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value);

export class ExpiryResponse {
  @ApiPropertyOptional({ nullable: true, type: String, example: '2025-09-30' }) expiresOn: string | null;
  @ApiPropertyOptional({ nullable: true, type: Number, description: '0 on the expiry date, negative once expired' }) daysToExpiry: number | null;
  @ApiProperty({ enum: ['expired', 'expiring', 'ok', 'none'] }) badge: 'expired' | 'expiring' | 'ok' | 'none';
}

export class LotPlaceResponse {
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty({ example: '50.000' }) quantity: string;
}

export class LotResponse {
  @ApiProperty() id: string;
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty() materialKind: string;
  @ApiProperty({ enum: ['kg', 'L', 'm2', 'm', 'each'] }) stockUnit: string;
  @ApiProperty({ enum: HAZARD_CLASSES }) hazardClass: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty() receivedOn: string;
  @ApiProperty({ type: ExpiryResponse }) expiry: ExpiryResponse;
  @ApiProperty({ enum: LOT_STATUSES, description: 'an available lot past its expiry date shows as expired' }) status: LotStatus;
  @ApiProperty({ description: 'available, in date and not exposure-flagged: may be issued' }) usable: boolean;
  @ApiProperty({ example: '50.000', description: 'ledger balance over all locations' }) quantity: string;
  @ApiProperty({ example: '3.2000', description: '£ per stock unit' }) unitCost: string;
  @ApiProperty({ example: '160.00', description: 'quantity × unit cost, to the penny' }) value: string;
  @ApiProperty({ description: 'where the lot is recorded (follows it when all of it moves)' }) locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty({ type: [LotPlaceResponse], description: 'balance per location, above zero' }) places: LotPlaceResponse[];
  @ApiPropertyOptional({ nullable: true, type: String }) receiptId: string | null;
  @ApiPropertyOptional({ nullable: true, type: Number }) receiptNumber: number | null;
  @ApiProperty() exposureFlagged: boolean;
  @ApiPropertyOptional({ nullable: true, type: String }) exposureReason: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) exposureFlaggedAt: string | null;
  @ApiProperty() labelUrl: string;
  @ApiProperty() createdAt: string;
}

export class LotEventResponse {
  @ApiProperty() id: string;
  @ApiProperty({ enum: ['quarantined', 'released', 'flagged', 'flag-cleared', 'written-off'] }) kind: string;
  @ApiPropertyOptional({ nullable: true, type: String }) note: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) readingId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) userName: string | null;
  @ApiProperty() createdAt: string;
}

export class LotDetailResponse extends LotResponse {
  @ApiProperty({ type: [LotEventResponse] }) events: LotEventResponse[];
}

export class LotsQueryDto {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) materialId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) locationId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) receiptId?: string;
  @ApiPropertyOptional({ enum: LOT_STATUSES }) @IsOptional() @IsIn(LOT_STATUSES, { message: `must be one of ${LOT_STATUSES.join(', ')}` }) status?: LotStatus;
  @ApiPropertyOptional({ description: 'only lots expiring within this many days (expired ones included)' })
  @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number of days' }) @Min(0) @Max(3650) expiringWithinDays?: number;
  @ApiPropertyOptional() @IsOptional() @Transform(toBool) @IsBoolean({ message: 'must be true or false' }) flagged?: boolean;
  @ApiPropertyOptional({ description: 'include lots with nothing left' }) @IsOptional() @Transform(toBool) @IsBoolean({ message: 'must be true or false' }) includeEmpty?: boolean;
  @ApiPropertyOptional({ description: 'search batch number, material name or code' }) @IsOptional() @IsString() @MaxLength(100) q?: string;
}

/** Quarantine, release or clear-flag: who did it is recorded, and why. */
export class LotActionDto {
  @ApiProperty({ example: 'Drum dented at the rim; kept aside for the supplier to see' })
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must say why' })
  @MaxLength(2000)
  note: string;
}

export class LabelQueryDto {
  @ApiPropertyOptional({ description: 'copies of the label (one per pack, say), 1–100', default: 1 })
  @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number' }) @Min(1) @Max(100) copies?: number;
}
