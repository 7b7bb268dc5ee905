import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { MATERIAL_KINDS } from '@potlife/domain';
import type { MaterialKind } from '@potlife/domain';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, Matches, MaxLength } from 'class-validator';
import { ImportRowResult, MAX_CSV_CHARS } from '../../catalogue/dto/import.dto';
import { DECIMAL_RULES } from '../../catalogue/dto/material.dto';
import { PageQuery } from '../../catalogue/dto/page.dto';
import { IsDecimalString, IsIsoDate, TrimToNull } from '../../catalogue/dto/validators';
import { STOCK_UNITS } from '../../catalogue/entities/material.entity';
import type { StockUnit } from '../../catalogue/entities/material.entity';
import { PRICE_CSV_HELP } from '../price-csv';

/** Pack prices are pounds net of VAT, to the penny. */
export const PACK_PRICE_RULE = { min: '0', max: '999999999', scale: 2 };

/**
 * The body of POST /api/suppliers/{id}/prices: a new price from `validFrom` on. Prices are never
 * changed: a new price is a new row, so the history stays.
 */
export class CreatePriceDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be the id of a material' })
  materialId: string;

  @ApiProperty({ example: '25', description: "One of the material's pack sizes, in its stock unit" })
  @IsDecimalString(DECIMAL_RULES.packSize)
  packSize: string;

  @ApiProperty({ example: '86.40', description: 'Pounds per pack, net of VAT' })
  @IsDecimalString(PACK_PRICE_RULE)
  packPrice: string;

  @ApiProperty({ example: '2025-04-01' })
  @IsIsoDate()
  validFrom: string;

  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 60, description: "The supplier's own code for the pack" })
  @IsOptional()
  @TrimToNull()
  @IsString()
  @MaxLength(60)
  supplierCode?: string | null;
}

export const PRICE_SORTS = ['materialCode', 'materialName', 'packSize', 'packPrice', 'unitPrice', 'validFrom'] as const;
export type PriceSort = (typeof PRICE_SORTS)[number];

const KIND_LIST = new RegExp(`^(${MATERIAL_KINDS.join('|')})(,(${MATERIAL_KINDS.join('|')}))*$`);

/** `GET /api/suppliers/{id}/prices?q=&kind=&on=&sort=&order=&page=&pageSize=`: the prices in force on `on` (default today). */
export class SupplierPriceListQuery extends PageQuery {
  @ApiPropertyOptional({ description: `Material kind(s), comma-separated: ${MATERIAL_KINDS.join(', ')}` })
  @IsOptional()
  @IsString()
  @MaxLength(300)
  @Matches(KIND_LIST, { message: `must be one or more of ${MATERIAL_KINDS.join(', ')}, comma-separated` })
  kind?: string;

  @ApiPropertyOptional({ example: '2025-04-01', description: 'Default today' })
  @IsOptional()
  @IsIsoDate()
  on?: string;

  @ApiPropertyOptional({ enum: PRICE_SORTS, default: 'materialCode' })
  @IsOptional()
  @IsIn(PRICE_SORTS, { message: `must be one of ${PRICE_SORTS.join(', ')}` })
  sort?: PriceSort;
}

/** `GET /api/suppliers/{id}/prices/export.csv?on=` */
export class PriceExportQuery {
  @ApiPropertyOptional({ example: '2025-04-01', description: 'Default today' })
  @IsOptional()
  @IsIsoDate()
  on?: string;
}

/** `GET /api/materials/{id}/prices?on=&history=true` */
export class MaterialPricesQuery {
  @ApiPropertyOptional({ example: '2025-04-01', description: 'Default today' })
  @IsOptional()
  @IsIsoDate()
  on?: string;

  @ApiPropertyOptional({ default: false, description: 'Add every price row (newest first) to each supplier price' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'must be true or false' })
  history?: boolean;
}

export class PriceRef {
  @ApiProperty() id: string;
  @ApiProperty({ example: '82.00' }) packPrice: string;
  @ApiProperty({ example: '2025-01-06' }) validFrom: string;
}

export class PriceHistoryEntry extends PriceRef {
  @ApiProperty({ nullable: true, type: String }) supplierCode: string | null;
  @ApiProperty() createdAt: string;
}

/** One supplier's price for one pack of a material. */
export class SupplierPriceResponse {
  @ApiProperty() id: string;
  @ApiProperty() supplierId: string;
  @ApiProperty() supplierName: string;
  @ApiProperty() supplierActive: boolean;
  @ApiProperty() materialId: string;
  @ApiProperty() materialCode: string;
  @ApiProperty() materialName: string;
  @ApiProperty({ enum: MATERIAL_KINDS }) materialKind: MaterialKind;
  @ApiProperty() materialActive: boolean;
  @ApiProperty({ enum: STOCK_UNITS }) stockUnit: StockUnit;
  @ApiProperty({ example: '25', description: 'In the stock unit' }) packSize: string;
  @ApiProperty({ nullable: true, type: String, example: '25 kg drum', description: "The material's label for this pack" }) packLabel: string | null;
  @ApiProperty({ example: '86.40', description: 'Pounds per pack, net of VAT' }) packPrice: string;
  @ApiProperty({ example: '3.4560', description: 'packPrice / packSize, per stock unit, to 4 decimal places' }) unitPrice: string;
  @ApiProperty({ example: '2025-04-01' }) validFrom: string;
  @ApiProperty({ nullable: true, type: String }) supplierCode: string | null;
  @ApiProperty({ type: PriceRef, nullable: true, description: 'The price this one replaced' }) previous: PriceRef | null;
  @ApiProperty({ type: PriceRef, nullable: true, description: 'The price that replaces this one (a later validFrom)' }) next: PriceRef | null;
  @ApiProperty() createdAt: string;
  @ApiPropertyOptional({ type: [PriceHistoryEntry], description: 'Only with ?history=true: every row for this supplier and pack, newest first' })
  history?: PriceHistoryEntry[];
}

export class SupplierPricePage {
  @ApiProperty({ type: [SupplierPriceResponse] }) items: SupplierPriceResponse[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
  @ApiProperty({ description: 'The date the prices are in force on' }) on: string;
}

export class MaterialRef {
  @ApiProperty() id: string;
  @ApiProperty() code: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: STOCK_UNITS }) stockUnit: StockUnit;
}

export class PackPrices {
  @ApiProperty({ example: '25' }) packSize: string;
  @ApiProperty({ nullable: true, type: String }) packLabel: string | null;
  @ApiProperty({ type: [SupplierPriceResponse], description: 'Cheapest first' }) prices: SupplierPriceResponse[];
}

/** Every supplier's current price for a material, by pack size (smallest first), cheapest first within a pack. */
export class MaterialPricesResponse {
  @ApiProperty({ type: MaterialRef }) material: MaterialRef;
  @ApiProperty() on: string;
  @ApiProperty({ type: [PackPrices] }) packs: PackPrices[];
}

/**
 * The body of POST /api/suppliers/{id}/prices/import: the price list's CSV text as one JSON
 * string, `{"csv": "material_code,pack_size,pack_price,valid_from\r\n…"}`, and optionally the
 * `validFrom` date for rows that leave valid_from empty (or a file without that column).
 */
export class ImportPricesDto {
  @ApiProperty({ description: `The CSV text. Columns:\n${PRICE_CSV_HELP}` })
  @IsString()
  @MaxLength(MAX_CSV_CHARS)
  csv: string;

  @ApiPropertyOptional({ example: '2025-04-01', description: 'For rows whose valid_from is empty' })
  @IsOptional()
  @IsIsoDate()
  validFrom?: string;
}

export class PriceImportRowResult extends ImportRowResult {
  @ApiProperty({ nullable: true, type: String }) packSize: string | null;
  @ApiProperty({ nullable: true, type: String }) packPrice: string | null;
  @ApiProperty({ nullable: true, type: String }) validFrom: string | null;
  @ApiProperty({ nullable: true, type: String, description: "This supplier's price for the pack before validFrom, if any" })
  previousPrice: string | null;
}

export class PriceImportResult {
  @ApiProperty({ type: [PriceImportRowResult] }) rows: PriceImportRowResult[];
  @ApiProperty() valid: number;
  @ApiProperty() invalid: number;
  @ApiProperty() created: number;
  @ApiProperty({ description: 'Always 0: prices are never updated' }) updated: number;
  @ApiProperty({ description: 'Rows that repeat a price already held' }) unchanged: number;
  @ApiProperty() committed: boolean;
}
