import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  BuildUpRates,
  Decimal,
  DEFAULT_BUILD_UP,
  EDGE_KINDS,
  EdgeKind,
  SCALAR_RATES,
  ScalarRate,
} from '@potlife/domain';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsOptional,
  IsString,
  MaxLength,
  MinLength,
  ValidateBy,
  ValidateNested,
} from 'class-validator';
import { DecimalOptions, IsDecimalValue, isDecimalWithin, trim, trimToNull } from '../../costing/validation';
import { BuildUp } from '../entities/build-up.entity';

const POSITIVE: DecimalOptions = { min: 0, exclusiveMin: true };
const NON_NEGATIVE: DecimalOptions = { min: 0 };
const PERCENT: DecimalOptions = { min: 0, max: 100 };

/** The bounds of each scalar rate as the API checks them; resolveBuildUp checks the rest. */
const SCALAR_BOUNDS: Record<ScalarRate, DecimalOptions> = {
  matGsm: POSITIVE,
  layers: { min: 1, max: 10 },
  rollWidthM: POSITIVE,
  lapM: NON_NEGATIVE,
  resinToGlass: POSITIVE,
  topcoatKgPerM2: NON_NEGATIVE,
  matWastagePct: PERCENT,
  resinWastagePct: PERCENT,
  trimLengthM: POSITIVE,
  trimLapM: NON_NEGATIVE,
  upstandM: NON_NEGATIVE,
  bandageWidthMm: NON_NEGATIVE,
  bandageGsm: NON_NEGATIVE,
  bandageMPerEdgeM: NON_NEGATIVE,
  bandageMPerTrimJoint: NON_NEGATIVE,
  bandageMPerCorner: NON_NEGATIVE,
  bandageMPerPipe: NON_NEGATIVE,
  bandageMPerOutlet: NON_NEGATIVE,
  extraResinKgPerPipe: NON_NEGATIVE,
  extraResinKgPerOutlet: NON_NEGATIVE,
  acetoneLPerM2: NON_NEGATIVE,
  adhesiveTrimMPerCartridge: POSITIVE,
  labourHoursPerM2: NON_NEGATIVE,
  labourHoursPerTrimM: NON_NEGATIVE,
};

export class CatalystBandDto {
  @ApiProperty({ example: '15', description: 'from this air temperature, °C (inclusive)' })
  @IsDecimalValue({ min: -50, max: 60 })
  fromC: string;

  @ApiProperty({ example: '2', description: 'dose, % of resin + topcoat weight' })
  @IsDecimalValue({ min: 1, max: 4 })
  percent: string;
}

/** An object {drip, kerb, wall, angle} of decimals ≥ 0; any kind may be left out. */
function IsEdgeRates(): PropertyDecorator {
  return ValidateBy({
    name: 'isEdgeRates',
    validator: {
      validate: (value: unknown) =>
        !!value &&
        typeof value === 'object' &&
        !Array.isArray(value) &&
        Object.entries(value as Record<string, unknown>).every(
          ([k, v]) =>
            (EDGE_KINDS as readonly string[]).includes(k) &&
            isDecimalWithin(typeof v === 'number' ? String(v) : v, NON_NEGATIVE),
        ),
      defaultMessage: () =>
        'must be an object of drip, kerb, wall and angle, each a decimal number at least 0',
    },
  });
}

const edgeRatesToStrings = ({ value }: { value: unknown }) =>
  value && typeof value === 'object' && !Array.isArray(value)
    ? Object.fromEntries(
        Object.entries(value as Record<string, unknown>).map(([k, v]) => [
          k,
          typeof v === 'number' ? String(v) : v,
        ]),
      )
    : value;

/** Every rate, optional: left out on create means the domain default (DEFAULT_BUILD_UP). */
export class BuildUpRatesDto {
  matGsm?: string;
  layers?: string;
  rollWidthM?: string;
  lapM?: string;
  resinToGlass?: string;
  topcoatKgPerM2?: string;
  matWastagePct?: string;
  resinWastagePct?: string;
  trimLengthM?: string;
  trimLapM?: string;
  upstandM?: string;
  bandageWidthMm?: string;
  bandageGsm?: string;
  bandageMPerEdgeM?: string;
  bandageMPerTrimJoint?: string;
  bandageMPerCorner?: string;
  bandageMPerPipe?: string;
  bandageMPerOutlet?: string;
  extraResinKgPerPipe?: string;
  extraResinKgPerOutlet?: string;
  acetoneLPerM2?: string;
  adhesiveTrimMPerCartridge?: string;
  labourHoursPerM2?: string;
  labourHoursPerTrimM?: string;

  @ApiPropertyOptional({ type: [CatalystBandDto], description: 'catalyst dose by air temperature, rising' })
  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(12)
  @ValidateNested({ each: true })
  @Type(() => CatalystBandDto)
  catalystBands?: CatalystBandDto[];

  @ApiPropertyOptional({
    example: { drip: '2', kerb: '1', wall: '0', angle: '0' },
    description: 'batten m per m of edge',
  })
  @IsOptional()
  @Transform(edgeRatesToStrings)
  @IsEdgeRates()
  battenMPerEdgeM?: Partial<Record<EdgeKind, string>>;

  @ApiPropertyOptional({
    example: { drip: '5', kerb: '5', wall: '5', angle: '0' },
    description: 'clout nails per m of edge',
  })
  @IsOptional()
  @Transform(edgeRatesToStrings)
  @IsEdgeRates()
  nailsPerEdgeM?: Partial<Record<EdgeKind, string>>;
}

// The scalar rates carry the same decorators; applied from the bounds table.
for (const key of SCALAR_RATES) {
  const proto = BuildUpRatesDto.prototype;
  ApiPropertyOptional({ type: String, example: String(DEFAULT_BUILD_UP[key]) })(proto, key);
  IsOptional()(proto, key);
  IsDecimalValue(SCALAR_BOUNDS[key])(proto, key);
}

export class CreateBuildUpDto extends BuildUpRatesDto {
  @ApiProperty({ example: 'Standard deck, one layer 450 g' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  description?: string | null;

  @ApiProperty({ example: '32.00', description: '£ per labour hour' })
  @IsDecimalValue({ min: 0, max: 10000, places: 2 })
  labourRate: string;

  @ApiProperty({ example: '25', description: 'markup on materials and labour, %' })
  @IsDecimalValue({ min: 0, max: 1000, places: 2 })
  markupPct: string;

  @ApiPropertyOptional({ example: '20', description: 'VAT rate, % (UK standard rate 20 %)' })
  @IsOptional()
  @IsDecimalValue({ ...PERCENT, places: 2 })
  vatRatePct?: string;
}

export class UpdateBuildUpDto extends BuildUpRatesDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  description?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @IsDecimalValue({ min: 0, max: 10000, places: 2 })
  labourRate?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsDecimalValue({ min: 0, max: 1000, places: 2 })
  markupPct?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsDecimalValue({ ...PERCENT, places: 2 })
  vatRatePct?: string;

  @ApiPropertyOptional({ description: 'false hides it from new jobs and estimates' })
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}

/** A build-up as the API gives it: flat, every rate a decimal string, the same fields as the create body. */
export type BuildUpResponse = BuildUpRates & {
  id: string;
  name: string;
  description: string | null;
  active: boolean;
  labourRate: string;
  markupPct: string;
  vatRatePct: string;
  createdAt: string;
  updatedAt: string;
};

export function buildUpResponse(b: BuildUp): BuildUpResponse {
  return {
    id: b.id,
    name: b.name,
    description: b.description,
    active: b.active,
    ...b.rates,
    labourRate: new Decimal(b.labourRate).toFixed(2),
    markupPct: new Decimal(b.markupPct).toString(),
    vatRatePct: new Decimal(b.vatRatePct).toString(),
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
  };
}
