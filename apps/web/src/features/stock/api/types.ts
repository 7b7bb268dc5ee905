import type { HazardClass, MaterialKind } from '@potlife/domain';
import type { ExpiryValue, LotStatusValue } from '../../../components/LotBadges';

// Stock as the API sends it (apps/api/src/stock/dto): locations, lots, balances, movements.

export type LocationKind =
  'store' | 'bay' | 'shelf' | 'flammables-cabinet' | 'peroxide-store' | 'van' | 'outdoor';
export const LOCATION_KINDS: readonly LocationKind[] = [
  'store',
  'bay',
  'shelf',
  'flammables-cabinet',
  'peroxide-store',
  'van',
  'outdoor',
];

export interface Location {
  id: string;
  name: string;
  kind: LocationKind;
  parentId: string | null;
  parentName: string | null;
  /** "Main store › Bay A". */
  path: string;
  capacityLitres: string | null;
  allowedHazardClasses: HazardClass[];
  active: boolean;
  notes: string | null;
  lotCount: number;
  hazardClassesStored: HazardClass[];
  litresHeld: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface LotPlace {
  locationId: string;
  locationName: string;
  quantity: string;
}

export interface Lot {
  id: string;
  materialId: string;
  materialCode: string;
  materialName: string;
  materialKind: MaterialKind;
  stockUnit: string;
  hazardClass: HazardClass;
  batchNumber: string | null;
  receivedOn: string;
  expiry: ExpiryValue;
  status: LotStatusValue;
  usable: boolean;
  quantity: string;
  unitCost: string;
  value: string;
  locationId: string;
  locationName: string;
  places: LotPlace[];
  receiptId: string | null;
  receiptNumber: number | null;
  exposureFlagged: boolean;
  exposureReason: string | null;
  exposureFlaggedAt: string | null;
  labelUrl: string;
  createdAt: string;
}

export interface LotEvent {
  id: string;
  kind: 'quarantined' | 'released' | 'flagged' | 'flag-cleared' | 'written-off';
  note: string | null;
  readingId: string | null;
  userName: string | null;
  createdAt: string;
}

export interface LotDetail extends Lot {
  events: LotEvent[];
}

export type MovementKind = 'receipt' | 'transfer' | 'issue' | 'return' | 'adjustment' | 'write-off';

export interface Movement {
  id: string;
  operationId: string;
  kind: MovementKind;
  lotId: string;
  batchNumber: string | null;
  materialId: string;
  materialName: string;
  stockUnit: string;
  locationId: string;
  locationName: string;
  fromLocationId: string | null;
  fromLocationName: string | null;
  toLocationId: string | null;
  toLocationName: string | null;
  quantity: string;
  unitCost: string;
  value: string;
  reason: string | null;
  note: string | null;
  userId: string;
  userName: string;
  createdAt: string;
  jobId: string | null;
  receiptLineId: string | null;
  receiptId: string | null;
  countId: string | null;
  reversesMovementId: string | null;
  reversedByMovementId: string | null;
}

export interface MovementPage {
  items: Movement[];
  total: number;
}

export interface MovementResult {
  operationId: string;
  movements: Movement[];
  lot: Lot;
  warnings: string[];
}

export interface MaterialBalanceRow {
  materialId: string;
  materialCode: string;
  materialName: string;
  materialKind: MaterialKind;
  stockUnit: string;
  quantity: string;
  usableQuantity: string;
  value: string;
  lotCount: number;
  nextExpiry: ExpiryValue | null;
  reorderLevel: string;
  reorderQuantity: string;
  belowReorder: boolean;
}

export interface LocationBalanceRow {
  locationId: string;
  locationName: string;
  locationKind: LocationKind;
  materialId: string;
  materialCode: string;
  materialName: string;
  stockUnit: string;
  quantity: string;
  value: string;
  lotCount: number;
}

export type BalanceView = 'material' | 'location';

export interface Balances<Row> {
  by: BalanceView | 'lot';
  rows: Row[];
  totalValue: string;
}

export interface LotFilters {
  materialId?: string;
  locationId?: string;
  status?: LotStatusValue;
  expiringWithinDays?: number;
  flagged?: boolean;
  includeEmpty?: boolean;
}

export function searchOf(params: object): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') {
      search.set(key, String(value));
    }
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

export const stockKeys = {
  all: ['stock'] as const,
  balances: (by: BalanceView, kind?: MaterialKind) =>
    [...stockKeys.all, 'balances', by, kind ?? 'all'] as const,
  lots: (filters: LotFilters) => [...stockKeys.all, 'lots', filters] as const,
  lot: (id: string) => [...stockKeys.all, 'lot', id] as const,
  movements: (lotId: string, page: number) => [...stockKeys.all, 'movements', lotId, page] as const,
  locations: () => [...stockKeys.all, 'locations'] as const,
};

/** Every change of stock invalidates these (the balances, lots, movements and locations all move together). */
export const STOCK_CHANGED = stockKeys.all;
