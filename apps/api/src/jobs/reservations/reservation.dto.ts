import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { Caution } from '@potlife/domain';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { IsDecimalValue, trimToNull } from '../../costing/validation';

export class IssueLineDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be the id of a lot' })
  lotId: string;

  @ApiProperty({
    example: '25',
    description: 'in the material’s stock unit; part of a reservation or of a pack is fine',
  })
  @IsDecimalValue({ min: 0, exclusiveMin: true, places: 3 })
  quantity: string;

  @ApiPropertyOptional({
    format: 'uuid',
    description: 'where it is picked from; may be left out when the lot is in one place',
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a location' })
  fromLocationId?: string;
}

export class IssueDto {
  @ApiProperty({ type: [IssueLineDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'must hold at least one line' })
  @ArrayMaxSize(100)
  @ValidateNested({ each: true })
  @Type(() => IssueLineDto)
  lines: IssueLineDto[];

  @ApiPropertyOptional({ example: 'Van 2, Jonah' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(500)
  note?: string | null;
}

export class ReturnLineDto {
  @ApiProperty({ format: 'uuid', description: 'the lot it was issued from: it goes back into the same lot' })
  @IsUUID('all', { message: 'must be the id of a lot' })
  lotId: string;

  @ApiPropertyOptional({ example: 1, description: 'unopened packs coming back' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(10000)
  fullPacks?: number;

  @ApiPropertyOptional({
    example: '7.4',
    description: 'a part-used pack, weighed or measured, in the stock unit',
  })
  @IsOptional()
  @IsDecimalValue({ min: 0, places: 3 })
  partQuantity?: string;

  @ApiPropertyOptional({
    format: 'uuid',
    description: 'where it is put away; the lot’s own location when left out',
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be the id of a location' })
  toLocationId?: string;
}

export class ReturnDto {
  @ApiProperty({ type: [ReturnLineDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'must hold at least one line' })
  @ArrayMaxSize(100)
  @ValidateNested({ each: true })
  @Type(() => ReturnLineDto)
  lines: ReturnLineDto[];

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(500)
  note?: string | null;
}

export type ReservationFlagCode =
  'expires-before-job' | 'expires-within-margin' | 'quarantined' | 'exposure-flagged' | 'not-in-stock';

export interface ReservationLineResponse {
  id: string;
  lot: { id: string; batchNumber: string | null; expiresOn: string | null };
  status: 'held' | 'issued';
  /** reserved at first */
  reservedQuantity: string;
  issuedQuantity: string;
  /** still held: reserved − issued (0 once issued) */
  heldQuantity: string;
  /** what is wrong with the lot now, for the job date */
  flags: { code: ReservationFlagCode; message: string }[];
  createdAt: string;
}

export interface ReservationMaterialResponse {
  material: { id: string; code: string; name: string };
  unit: string;
  /** the accepted estimate's packs, in the stock unit */
  needed: string;
  held: string;
  /** issued less returned so far */
  issued: string;
  /** needed − held − issued, at least 0 */
  outstanding: string;
  reservations: ReservationLineResponse[];
  /** what the last reservation could not find, or null */
  shortfall: {
    quantity: string;
    neededBy: string;
    leadTimeDays: number | null;
    supplier: { id: string; name: string } | null;
    /** packs to order (domain shortfallToOrder with the reorder quantity) */
    toOrder: { packs: { size: string; label: string; count: number }[]; total: string } | null;
    checkedAt: string;
  } | null;
}

export interface ReservationsResponse {
  jobId: string;
  jobDate: string | null;
  marginDays: number;
  /** lots must still be in date on this day: job date + margin */
  useBy: string | null;
  estimate: { id: string; version: number } | null;
  state: 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';
  materials: ReservationMaterialResponse[];
  /** estimate lines that cannot be reserved (no catalogue material, no pack sizes) */
  skipped: { roles: string[]; materialKind: string; reason: string }[];
  flagged: number;
}

export interface PickListLine {
  material: { id: string; code: string; name: string; kind: string };
  unit: string;
  lot: { id: string; batchNumber: string | null; expiresOn: string | null };
  /** still to pick of this lot for the job */
  quantity: string;
  places: { locationId: string; locationName: string; quantity: string }[];
  flags: { code: ReservationFlagCode; message: string }[];
}

export type PickListLotFlagCode = 'expires-within-margin' | 'exposure-flagged' | 'held-for-other-jobs';

/** A lot that could go to the job now for a need that was not reserved. */
export interface PickListCandidate {
  lot: { id: string; batchNumber: string | null; expiresOn: string | null };
  /** the lot's balance over all locations */
  onHand: string;
  /** on hand less what other jobs hold and what this job's reserved lines hold: the most it may give */
  free: string;
  /** what allocateFefo takes of this lot for the outstanding need (the suggestion), or null */
  suggested: string | null;
  places: { locationId: string; locationName: string; quantity: string }[];
}

/** A lot of the material that is in stock but is not offered, and why (quarantined and expired ones are left out). */
export interface PickListPassedOver {
  lot: { id: string; batchNumber: string | null; expiresOn: string | null };
  onHand: string;
  flags: { code: PickListLotFlagCode; message: string }[];
}

export interface PickListUnreserved {
  material: { id: string; code: string; name: string };
  unit: string;
  /** still outstanding: needed − held − issued */
  quantity: string;
  /** in FEFO order (allocateFefo), usable and in date on useBy, with free quantity */
  candidates: PickListCandidate[];
  /** what the suggestion cannot cover from usable stock */
  short: string;
  passedOver: PickListPassedOver[];
}

export interface PickListResponse {
  jobId: string;
  reference: string;
  title: string;
  siteAddress: string;
  jobDate: string | null;
  crew: string | null;
  lines: PickListLine[];
  /** the day the lots must still be usable on: the later of today and the job date, + the owner's margin */
  useBy: string;
  marginDays: number;
  /** needed but not reserved: pick from a lot that could go to this job now, FEFO */
  unreserved: PickListUnreserved[];
  issued: { material: { id: string; name: string }; unit: string; issued: string; returned: string }[];
  cautions: Caution[];
}

export interface SiteMovementLine {
  movementId: string;
  lotId: string;
  batchNumber: string | null;
  material: { id: string; name: string };
  unit: string;
  quantity: string;
  locationId: string;
  locationName: string;
  /** returns only */
  fullPacks?: number;
  partQuantity?: string;
}

export interface SiteMovementResponse {
  jobId: string;
  operationIds: string[];
  lines: SiteMovementLine[];
  warnings: string[];
}

export interface ReconciliationMaterial {
  material: { id: string; name: string } | null;
  roles: string[];
  unit: string;
  estimatedQuantity: string;
  estimatedPacks: string | null;
  estimatedCost: string | null;
  issued: string;
  returned: string;
  used: string;
  /** used − estimated quantity */
  variance: string;
  /** what was used, at the lots' unit costs */
  actualCost: string;
}

export interface ReconciliationResponse {
  jobId: string;
  estimate: { id: string; version: number } | null;
  materials: ReconciliationMaterial[];
  /** hours: the estimate's against those the crew recorded (GET /api/jobs/:id/labour) */
  labour: {
    /** recorded once any hours are recorded; until then the estimate's labour stands in */
    basis: 'recorded' | 'estimate';
    estimatedHours: string | null;
    recordedHours: string;
    /** entries that count (struck-out ones do not) */
    entries: number;
    /** £ per hour, the accepted estimate's */
    rate: string | null;
    estimatedCost: string | null;
    /** recorded hours × rate, to the penny (null with no estimate or no hours) */
    recordedCost: string | null;
  };
  totals: {
    price: string | null;
    estimatedMaterials: string | null;
    actualMaterials: string;
    /** the labour in the margin: recorded hours × the estimate's rate, or the estimate's labour */
    labour: string | null;
    labourBasis: 'recorded' | 'estimate';
    /** price − actual materials − labour */
    margin: string | null;
    marginPct: string | null;
  };
}
