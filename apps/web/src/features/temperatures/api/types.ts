// Temperature readings as the API sends them (apps/api/src/stock/dto/temperature.dto.ts).

export interface Reading {
  id: string;
  locationId: string;
  locationName: string;
  takenAt: string;
  temperatureC: string;
  source: 'manual' | 'import';
  note: string | null;
  /** Outside the band of what is stored there now. */
  outOfBand: boolean | null;
}

export interface Band {
  /** The highest minimum of the materials stored there. */
  minC: string | null;
  /** The lowest maximum. */
  maxC: string | null;
  materials: string[];
}

export interface ReadingsChart {
  locationId: string | null;
  from: string;
  to: string;
  band: Band | null;
  readings: Reading[];
}

export interface FlaggedLot {
  lotId: string;
  materialName: string;
  batchNumber: string | null;
  exposure: 'too-warm' | 'too-cold';
  message: string;
  readingId: string;
  takenAt: string;
  newlyFlagged: boolean;
}

export interface RecordReadingResult {
  reading: Reading;
  flaggedLots: FlaggedLot[];
}

export interface ImportRowProblem {
  /** The line in the file, the header being line 1. */
  row: number;
  message: string;
}

export interface ImportReadingsResult {
  dryRun: boolean;
  rows: number;
  imported: number;
  errors: ImportRowProblem[];
  duplicates: ImportRowProblem[];
  firstTakenAt: string | null;
  lastTakenAt: string | null;
  flaggedLots: FlaggedLot[];
}

export interface TempLocation {
  id: string;
  name: string;
  path: string;
  kind: string;
  active: boolean;
  lotCount: number;
}

export interface ExposedLot {
  id: string;
  materialCode: string;
  materialName: string;
  batchNumber: string | null;
  quantity: string;
  stockUnit: string;
  status: string;
  exposureFlagged: boolean;
  exposureReason: string | null;
  exposureFlaggedAt: string | null;
  places: { locationId: string; locationName: string; quantity: string }[];
}

export const temperatureKeys = {
  all: ['temperatures'] as const,
  chart: (locationId: string, days: number) => [...temperatureKeys.all, 'chart', locationId, days] as const,
  locations: () => [...temperatureKeys.all, 'locations'] as const,
};

/** Flags and quarantines change lots, which the stock screens show under this key. */
export const STOCK_KEY = ['stock'] as const;
export const flaggedLotsKey = [...STOCK_KEY, 'lots', { flagged: true }] as const;
