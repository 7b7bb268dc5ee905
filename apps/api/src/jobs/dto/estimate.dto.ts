import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { Caution, LineRole, MaterialKind, Unit } from '@potlife/domain';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsOptional,
  IsString,
  IsUUID,
  MaxLength,
  ValidateNested,
} from 'class-validator';
import { IsDecimalValue, trimToNull } from '../../costing/validation';
import { COST_BASES } from '../entities/estimate.entity';
import type { CostBasis } from '../entities/estimate.entity';
import type { CostSource } from '../entities/estimate-pack.entity';

export const LINE_ROLES: readonly LineRole[] = [
  'mat',
  'base-resin',
  'bandage-resin',
  'topcoat',
  'catalyst',
  'trim:drip',
  'trim:kerb',
  'trim:wall',
  'trim:angle',
  'corner:external',
  'corner:internal',
  'outlet',
  'bandage',
  'acetone',
  'adhesive',
  'battens',
  'nails',
];

export class MaterialChoiceDto {
  @ApiProperty({ enum: LINE_ROLES })
  @IsIn(LINE_ROLES, { message: `must be one of ${LINE_ROLES.join(', ')}` })
  role: LineRole;

  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be the id of a material' })
  materialId: string;
}

export class CreateEstimateDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'defaults to the job’s build-up' })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a build-up' })
  buildUpId?: string;

  @ApiPropertyOptional({
    example: '12',
    description: 'expected air temperature on the day, °C, for the catalyst dose (default 20)',
  })
  @IsOptional()
  @IsDecimalValue({ min: -30, max: 50 })
  airC?: string;

  @ApiPropertyOptional({
    type: [MaterialChoiceDto],
    description: 'a material for a role instead of the best fit',
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(LINE_ROLES.length)
  @ValidateNested({ each: true })
  @Type(() => MaterialChoiceDto)
  materials?: MaterialChoiceDto[];

  @ApiPropertyOptional({
    enum: COST_BASES,
    default: 'supplier',
    description:
      'supplier: every pack at the cheapest current supplier price; stock: what the job could reserve for its scheduled date at its lots’ own cost, only the rest bought in packs (409 job_needs_date without a date)',
  })
  @IsOptional()
  @IsIn(COST_BASES, { message: `must be one of ${COST_BASES.join(', ')}` })
  costBasis?: CostBasis;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  note?: string | null;
}

export class LayingCheckDto {
  @ApiProperty({ example: '12', description: 'air temperature, °C' })
  @IsDecimalValue({ min: -45, max: 60 })
  airC: string;

  @ApiProperty({ example: '10', description: 'deck (surface) temperature, °C' })
  @IsDecimalValue({ min: -45, max: 80 })
  surfaceC: string;

  @ApiProperty({ example: '70', description: 'relative humidity, %' })
  @IsDecimalValue({ min: 0, max: 100, exclusiveMin: true })
  relativeHumidityPct: string;

  @ApiProperty({ example: false })
  @IsBoolean()
  raining: boolean;
}

export interface EstimateLineResponse {
  position: number;
  role: LineRole;
  materialKind: MaterialKind;
  description: string;
  unit: Unit;
  /** unrounded, as the costing engine gave it */
  quantity: string;
  lengths: number | null;
  metres: string | null;
  material: { id: string; name: string } | null;
}

export interface EstimatePackResponse {
  /** supplier: packs to buy; stock: what is taken from one lot (size = the quantity, count 1) */
  source: CostSource;
  /** stock rows only: the lot and its cost of one stock unit (for the estimator, never on the quote) */
  lot: { id: string; batchNumber: string | null; unitCost: string } | null;
  size: string;
  label: string;
  count: number;
  /** null: no current price for this pack */
  packPrice: string | null;
  supplier: { id: string; name: string; leadTimeDays: number } | null;
  cost: string | null;
}

export interface EstimateMaterialResponse {
  position: number;
  roles: LineRole[];
  materialKind: MaterialKind;
  material: { id: string; name: string } | null;
  /** the stock unit of the material, or the line's unit when there is none */
  unit: string;
  quantity: string;
  /** costed from lots in stock (estimates on stock cost); 0 otherwise */
  stockQuantity: string;
  packs: EstimatePackResponse[];
  packTotal: string | null;
  leftover: string | null;
  /** null: not costed (see problem) */
  cost: string | null;
  priced: boolean;
  /** "No price: …", "No material in the catalogue for …", or null */
  problem: string | null;
}

export interface EstimateResponse {
  id: string;
  jobId: string;
  version: number;
  accepted: boolean;
  acceptedAt: string | null;
  createdAt: string;
  createdBy: { id: string; name: string } | null;
  note: string | null;
  buildUp: { id: string | null; name: string; labourRate: string; markupPct: string; vatRatePct: string };
  pricedOn: string;
  costBasis: CostBasis;
  airC: string;
  catalystPercent: string;
  deckAreaM2: string;
  upstandAreaM2: string;
  laminatedAreaM2: string;
  trimM: string;
  corners: { external: number; internal: number; derived: boolean };
  pipes: number;
  outlets: number;
  lines: EstimateLineResponse[];
  materials: EstimateMaterialResponse[];
  labour: { laminatingHours: string; trimHours: string; totalHours: string; rate: string; cost: string };
  price: {
    materialCost: string;
    labourCost: string;
    markupPct: string;
    markup: string;
    net: string;
    vatRatePct: string;
    vat: string;
    gross: string;
  };
  /** materials without a price, left out of materialCost */
  unpriced: number;
  /** every material's problem, in order */
  problems: string[];
  cautions: Caution[];
}

export interface EstimateSummaryResponse {
  id: string;
  version: number;
  accepted: boolean;
  createdAt: string;
  createdBy: { id: string; name: string } | null;
  buildUpName: string;
  costBasis: CostBasis;
  laminatedAreaM2: string;
  net: string;
  gross: string;
  unpriced: number;
}

export interface LayingCheckResponse {
  ok: boolean;
  problems: string[];
  dewPointC: string;
  /** null when too cold to lay */
  catalystPercent: string | null;
  workingTime: { minMinutes: number; maxMinutes: number; text: string } | null;
  cautions: Caution[];
}
