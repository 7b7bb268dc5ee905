import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { COUNT_STATUSES, CountStatus } from '../entities/stock-count.entity';
import { MovementResponse } from './movement.dto';
import { IsDecimalString, QUANTITY, Trim, TrimOrUndefined } from './validators';

export class OpenCountDto {
  @ApiPropertyOptional({ description: 'the location to count, with every location inside it; left out, everything' })
  @IsOptional()
  @IsUUID('all', { message: 'must be an id' })
  locationId?: string;

  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) note?: string;
}

export class CountEntryDto {
  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) lotId: string;
  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) locationId: string;
  @ApiProperty({ example: '47.5', description: 'what is on the shelf, in the stock unit' }) @IsDecimalString(QUANTITY) countedQuantity: string;
}

export class CountEntriesDto {
  @ApiProperty({ type: [CountEntryDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'must have at least one line' })
  @ArrayMaxSize(2000)
  @ValidateNested({ each: true })
  @Type(() => CountEntryDto)
  lines: CountEntryDto[];
}

export class SubmitCountDto {
  @ApiPropertyOptional({ type: [CountEntryDto], description: 'last entries, saved before submitting' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(2000)
  @ValidateNested({ each: true })
  @Type(() => CountEntryDto)
  lines?: CountEntryDto[];
}

export class ApproveCountDto {
  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) note?: string;
}

export const REJECT_ACTIONS = ['reopen', 'cancel'] as const;

export class RejectCountDto {
  @ApiProperty({ enum: REJECT_ACTIONS, description: 'reopen: count again (expected figures taken afresh); cancel: drop the count' })
  @IsIn(REJECT_ACTIONS, { message: `must be one of ${REJECT_ACTIONS.join(', ')}` })
  action: (typeof REJECT_ACTIONS)[number];

  @ApiProperty({ example: 'Bay B was not counted properly' })
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must say why' })
  @MaxLength(2000)
  note: string;
}

export class CountsQueryDto {
  @ApiPropertyOptional({ enum: COUNT_STATUSES })
  @IsOptional()
  @IsIn(COUNT_STATUSES, { message: `must be one of ${COUNT_STATUSES.join(', ')}` })
  status?: CountStatus;
}

export class CountLineResponse {
  @ApiProperty() id: string;
  @ApiProperty() lotId: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty() materialId: string;
  @ApiProperty() materialName: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'null while the count is open (blind entry), except for an owner' }) expectedQuantity: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) countedQuantity: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'counted − expected' }) varianceQuantity: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'variance × unit cost, to the penny' }) varianceValue: string | null;
  @ApiPropertyOptional({ nullable: true, enum: ['match', 'surplus', 'loss'] }) varianceKind: 'match' | 'surplus' | 'loss' | null;
  @ApiProperty() unitCost: string;
  @ApiProperty({ description: 'found on the shelf though the ledger did not put it there' }) foundDuringCount: boolean;
  @ApiPropertyOptional({ nullable: true, type: String }) countedAt: string | null;
}

export class CountTotalsResponse {
  @ApiProperty() lines: number;
  @ApiProperty() counted: number;
  @ApiProperty() losses: number;
  @ApiProperty() surpluses: number;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'net variance value; null while hidden' }) varianceValue: string | null;
}

export class CountSummaryResponse {
  @ApiProperty() id: string;
  @ApiProperty() number: number;
  @ApiProperty({ enum: COUNT_STATUSES }) status: CountStatus;
  @ApiPropertyOptional({ nullable: true, type: String }) locationId: string | null;
  @ApiProperty({ example: 'Main store', description: '"Everything" for a count of every location' }) scopeName: string;
  @ApiPropertyOptional({ nullable: true, type: String }) note: string | null;
  @ApiProperty() openedAt: string;
  @ApiProperty() openedByName: string;
  @ApiPropertyOptional({ nullable: true, type: String }) submittedAt: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) submittedByName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) decidedAt: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) decidedByName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) decisionNote: string | null;
  @ApiProperty() lineCount: number;
  @ApiProperty() countedCount: number;
}

export class CountResponse extends CountSummaryResponse {
  @ApiProperty({ description: 'false while open, for everyone but an owner' }) expectedVisible: boolean;
  @ApiProperty({ type: [String] }) locationNames: string[];
  @ApiProperty({ type: [CountLineResponse] }) lines: CountLineResponse[];
  @ApiProperty({ type: CountTotalsResponse }) totals: CountTotalsResponse;
  @ApiProperty({ type: [MovementResponse], description: 'the adjustments posted on approval' }) adjustments: MovementResponse[];
}
