import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { IsCalendarDate, IsDecimalString, QUANTITY, TrimOrUndefined, UNIT_COST } from './validators';

const toInt = ({ value }: { value: unknown }) => (typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value);

export class ReceiptLineDto {
  @ApiProperty() @IsUUID('all', { message: 'must be an id' }) materialId: string;

  @ApiPropertyOptional({ description: 'the purchase-order line delivered against (purchase orders come later)' })
  @IsOptional()
  @IsUUID('all', { message: 'must be an id' })
  purchaseOrderLineId?: string;

  @ApiPropertyOptional({ example: 'B24-0917', description: "the maker's batch number; needed for lot-tracked materials" })
  @IsOptional()
  @TrimOrUndefined()
  @IsString()
  @MaxLength(60)
  batchNumber?: string;

  @ApiPropertyOptional({ example: '2025-12-31', description: 'as printed on the packs; left out, it is the received date + the shelf life' })
  @IsOptional()
  @IsCalendarDate()
  expiresOn?: string;

  @ApiProperty({ example: 4, description: 'packs accepted into stock' })
  @IsInt({ message: 'must be a whole number of packs' })
  @Min(0)
  @Max(100000)
  packsReceived: number;

  @ApiProperty({ example: '25', description: 'in the stock unit: 25 for a 25 kg drum' })
  @IsDecimalString({ ...QUANTITY, nonZero: true })
  packSize: string;

  @ApiPropertyOptional({ example: 1, description: 'packs refused at the door as damaged: recorded, not stocked' })
  @IsOptional()
  @IsInt({ message: 'must be a whole number of packs' })
  @Min(0)
  @Max(100000)
  packsRefused?: number;

  @ApiPropertyOptional({ example: 'Drum split at the seam' })
  @IsOptional()
  @TrimOrUndefined()
  @IsString()
  @MaxLength(500)
  refusedReason?: string;

  @ApiPropertyOptional({ example: '3.2', description: '£ per stock unit; left out, the supplier’s price on file for the pack' })
  @IsOptional()
  @IsDecimalString(UNIT_COST)
  unitCost?: string;

  @ApiPropertyOptional({ description: 'where the packs are put away; needed when packsReceived > 0' })
  @IsOptional()
  @IsUUID('all', { message: 'must be an id' })
  locationId?: string;
}

export class CreateReceiptDto {
  @ApiPropertyOptional({ description: 'a supplier from the list' })
  @IsOptional()
  @IsUUID('all', { message: 'must be an id' })
  supplierId?: string;

  @ApiPropertyOptional({ example: 'Brackwater Resins', description: 'who delivered, when not a listed supplier' })
  @IsOptional()
  @TrimOrUndefined()
  @IsString()
  @MaxLength(160)
  supplierName?: string;

  @ApiPropertyOptional({ example: 'DN-40213' })
  @IsOptional()
  @TrimOrUndefined()
  @IsString()
  @MaxLength(60)
  deliveryNoteNumber?: string;

  @ApiProperty({ example: '2025-06-02' }) @IsCalendarDate() receivedOn: string;

  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) note?: string;

  @ApiPropertyOptional({ description: 'accept more than ordered on an order line: honoured for owners only' })
  @IsOptional()
  @IsBoolean()
  allowOverDelivery?: boolean;

  @ApiProperty({ type: [ReceiptLineDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'must have at least one line' })
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => ReceiptLineDto)
  lines: ReceiptLineDto[];
}

export class ReceiptsQueryDto {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be an id' }) supplierId?: string;
  @ApiPropertyOptional() @IsOptional() @IsCalendarDate() from?: string;
  @ApiPropertyOptional() @IsOptional() @IsCalendarDate() to?: string;
  @ApiPropertyOptional({ description: 'search supplier, delivery note number, batch' }) @IsOptional() @IsString() @MaxLength(100) q?: string;
  @ApiPropertyOptional({ default: 50 }) @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number' }) @Min(1) @Max(500) limit?: number;
  @ApiPropertyOptional({ default: 0 }) @IsOptional() @Transform(toInt) @IsInt({ message: 'must be a whole number' }) @Min(0) offset?: number;
}

export class DeliveryNoteResponse {
  @ApiProperty() fileName: string;
  @ApiProperty({ enum: ['application/pdf', 'image/jpeg', 'image/png'] }) contentType: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty() uploadedAt: string;
  @ApiProperty({ example: '/api/receipts/…/delivery-note' }) url: string;
}

export class ReceiptLineResponse {
  @ApiProperty() id: string;
  @ApiProperty() lineNo: number;
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty() stockUnit: string;
  @ApiPropertyOptional({ nullable: true, type: String }) purchaseOrderLineId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) batchNumber: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) expiresOn: string | null;
  @ApiProperty({ description: 'expiry worked out from the shelf life' }) expiryComputed: boolean;
  @ApiProperty() packsReceived: number;
  @ApiProperty({ example: '25.000' }) packSize: string;
  @ApiProperty() packsRefused: number;
  @ApiPropertyOptional({ nullable: true, type: String }) refusedReason: string | null;
  @ApiProperty({ example: '100.000', description: 'packs received × pack size' }) quantity: string;
  @ApiProperty({ example: '3.2000' }) unitCost: string;
  @ApiProperty({ example: '320.00' }) value: string;
  @ApiPropertyOptional({ nullable: true, type: String }) locationId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) locationName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, description: 'the lot the packs became' }) lotId: string | null;
  @ApiProperty() overDeliveryAllowed: boolean;
}

export class ReceiptResponse {
  @ApiProperty() id: string;
  @ApiProperty() number: number;
  @ApiPropertyOptional({ nullable: true, type: String }) supplierId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) supplierName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) deliveryNoteNumber: string | null;
  @ApiProperty() receivedOn: string;
  @ApiPropertyOptional({ nullable: true, type: String }) note: string | null;
  @ApiProperty() receivedById: string;
  @ApiProperty() receivedByName: string;
  @ApiProperty() createdAt: string;
  @ApiPropertyOptional({ type: DeliveryNoteResponse, nullable: true }) deliveryNote: DeliveryNoteResponse | null;
  @ApiProperty({ type: [ReceiptLineResponse] }) lines: ReceiptLineResponse[];
  @ApiProperty({ example: '520.00' }) totalValue: string;
  @ApiProperty({ example: '/api/receipts/…/labels.pdf', description: 'a label per pack received' }) labelsUrl: string;
  @ApiProperty({ type: [String], description: 'when just posted: e.g. a cabinet nearly full, a batch expiring soon' }) warnings: string[];
}

export class ReceiptSummaryResponse {
  @ApiProperty() id: string;
  @ApiProperty() number: number;
  @ApiPropertyOptional({ nullable: true, type: String }) supplierName: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) deliveryNoteNumber: string | null;
  @ApiProperty() receivedOn: string;
  @ApiProperty() lineCount: number;
  @ApiProperty() packsReceived: number;
  @ApiProperty() packsRefused: number;
  @ApiProperty() totalValue: string;
  @ApiProperty() hasDeliveryNote: boolean;
  @ApiProperty() receivedByName: string;
  @ApiProperty() createdAt: string;
}

export class ReceiptPageResponse {
  @ApiProperty({ type: [ReceiptSummaryResponse] }) items: ReceiptSummaryResponse[];
  @ApiProperty() total: number;
}
