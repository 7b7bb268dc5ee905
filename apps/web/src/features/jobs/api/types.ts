import type {
  Caution,
  EdgeKind,
  JobStatus,
  LineRole,
  MaterialKind,
  RoofSummary,
  StoredFall,
  StoredRoof,
  Unit,
} from '@potlife/domain';

// The shapes the jobs API answers with (apps/api/src/jobs/dto). Amounts and quantities are decimal
// strings; they are formatted for display, never computed with here.

export interface Named {
  id: string;
  name: string;
}

export const SUBSTRATES = ['timber-deck', 'osb', 'existing-felt', 'asphalt', 'concrete', 'old-grp'] as const;
export type Substrate = (typeof SUBSTRATES)[number];

/** The stock side of a job at a glance. */
export type MaterialState = 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';

export interface Job {
  id: string;
  reference: string;
  number: number;
  title: string;
  status: JobStatus;
  nextStatuses: JobStatus[];
  statusChangedAt: string;
  customer: Named;
  siteAddress: string;
  substrate: Substrate;
  scheduledOn: string | null;
  estimator: Named | null;
  crew: string | null;
  topcoatColour: string | null;
  buildUp: Named | null;
  hasRoof: boolean;
  roofUpdatedAt: string | null;
  acceptedEstimate: { id: string; version: number } | null;
  /** the accepted estimate's net, £; left out for a storeman */
  value?: string | null;
  materialState: MaterialState;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface StatusChange {
  from: JobStatus | null;
  to: JobStatus;
  reason: string | null;
  changedBy: Named | null;
  changedAt: string;
}

export interface JobDetail extends Job {
  customerContact: { contactName: string | null; phone: string | null; email: string | null };
  statusHistory: StatusChange[];
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type { Customer } from '../../../lib/customers';

/** A build-up as the estimator chooses it (the rates are the owner's business). */
export interface BuildUpChoice {
  id: string;
  name: string;
  description: string | null;
  active: boolean;
  matGsm: string;
  layers: string;
  upstandM: string;
  labourRate: string;
  markupPct: string;
  vatRatePct: string;
  [rate: string]: unknown;
}

// The roof as the API stores it, and its summary: one definition in the domain for both sides.
export type {
  StoredFall,
  StoredArea,
  StoredEdge,
  StoredRoof,
  FallResult,
  RoofSummary,
} from '@potlife/domain';

export interface RoofRecord {
  jobId: string;
  updatedAt: string | null;
  roof: StoredRoof | null;
  summary: RoofSummary | null;
}

/** The body of PUT /api/jobs/{id}/roof. */
export interface RoofBody {
  areas: {
    name: string;
    shape: 'rectangle' | 'polygon';
    lengthM?: string;
    widthM?: string;
    points?: [string, string][];
    fall?: StoredFall | null;
  }[];
  edges: {
    kind: EdgeKind;
    lengthM: string;
    upstandM?: string | null;
    areaIndex?: number | null;
    side?: number | null;
    label?: string | null;
  }[];
  pipes: number;
  outlets: number;
  corners: { external: number; internal: number } | null;
  notes: string | null;
}

// Estimates.
export interface EstimateLine {
  position: number;
  role: LineRole;
  materialKind: MaterialKind;
  description: string;
  unit: Unit;
  quantity: string;
  lengths: number | null;
  metres: string | null;
  material: Named | null;
}

/** supplier: packs at current supplier prices; stock: what the job could reserve, at its lots' cost. */
export type CostBasis = 'supplier' | 'stock';

export interface EstimatePack {
  /** supplier: packs to buy; stock: taken from one lot (size = the quantity, count 1) */
  source: 'supplier' | 'stock';
  /** stock rows: the lot and its cost of one stock unit (never on the quote) */
  lot: { id: string; batchNumber: string | null; unitCost: string } | null;
  size: string;
  label: string;
  count: number;
  packPrice: string | null;
  supplier: { id: string; name: string; leadTimeDays: number } | null;
  cost: string | null;
}

export interface EstimateMaterial {
  position: number;
  roles: LineRole[];
  materialKind: MaterialKind;
  material: Named | null;
  unit: string;
  quantity: string;
  /** costed from lots in stock; "0" on supplier prices */
  stockQuantity: string;
  packs: EstimatePack[];
  packTotal: string | null;
  leftover: string | null;
  cost: string | null;
  priced: boolean;
  problem: string | null;
}

export interface Estimate {
  id: string;
  jobId: string;
  version: number;
  accepted: boolean;
  acceptedAt: string | null;
  createdAt: string;
  createdBy: Named | null;
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
  lines: EstimateLine[];
  materials: EstimateMaterial[];
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
  unpriced: number;
  problems: string[];
  cautions: Caution[];
}

export interface EstimateSummary {
  id: string;
  version: number;
  accepted: boolean;
  createdAt: string;
  createdBy: Named | null;
  buildUpName: string;
  costBasis: CostBasis;
  laminatedAreaM2: string;
  net: string;
  gross: string;
  unpriced: number;
}

export interface LayingCheckResult {
  ok: boolean;
  problems: string[];
  dewPointC: string;
  catalystPercent: string | null;
  workingTime: { minMinutes: number; maxMinutes: number; text: string } | null;
  cautions: Caution[];
}

// Reservations, the pick list, issues and returns (apps/api/src/jobs/reservations/reservation.dto.ts).
export type ReservationFlagCode =
  'expires-before-job' | 'expires-within-margin' | 'quarantined' | 'exposure-flagged' | 'not-in-stock';

export interface ReservationFlag {
  code: ReservationFlagCode;
  message: string;
}

export interface LotRef {
  id: string;
  batchNumber: string | null;
  expiresOn: string | null;
}

export interface ReservationLine {
  id: string;
  lot: LotRef;
  status: 'held' | 'issued';
  reservedQuantity: string;
  issuedQuantity: string;
  heldQuantity: string;
  flags: ReservationFlag[];
  createdAt: string;
}

export interface PackCountRef {
  size: string;
  label: string;
  count: number;
}

export interface Shortfall {
  quantity: string;
  neededBy: string;
  leadTimeDays: number | null;
  supplier: Named | null;
  toOrder: { packs: PackCountRef[]; total: string } | null;
  checkedAt: string;
}

export interface ReservationMaterial {
  material: { id: string; code: string; name: string };
  unit: string;
  needed: string;
  held: string;
  issued: string;
  outstanding: string;
  reservations: ReservationLine[];
  shortfall: Shortfall | null;
}

export interface Reservations {
  jobId: string;
  jobDate: string | null;
  marginDays: number;
  useBy: string | null;
  estimate: { id: string; version: number } | null;
  state: 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';
  materials: ReservationMaterial[];
  skipped: { roles: string[]; materialKind: string; reason: string }[];
  flagged: number;
}

export interface PickListLine {
  material: { id: string; code: string; name: string; kind: string };
  unit: string;
  lot: LotRef;
  quantity: string;
  places: { locationId: string; locationName: string; quantity: string }[];
  flags: ReservationFlag[];
}

export type PickListLotFlagCode = 'expires-within-margin' | 'exposure-flagged' | 'held-for-other-jobs';

/** A lot that could go to the job now for a need that was not reserved (API order: FEFO). */
export interface PickListCandidate {
  lot: LotRef;
  onHand: string;
  /** the most it may give this job: on hand less other jobs' holds and this job's reserved lines */
  free: string;
  /** the FEFO suggestion's quantity of this lot, or null when not suggested */
  suggested: string | null;
  places: { locationId: string; locationName: string; quantity: string }[];
}

export interface PickListUnreserved {
  material: { id: string; code: string; name: string };
  unit: string;
  /** outstanding: needed − held − issued */
  quantity: string;
  candidates: PickListCandidate[];
  /** what usable stock cannot cover */
  short: string;
  /** in stock but not offered, and why */
  passedOver: { lot: LotRef; onHand: string; flags: { code: PickListLotFlagCode; message: string }[] }[];
}

export interface PickList {
  jobId: string;
  reference: string;
  title: string;
  siteAddress: string;
  jobDate: string | null;
  crew: string | null;
  lines: PickListLine[];
  unreserved: PickListUnreserved[];
  issued: { material: Named; unit: string; issued: string; returned: string }[];
  cautions: Caution[];
}

export interface SiteMovementLine {
  movementId: string;
  lotId: string;
  batchNumber: string | null;
  material: Named;
  unit: string;
  quantity: string;
  locationId: string;
  locationName: string;
  fullPacks?: number;
  partQuantity?: string;
}

export interface SiteMovement {
  jobId: string;
  operationIds: string[];
  lines: SiteMovementLine[];
  warnings: string[];
}

export interface ReconciliationMaterial {
  material: Named | null;
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
  actualCost: string;
}

export interface Reconciliation {
  jobId: string;
  estimate: { id: string; version: number } | null;
  materials: ReconciliationMaterial[];
  /** the estimate's hours against those the crew recorded */
  labour: ReconciliationLabour;
  totals: {
    price: string | null;
    estimatedMaterials: string | null;
    actualMaterials: string;
    /** the labour in the margin: recorded hours at the estimate's rate, or the estimate's labour */
    labour: string | null;
    labourBasis: LabourBasis;
    margin: string | null;
    marginPct: string | null;
  };
}

// Labour: the hours a crew actually worked (GET /api/jobs/:id/labour) and how the reconciliation uses them.

export type LabourBasis = 'recorded' | 'estimate';

export interface ReconciliationLabour {
  basis: LabourBasis;
  estimatedHours: string | null;
  recordedHours: string;
  entries: number;
  /** £ per hour, the accepted estimate's */
  rate: string | null;
  estimatedCost: string | null;
  recordedCost: string | null;
}

export interface LabourEntry {
  id: string;
  workedOn: string;
  hours: string;
  crewMember: string;
  note: string | null;
  createdBy: Named | null;
  createdAt: string;
  removed: { at: string; by: Named | null; reason: string | null } | null;
}

export interface JobLabour {
  jobId: string;
  open: boolean;
  closedReason: string | null;
  estimatedHours: string | null;
  recordedHours: string;
  byCrewMember: { crewMember: string; hours: string }[];
  entries: LabourEntry[];
}

/** Someone who can be a job's estimator (GET /api/users/estimators). */
export interface Estimator {
  id: string;
  name: string;
  role: 'owner' | 'estimator';
}
