// Stock counts as the API sends them (apps/api/src/stock/dto/count.dto.ts).

export type CountStatus = 'open' | 'submitted' | 'approved' | 'cancelled';
export type VarianceKind = 'match' | 'surplus' | 'loss';

export interface CountSummary {
  id: string;
  number: number;
  status: CountStatus;
  locationId: string | null;
  /** "Everything" for a count of every location. */
  scopeName: string;
  note: string | null;
  openedAt: string;
  openedByName: string;
  submittedAt: string | null;
  submittedByName: string | null;
  decidedAt: string | null;
  decidedByName: string | null;
  decisionNote: string | null;
  lineCount: number;
  countedCount: number;
}

export interface CountLine {
  id: string;
  lotId: string;
  batchNumber: string | null;
  materialId: string;
  materialName: string;
  materialCode: string;
  stockUnit: string;
  locationId: string;
  locationName: string;
  /** null while the count is open (blind entry), except for an owner. */
  expectedQuantity: string | null;
  countedQuantity: string | null;
  varianceQuantity: string | null;
  varianceValue: string | null;
  varianceKind: VarianceKind | null;
  unitCost: string;
  foundDuringCount: boolean;
  countedAt: string | null;
}

export interface CountAdjustment {
  id: string;
  lotId: string;
  batchNumber: string | null;
  materialName: string;
  stockUnit: string;
  locationName: string;
  quantity: string;
  value: string;
  reason: string | null;
  createdAt: string;
}

export interface Count extends CountSummary {
  expectedVisible: boolean;
  locationNames: string[];
  lines: CountLine[];
  totals: { lines: number; counted: number; losses: number; surpluses: number; varianceValue: string | null };
  adjustments: CountAdjustment[];
}

export interface CountEntry {
  lotId: string;
  locationId: string;
  countedQuantity: string;
}

export const countsKeys = {
  all: ['counts'] as const,
  list: () => [...countsKeys.all, 'list'] as const,
  detail: (id: string) => [...countsKeys.all, 'detail', id] as const,
  locations: () => [...countsKeys.all, 'locations'] as const,
  lots: (q: string) => [...countsKeys.all, 'lots', q] as const,
};

/** Approving posts adjustments: the stock screens' queries start with this key. */
export const STOCK_KEY = ['stock'] as const;
