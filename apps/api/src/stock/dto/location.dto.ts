import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { HAZARD_CLASSES, HazardClass } from '@potlife/domain';
import { LOCATION_KINDS, LocationKind } from '../entities/location.entity';
import { IsDecimalString, Trim, TrimOrUndefined } from './validators';

const CAPACITY = { scale: 3, integerDigits: 7 };

export class CreateLocationDto {
  @ApiProperty({ example: 'Flammables cabinet' })
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ enum: LOCATION_KINDS })
  @IsIn(LOCATION_KINDS, { message: `must be one of ${LOCATION_KINDS.join(', ')}` })
  kind: LocationKind;

  @ApiPropertyOptional({ nullable: true, type: String, description: 'the location this one is inside' })
  @IsOptional()
  @IsUUID('all', { message: 'must be an id' })
  parentId?: string | null;

  @ApiPropertyOptional({ example: '50', description: 'flammables cabinet: litres it may hold (default 50, HSE HSG51)' })
  @IsOptional()
  @IsDecimalString({ ...CAPACITY, nonZero: true })
  capacityLitres?: string;

  @ApiPropertyOptional({ enum: HAZARD_CLASSES, isArray: true, description: "hazard classes it may hold; 'none' for non-dangerous goods. Default by kind." })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(HAZARD_CLASSES.length)
  @IsIn(HAZARD_CLASSES, { each: true, message: `each must be one of ${HAZARD_CLASSES.join(', ')}` })
  allowedHazardClasses?: HazardClass[];

  @ApiPropertyOptional() @IsOptional() @TrimOrUndefined() @IsString() @MaxLength(2000) notes?: string;
}

export class UpdateLocationDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Trim()
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name?: string;

  @ApiPropertyOptional({ enum: LOCATION_KINDS })
  @IsOptional()
  @IsIn(LOCATION_KINDS, { message: `must be one of ${LOCATION_KINDS.join(', ')}` })
  kind?: LocationKind;

  @ApiPropertyOptional({ nullable: true, type: String })
  @ValidateIf((_o, v) => v !== undefined && v !== null)
  @IsUUID('all', { message: 'must be an id' })
  parentId?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String })
  @ValidateIf((_o, v) => v !== undefined && v !== null)
  @IsDecimalString({ ...CAPACITY, nonZero: true })
  capacityLitres?: string | null;

  @ApiPropertyOptional({ enum: HAZARD_CLASSES, isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(HAZARD_CLASSES.length)
  @IsIn(HAZARD_CLASSES, { each: true, message: `each must be one of ${HAZARD_CLASSES.join(', ')}` })
  allowedHazardClasses?: HazardClass[];

  @ApiPropertyOptional() @IsOptional() @IsBoolean() active?: boolean;

  @ApiPropertyOptional({ nullable: true, type: String })
  @ValidateIf((_o, v) => v !== undefined && v !== null)
  @IsString()
  @MaxLength(2000)
  notes?: string | null;
}

export class LocationResponse {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: LOCATION_KINDS }) kind: LocationKind;
  @ApiPropertyOptional({ nullable: true, type: String }) parentId: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) parentName: string | null;
  @ApiProperty({ example: 'Main store › Bay A', description: 'names from the top' }) path: string;
  @ApiPropertyOptional({ nullable: true, type: String, example: '50.000' }) capacityLitres: string | null;
  @ApiProperty({ enum: HAZARD_CLASSES, isArray: true }) allowedHazardClasses: HazardClass[];
  @ApiProperty() active: boolean;
  @ApiPropertyOptional({ nullable: true, type: String }) notes: string | null;
  @ApiProperty({ description: 'lots with stock here' }) lotCount: number;
  @ApiProperty({ enum: HAZARD_CLASSES, isArray: true, description: 'classes of the stock here now' }) hazardClassesStored: HazardClass[];
  @ApiPropertyOptional({ nullable: true, type: String, description: 'flammables cabinet: class 3 litres held in it (and its shelves)' }) litresHeld: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}
