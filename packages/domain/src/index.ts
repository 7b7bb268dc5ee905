// @potlife/domain: the trade's rules and every computation of Potlife. Pure, no I/O.
export { Decimal, toDecimal, roundMoney, MONEY_DECIMAL_PLACES } from './decimal';
export type { Numeric } from './decimal';
export { DomainError } from './errors';
export type { DomainErrorCode } from './errors';
export type { IsoDate } from './dates';

export { polygonArea, rectangleArea } from './geometry';
export type { Point } from './geometry';

export {
  trimLengthsForRun,
  matAreaForDeck,
  resinForMat,
  laminateThicknessMm,
  glassWeightFraction,
  gsmToKgPerM2,
  DEFAULT_TRIM_LENGTH_M,
  DEFAULT_TRIM_LAP_M,
  DEFAULT_MAT_LAP_M,
  GLASS_DENSITY_G_PER_CM3,
  RESIN_DENSITY_G_PER_CM3,
} from './takeoff';

export {
  dewPointC,
  checkLayingConditions,
  catalystPercent,
  checkCatalystBands,
  checkFall,
  slopeCategory,
  workingTimeHint,
  MAGNUS_A,
  MAGNUS_B_C,
  MAGNUS_RANGE_C,
  MIN_LAYING_TEMPERATURE_C,
  DEFAULT_LAYING_RULES,
  DEFAULT_CATALYST_BANDS,
  CATALYST_LIMITS_PCT,
  FALL_RATIOS,
  WORKING_TIME_BANDS,
  SLOPE_CATEGORY_LIMITS_PCT,
} from './laying';
export type { LayingRules, LayingCheck, CatalystBand, FallCheck, SlopeCategory, WorkingTimeHint } from './laying';

export { choosePacks, shortfallToOrder, MAX_PACK_SEARCH_STEPS } from './packs';
export type { PackChoice, PackCount } from './packs';

export {
  expiryDate,
  isExpired,
  daysToExpiry,
  lotUsableOn,
  allocateFefo,
  checkSegregation,
  checkFlammablesCapacity,
  checkStorageTemperature,
  movementDirection,
  ledgerBalance,
  countVariance,
  DEFAULT_SHELF_LIFE_DAYS,
  DEFAULT_STORAGE_MAX_C,
  HAZARD_CLASSES,
  SEGREGATION_RULES,
  FLAMMABLES_WORKROOM_LIMIT_L,
  FLAMMABLES_WARNING_FRACTION,
} from './stock';
export type {
  FefoLot,
  FefoAllocation,
  FefoResult,
  FefoSkipReason,
  HazardClass,
  SegregationRule,
  SegregationCheck,
  CapacityCheck,
  TemperatureCheck,
  MovementKind,
  Movement,
  CountVariance,
} from './stock';

export { costFromStock } from './stock-cost';
export type { CostedLot, StockPart, StockCostSplit } from './stock-cost';

export { valueInventory } from './valuation';
export type { ValuationMethod, CostLayer, Valuation } from './valuation';

export { vatOnInvoice, UK_VAT_STANDARD_RATE_PCT } from './vat';

export { MATERIAL_KINDS } from './materials';
export type { MaterialKind } from './materials';

export { EDGE_KINDS } from './roof';
export type { EdgeKind, Roof, RoofArea, RectangleArea, PolygonArea, RoofEdge } from './roof';

export { DEFAULT_BUILD_UP, resolveBuildUp } from './build-up';
export type { BuildUp, BuildUpInput, ResolvedBuildUp, PackedMaterial, PackSizes } from './build-up';

export { estimateRoof, deriveCorners, DEFAULT_ESTIMATE_AIR_C, LINE_ROLE_KINDS } from './estimate';
export type { Estimate, EstimateLine, EstimateArea, LineRole, Unit } from './estimate';

export { priceEstimate, packsForEstimate } from './price';
export type { PricedLine, Price, MaterialPacks } from './price';

export { cautionsFor, cautionIdsFor, CAUTIONS } from './cautions';
export type { Caution, CautionId } from './cautions';

export { JOB_STATUSES, JOB_TRANSITIONS, nextJobStatuses, checkJobTransition, jobHoldsStock } from './job-status';
export type { JobStatus, JobFacts } from './job-status';

export { SCALAR_RATES } from './contracts';
export type {
  StoredFall,
  StoredArea,
  StoredEdge,
  StoredRoof,
  FallResult,
  RoofSummary,
  ScalarRate,
  BuildUpRates,
} from './contracts';
