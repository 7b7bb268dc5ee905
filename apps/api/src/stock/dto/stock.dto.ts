import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { MATERIAL_KINDS, MaterialKind } from '@potlife/domain';
import { ExpiryResponse, LotResponse } from './lot.dto';

export const BALANCE_VIEWS = ['material', 'location', 'lot'] as const;
export type BalanceView = (typeof BALANCE_VIEWS)[number];

export class StockQueryDto {
  @ApiPropertyOptional({ enum: BALANCE_VIEWS, default: 'material' })
  @IsOptional()
  @IsIn(BALANCE_VIEWS, { message: `must be one of ${BALANCE_VIEWS.join(', ')}` })
  by?: BalanceView;

  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) materialId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) locationId?: string;

  @ApiPropertyOptional({ enum: MATERIAL_KINDS })
  @IsOptional()
  @IsIn(MATERIAL_KINDS, { message: `must be one of ${MATERIAL_KINDS.join(', ')}` })
  kind?: MaterialKind;
}

export class MaterialBalanceRow {
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty() materialKind: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty({ example: '120.000' }) quantity: string;
  @ApiProperty({ example: '95.000', description: 'available, in date, not flagged' }) usableQuantity: string;
  @ApiProperty({ example: '384.00' }) value: string;
  @ApiProperty() lotCount: number;
  @ApiPropertyOptional({ type: ExpiryResponse, nullable: true, description: 'the earliest expiry among usable lots' }) nextExpiry: ExpiryResponse | null;
  @ApiProperty({ example: '50.000' }) reorderLevel: string;
  @ApiProperty({ example: '100.000' }) reorderQuantity: string;
  @ApiProperty({ description: 'usable quantity at or below the reorder level (when one is set)' }) belowReorder: boolean;
}

export class LocationBalanceRow {
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty() locationKind: string;
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty() quantity: string;
  @ApiProperty() value: string;
  @ApiProperty() lotCount: number;
}

export class LotBalanceRow {
  @ApiProperty() lotId: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty() materialId: string;
  @ApiProperty() materialName: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty() quantity: string;
  @ApiProperty() unitCost: string;
  @ApiProperty() value: string;
  @ApiProperty({ type: ExpiryResponse }) expiry: ExpiryResponse;
  @ApiProperty() status: string;
  @ApiProperty() usable: boolean;
  @ApiProperty() exposureFlagged: boolean;
}

export class StockBalancesResponse {
  @ApiProperty({ enum: BALANCE_VIEWS }) by: BalanceView;
  @ApiProperty({ description: 'MaterialBalanceRow[], LocationBalanceRow[] or LotBalanceRow[] according to `by`' })
  rows: MaterialBalanceRow[] | LocationBalanceRow[] | LotBalanceRow[];
  @ApiProperty({ example: '1520.40', description: 'value of everything listed' }) totalValue: string;
}

export class OverviewCount {
  @ApiProperty() id: string;
  @ApiProperty() number: number;
  @ApiProperty({ enum: ['open', 'submitted'] }) status: string;
  @ApiPropertyOptional({ nullable: true, type: String }) locationId: string | null;
  @ApiProperty({ example: 'Main store', description: '"Everything" for a count of every location' }) scopeName: string;
  @ApiProperty() openedAt: string;
}

export class OverviewAlert {
  @ApiProperty() lotId: string;
  @ApiProperty() materialName: string;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiProperty() quantity: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty({ type: [String] }) locationNames: string[];
  @ApiPropertyOptional({ nullable: true, type: String }) reason: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) flaggedAt: string | null;
}

export class OverviewSegregationProblem {
  @ApiProperty() locationId: string;
  @ApiProperty() locationName: string;
  @ApiProperty({ type: [String] }) classes: string[];
  @ApiProperty({ type: [String] }) materials: string[];
  @ApiProperty() message: string;
}

export class OverviewReorder {
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty() stockUnit: string;
  @ApiProperty() usableQuantity: string;
  @ApiProperty() reorderLevel: string;
  @ApiProperty() reorderQuantity: string;
}

export class StockOverviewResponse {
  @ApiProperty() today: string;
  @ApiProperty({ type: [Object], description: 'purchase orders due in: empty until purchase orders exist' }) deliveriesDue: unknown[];
  @ApiProperty({ type: [OverviewCount], description: 'open (being counted) and submitted (awaiting approval)' }) countsOpen: OverviewCount[];
  @ApiProperty({ type: [LotResponse], description: 'in stock, not yet expired, expiring within 30 days' }) expiringSoon: LotResponse[];
  @ApiProperty({ type: [LotResponse], description: 'past expiry, still in stock and not quarantined or written off' }) expiredInStock: LotResponse[];
  @ApiProperty({ type: [OverviewAlert], description: 'exposure-flagged lots in stock, not quarantined' }) temperatureAlerts: OverviewAlert[];
  @ApiProperty({ type: [OverviewSegregationProblem] }) segregationProblems: OverviewSegregationProblem[];
  @ApiProperty({ type: [OverviewReorder] }) belowReorder: OverviewReorder[];
}
