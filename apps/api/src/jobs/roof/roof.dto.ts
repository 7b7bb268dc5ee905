import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { EDGE_KINDS, EdgeKind } from '@potlife/domain';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateBy,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { IsDecimalValue, isDecimalWithin, trim, trimToNull } from '../../costing/validation';

const asString = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? String(v) : v);

export class FallDto {
  @ApiProperty({ example: '50', description: 'rise over the run, mm' })
  @IsDecimalValue()
  riseMm: string;

  @ApiProperty({ example: '2', description: 'run, m' })
  @IsDecimalValue()
  runM: string;
}

/** [[x, y], …] in metres, each a decimal (numbers are kept as their strings). */
function IsPointList(): PropertyDecorator {
  return ValidateBy({
    name: 'isPointList',
    validator: {
      validate: (value: unknown) =>
        Array.isArray(value) &&
        value.length <= 200 &&
        value.every((p) => Array.isArray(p) && p.length === 2 && p.every((c) => isDecimalWithin(c))),
      defaultMessage: () => 'must be a list of at most 200 corners [x, y] in metres, each a decimal number',
    },
  });
}

export class RoofAreaDto {
  @ApiProperty({ example: 'Main roof' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(80)
  name: string;

  @ApiProperty({ enum: ['rectangle', 'polygon'] })
  @IsIn(['rectangle', 'polygon'], { message: 'must be rectangle or polygon' })
  shape: 'rectangle' | 'polygon';

  @ApiPropertyOptional({ example: '6.2', description: 'rectangle only, m' })
  @ValidateIf((o: RoofAreaDto) => o.shape === 'rectangle' || o.lengthM !== undefined)
  @IsDecimalValue()
  lengthM?: string;

  @ApiPropertyOptional({ example: '4.1', description: 'rectangle only, m' })
  @ValidateIf((o: RoofAreaDto) => o.shape === 'rectangle' || o.widthM !== undefined)
  @IsDecimalValue()
  widthM?: string;

  @ApiPropertyOptional({
    example: [
      ['0', '0'],
      ['6', '0'],
      ['6', '4'],
      ['0', '4'],
    ],
    description: 'polygon only: corners [x, y] in m',
  })
  @ValidateIf((o: RoofAreaDto) => o.shape === 'polygon' || o.points !== undefined)
  @Transform(({ value }: { value: unknown }) =>
    Array.isArray(value) ? value.map((p) => (Array.isArray(p) ? p.map(asString) : p)) : value,
  )
  @IsPointList()
  points?: [string, string][];

  @ApiPropertyOptional({ type: FallDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => FallDto)
  fall?: FallDto | null;
}

export class RoofEdgeDto {
  @ApiProperty({ enum: EDGE_KINDS })
  @IsIn(EDGE_KINDS, { message: `must be one of ${EDGE_KINDS.join(', ')}` })
  kind: EdgeKind;

  @ApiProperty({ example: '6.2' })
  @IsDecimalValue()
  lengthM: string;

  @ApiPropertyOptional({
    example: '0.15',
    description: 'wall edges only: upstand height laminated up the wall, m',
  })
  @IsOptional()
  @IsDecimalValue()
  upstandM?: string | null;

  @ApiPropertyOptional({ description: 'the area (0-based) this edge runs along' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(999)
  areaIndex?: number | null;

  @ApiPropertyOptional({ description: 'the side of a polygon area (0-based: corner n to n+1)' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(999)
  side?: number | null;

  @ApiPropertyOptional({ example: 'Gutter side' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(80)
  label?: string | null;
}

/** {external, internal}: whole numbers of corner pieces. */
function IsCorners(): PropertyDecorator {
  return ValidateBy({
    name: 'isCorners',
    validator: {
      validate: (value: unknown) =>
        !!value &&
        typeof value === 'object' &&
        !Array.isArray(value) &&
        Object.entries(value as Record<string, unknown>).every(
          ([k, v]) =>
            (k === 'external' || k === 'internal') &&
            Number.isInteger(v) &&
            (v as number) >= 0 &&
            (v as number) <= 999,
        ),
      defaultMessage: () => 'must be an object {external, internal} of whole numbers from 0 to 999',
    },
  });
}

export class PutRoofDto {
  @ApiProperty({ type: [RoofAreaDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'must hold at least one area' })
  @ArrayMaxSize(50)
  @ValidateNested({ each: true })
  @Type(() => RoofAreaDto)
  areas: RoofAreaDto[];

  @ApiProperty({ type: [RoofEdgeDto], description: 'best listed in order around the roof' })
  @IsArray()
  @ArrayMaxSize(300)
  @ValidateNested({ each: true })
  @Type(() => RoofEdgeDto)
  edges: RoofEdgeDto[];

  @ApiPropertyOptional({ default: 0 })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(999)
  pipes?: number;

  @ApiPropertyOptional({ default: 0 })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(999)
  outlets?: number;

  @ApiPropertyOptional({
    example: { external: 4, internal: 1 },
    nullable: true,
    description: 'left out or null: external corners derived from the edges',
  })
  @IsOptional()
  @IsCorners()
  corners?: { external?: number; internal?: number } | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  notes?: string | null;
}
