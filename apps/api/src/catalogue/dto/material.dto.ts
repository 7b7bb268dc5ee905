import { ApiProperty, ApiPropertyOptional, IntersectionType } from '@nestjs/swagger';
import { EDGE_KINDS, HAZARD_CLASSES, MATERIAL_KINDS } from '@potlife/domain';
import type { EdgeKind, HazardClass, MaterialKind } from '@potlife/domain';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Matches, MaxLength } from 'class-validator';
import { STOCK_UNITS, TRIM_PIECES } from '../entities/material.entity';
import type { StockUnit, TrimPiece } from '../entities/material.entity';
import { Check, checks, FieldCheck } from './checks';
import { ACTIVE_VALUES, ActiveQuery, PageQuery } from './page.dto';
import { DecimalRule, decimalProblem, OptionalNotNull, Trim, TrimToNull } from './validators';

export const PACKING_GROUPS = ['I', 'II', 'III'] as const;
export type PackingGroup = (typeof PACKING_GROUPS)[number];

/** Codes: letters, digits and . _ / -, starting with a letter or digit (they go into CSV cells and file names). */
export const CODE_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._/-]*$/;

/** The decimal rules of each numeric field, shared by the DTOs and the CSV rows. */
export const DECIMAL_RULES = {
  packSize: { gt: '0', max: '99999999', scale: 3 },
  storageC: { min: '-60', max: '120', scale: 1 },
  flashPointC: { min: '-100', max: '400', scale: 1 },
  reorder: { min: '0', max: '99999999999', scale: 3 },
  rollWidthM: { gt: '0', max: '100', scale: 3 },
  trimLengthM: { gt: '0', max: '100', scale: 3 },
  litresPerKg: { gt: '0', max: '9999', scale: 4 },
} satisfies Record<string, DecimalRule>;

const oneOf = (values: readonly string[]) => ({ message: `must be one of ${values.join(', ')}` });

/** One pack a material is bought and stored in (the shape, for the documentation; checked by packsCheck). */
export class PackSizeDto {
  @ApiProperty({ example: '25', description: 'In the stock unit, as a decimal string greater than 0' })
  size: string;

  @ApiProperty({ example: '25 kg drum', maxLength: 60, description: 'No semicolons (the CSV pack list uses them)' })
  label: string;
}

const labelCheck = checks.text(60, {
  min: 1,
  pattern: /^[^;\r\n]*$/,
  patternMessage: 'must not contain a semicolon or a line break (the CSV pack list uses ";")',
});

function packsCheck(v: unknown): string | null {
  if (!Array.isArray(v)) {
    return 'must be a list of packs [{size, label}]';
  }
  if (v.length < 1) {
    return 'must have at least one pack';
  }
  if (v.length > 20) {
    return 'must have at most 20 packs';
  }
  for (let i = 0; i < v.length; i++) {
    const p: unknown = v[i];
    if (!p || typeof p !== 'object' || Array.isArray(p)) {
      return `pack ${i + 1} must be {size, label}`;
    }
    const extra = Object.keys(p).filter((k) => k !== 'size' && k !== 'label');
    if (extra.length > 0) {
      return `pack ${i + 1}: ${extra[0]} is an unknown field, not allowed here`;
    }
    const size = decimalProblem((p as { size?: unknown }).size, DECIMAL_RULES.packSize);
    if (size) {
      return `pack ${i + 1} size: ${size}`;
    }
    const label = labelCheck((p as { label?: unknown }).label);
    if (label) {
      return `pack ${i + 1} label: ${label}`;
    }
  }
  return null;
}

/**
 * The check of every material field and whether it may be null, in one place: the request bodies
 * use them through `@Check`, the catalogue CSV rows call them directly.
 */
export const MATERIAL_FIELD_CHECKS = {
  code: {
    nullable: false,
    check: checks.text(40, { min: 1, pattern: CODE_PATTERN, patternMessage: 'may hold letters, digits and . _ / - only, starting with a letter or digit' }),
  },
  name: { nullable: false, check: checks.text(160, { min: 1 }) },
  kind: { nullable: false, check: checks.oneOf(MATERIAL_KINDS) },
  stockUnit: { nullable: false, check: checks.oneOf(STOCK_UNITS) },
  packSizes: { nullable: false, check: packsCheck },
  lotTracked: { nullable: false, check: checks.bool() },
  shelfLifeDays: { nullable: true, check: checks.int(1, 3650, 'days') },
  storageMinC: { nullable: true, check: checks.decimal(DECIMAL_RULES.storageC) },
  storageMaxC: { nullable: true, check: checks.decimal(DECIMAL_RULES.storageC) },
  hazardClass: { nullable: false, check: checks.oneOf(HAZARD_CLASSES) },
  unNumber: { nullable: true, check: checks.text(10, { pattern: /^\d{4}$/, patternMessage: 'must be four digits, e.g. 1090' }) },
  packingGroup: { nullable: true, check: checks.oneOf(PACKING_GROUPS) },
  flashPointC: { nullable: true, check: checks.decimal(DECIMAL_RULES.flashPointC) },
  isAccelerator: { nullable: false, check: checks.bool() },
  reorderLevel: { nullable: false, check: checks.decimal(DECIMAL_RULES.reorder) },
  reorderQuantity: { nullable: false, check: checks.decimal(DECIMAL_RULES.reorder) },
  matGsm: { nullable: true, check: checks.int(1, 5000, 'g/m²') },
  rollWidthM: { nullable: true, check: checks.decimal(DECIMAL_RULES.rollWidthM) },
  trimKind: { nullable: true, check: checks.oneOf(EDGE_KINDS) },
  trimLengthM: { nullable: true, check: checks.decimal(DECIMAL_RULES.trimLengthM) },
  trimPiece: { nullable: true, check: checks.oneOf(TRIM_PIECES) },
  topcoatColour: { nullable: true, check: checks.text(60) },
  litresPerKg: { nullable: true, check: checks.decimal(DECIMAL_RULES.litresPerKg) },
  active: { nullable: false, check: checks.bool() },
  notes: { nullable: true, check: checks.text(2000) },
} satisfies Record<string, { nullable: boolean; check: FieldCheck }>;

export type MaterialFieldKey = keyof typeof MATERIAL_FIELD_CHECKS;
const C = (field: MaterialFieldKey) => Check(MATERIAL_FIELD_CHECKS[field].check);

/** Pack labels trimmed before the check. */
const TrimPacks = () =>
  Transform(({ value }: { value: unknown }) =>
    Array.isArray(value)
      ? value.map((p: unknown) =>
          p && typeof p === 'object' && typeof (p as { label?: unknown }).label === 'string'
            ? { ...p, label: (p as { label: string }).label.trim() }
            : p,
        )
      : value,
  );

/** The body of POST /api/materials. Decimal fields are strings; absent optional fields take their defaults. */
export class CreateMaterialDto {
  @ApiProperty({ example: 'RES-25', maxLength: 40, description: 'Unique in the company (case-insensitive)' })
  @Trim()
  @C('code')
  code: string;

  @ApiProperty({ example: 'Base resin, 25 kg drum', maxLength: 160 })
  @Trim()
  @C('name')
  name: string;

  @ApiProperty({ enum: MATERIAL_KINDS })
  @C('kind')
  kind: MaterialKind;

  @ApiProperty({ enum: STOCK_UNITS, description: 'm2 is m²' })
  @C('stockUnit')
  stockUnit: StockUnit;

  @ApiProperty({ type: [PackSizeDto], description: 'At least one; sizes unique' })
  @TrimPacks()
  @C('packSizes')
  packSizes: PackSizeDto[];

  @ApiPropertyOptional({ default: true }) @OptionalNotNull() @C('lotTracked') lotTracked?: boolean;
  @ApiPropertyOptional({ nullable: true, type: Number, description: 'Days' }) @IsOptional() @C('shelfLifeDays') shelfLifeDays?: number | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '5' }) @IsOptional() @C('storageMinC') storageMinC?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '25' }) @IsOptional() @C('storageMaxC') storageMaxC?: string | null;
  @ApiPropertyOptional({ enum: HAZARD_CLASSES, default: 'none' }) @OptionalNotNull() @C('hazardClass') hazardClass?: HazardClass;
  @ApiPropertyOptional({ nullable: true, type: String, example: '1090' }) @IsOptional() @C('unNumber') unNumber?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: PACKING_GROUPS }) @IsOptional() @C('packingGroup') packingGroup?: PackingGroup | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '-20' }) @IsOptional() @C('flashPointC') flashPointC?: string | null;
  @ApiPropertyOptional({ default: false }) @OptionalNotNull() @C('isAccelerator') isAccelerator?: boolean;
  @ApiPropertyOptional({ default: '0', type: String }) @OptionalNotNull() @C('reorderLevel') reorderLevel?: string;
  @ApiPropertyOptional({ default: '0', type: String }) @OptionalNotNull() @C('reorderQuantity') reorderQuantity?: string;
  @ApiPropertyOptional({ nullable: true, type: Number, example: 450 }) @IsOptional() @C('matGsm') matGsm?: number | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '1.04' }) @IsOptional() @C('rollWidthM') rollWidthM?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: EDGE_KINDS }) @IsOptional() @C('trimKind') trimKind?: EdgeKind | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '3' }) @IsOptional() @C('trimLengthM') trimLengthM?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: TRIM_PIECES, description: 'trims only: a length (the default) or a corner piece' })
  @IsOptional()
  @C('trimPiece')
  trimPiece?: TrimPiece | null;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 60 }) @IsOptional() @TrimToNull() @C('topcoatColour') topcoatColour?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, example: '1.27' }) @IsOptional() @C('litresPerKg') litresPerKg?: string | null;
  @ApiPropertyOptional({ default: true }) @OptionalNotNull() @C('active') active?: boolean;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 2000 }) @IsOptional() @TrimToNull() @C('notes') notes?: string | null;
}

/**
 * The body of PATCH /api/materials/{id}: any fields of the create body; null clears an optional
 * field. `active: false` archives the material (there is no hard delete).
 */
export class UpdateMaterialDto {
  @ApiPropertyOptional({ maxLength: 40 }) @OptionalNotNull() @Trim() @C('code') code?: string;
  @ApiPropertyOptional({ maxLength: 160 }) @OptionalNotNull() @Trim() @C('name') name?: string;
  @ApiPropertyOptional({ enum: MATERIAL_KINDS }) @OptionalNotNull() @C('kind') kind?: MaterialKind;
  @ApiPropertyOptional({ enum: STOCK_UNITS }) @OptionalNotNull() @C('stockUnit') stockUnit?: StockUnit;
  @ApiPropertyOptional({ type: [PackSizeDto] }) @OptionalNotNull() @TrimPacks() @C('packSizes') packSizes?: PackSizeDto[];
  @ApiPropertyOptional() @OptionalNotNull() @C('lotTracked') lotTracked?: boolean;
  @ApiPropertyOptional({ nullable: true, type: Number }) @IsOptional() @C('shelfLifeDays') shelfLifeDays?: number | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('storageMinC') storageMinC?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('storageMaxC') storageMaxC?: string | null;
  @ApiPropertyOptional({ enum: HAZARD_CLASSES }) @OptionalNotNull() @C('hazardClass') hazardClass?: HazardClass;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('unNumber') unNumber?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: PACKING_GROUPS }) @IsOptional() @C('packingGroup') packingGroup?: PackingGroup | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('flashPointC') flashPointC?: string | null;
  @ApiPropertyOptional() @OptionalNotNull() @C('isAccelerator') isAccelerator?: boolean;
  @ApiPropertyOptional({ type: String }) @OptionalNotNull() @C('reorderLevel') reorderLevel?: string;
  @ApiPropertyOptional({ type: String }) @OptionalNotNull() @C('reorderQuantity') reorderQuantity?: string;
  @ApiPropertyOptional({ nullable: true, type: Number }) @IsOptional() @C('matGsm') matGsm?: number | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('rollWidthM') rollWidthM?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: EDGE_KINDS }) @IsOptional() @C('trimKind') trimKind?: EdgeKind | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('trimLengthM') trimLengthM?: string | null;
  @ApiPropertyOptional({ nullable: true, enum: TRIM_PIECES }) @IsOptional() @C('trimPiece') trimPiece?: TrimPiece | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @TrimToNull() @C('topcoatColour') topcoatColour?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @C('litresPerKg') litresPerKg?: string | null;
  @ApiPropertyOptional() @OptionalNotNull() @C('active') active?: boolean;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @TrimToNull() @C('notes') notes?: string | null;
}

export const MATERIAL_SORTS = ['code', 'name', 'kind', 'stockUnit', 'shelfLifeDays', 'hazardClass', 'createdAt', 'updatedAt'] as const;
export type MaterialSort = (typeof MATERIAL_SORTS)[number];

/** Filters shared by the list and the CSV export. */
export class MaterialFilterQuery {
  @ApiPropertyOptional({ description: 'Code or name contains', maxLength: 100 })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(100)
  q?: string;

  @ApiPropertyOptional({ description: `One kind or several, comma-separated: ${MATERIAL_KINDS.join(', ')}` })
  @IsOptional()
  @IsString()
  @MaxLength(300)
  @Matches(new RegExp(`^(${MATERIAL_KINDS.join('|')})(,(${MATERIAL_KINDS.join('|')}))*$`), {
    message: `must be one or more of ${MATERIAL_KINDS.join(', ')}, comma-separated`,
  })
  kind?: string;

  @ApiPropertyOptional({ enum: ACTIVE_VALUES, default: 'true', description: 'true: in use only; false: archived only; all' })
  @IsOptional()
  @IsIn(ACTIVE_VALUES, oneOf(ACTIVE_VALUES))
  active?: ActiveQuery;
}

/** `GET /api/materials?q=&kind=&active=&sort=&order=&page=&pageSize=` */
export class MaterialListQuery extends IntersectionType(PageQuery, MaterialFilterQuery) {
  @ApiPropertyOptional({ enum: MATERIAL_SORTS, default: 'code' })
  @IsOptional()
  @IsIn(MATERIAL_SORTS, oneOf(MATERIAL_SORTS))
  sort?: MaterialSort;
}

export class PackSizeResponse {
  @ApiProperty({ example: '25' }) size: string;
  @ApiProperty({ example: '25 kg drum' }) label: string;
}

/** A material as the API answers it. Decimal fields are strings without trailing zeros. */
export class MaterialResponse {
  @ApiProperty() id: string;
  @ApiProperty() code: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: MATERIAL_KINDS }) kind: MaterialKind;
  @ApiProperty({ enum: STOCK_UNITS }) stockUnit: StockUnit;
  @ApiProperty({ type: [PackSizeResponse] }) packSizes: PackSizeResponse[];
  @ApiProperty() lotTracked: boolean;
  @ApiProperty({ nullable: true, type: Number }) shelfLifeDays: number | null;
  @ApiProperty({ nullable: true, type: String }) storageMinC: string | null;
  @ApiProperty({ nullable: true, type: String }) storageMaxC: string | null;
  @ApiProperty({ enum: HAZARD_CLASSES }) hazardClass: HazardClass;
  @ApiProperty({ nullable: true, type: String }) unNumber: string | null;
  @ApiProperty({ nullable: true, enum: PACKING_GROUPS }) packingGroup: PackingGroup | null;
  @ApiProperty({ nullable: true, type: String }) flashPointC: string | null;
  @ApiProperty() isAccelerator: boolean;
  @ApiProperty() reorderLevel: string;
  @ApiProperty() reorderQuantity: string;
  @ApiProperty({ nullable: true, type: Number }) matGsm: number | null;
  @ApiProperty({ nullable: true, type: String }) rollWidthM: string | null;
  @ApiProperty({ nullable: true, enum: EDGE_KINDS }) trimKind: EdgeKind | null;
  @ApiProperty({ nullable: true, type: String }) trimLengthM: string | null;
  @ApiProperty({ nullable: true, enum: TRIM_PIECES, description: 'trims only' }) trimPiece: TrimPiece | null;
  @ApiProperty({ nullable: true, type: String }) topcoatColour: string | null;
  @ApiProperty({ nullable: true, type: String }) litresPerKg: string | null;
  @ApiProperty() active: boolean;
  @ApiProperty({ nullable: true, type: String }) notes: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class MaterialPage {
  @ApiProperty({ type: [MaterialResponse] }) items: MaterialResponse[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
