import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ExpiryValue } from '../components/LotBadges';
import { apiGet } from './api-client';

// GET /api/stock/overview: what the storeman’s home and the owner’s home list (apps/api/src/stock/dto/stock.dto.ts).

export interface OverviewLot {
  id: string;
  materialName: string;
  materialCode: string;
  batchNumber: string | null;
  quantity: string;
  stockUnit: string;
  locationName: string;
  expiry: ExpiryValue;
}

export interface OverviewCount {
  id: string;
  number: number;
  status: 'open' | 'submitted';
  locationId: string | null;
  scopeName: string;
  openedAt: string;
}

export interface OverviewAlert {
  lotId: string;
  materialName: string;
  batchNumber: string | null;
  quantity: string;
  stockUnit: string;
  locationNames: string[];
  reason: string | null;
  flaggedAt: string | null;
}

export interface OverviewSegregationProblem {
  locationId: string;
  locationName: string;
  classes: string[];
  materials: string[];
  message: string;
}

export interface OverviewReorder {
  materialId: string;
  materialCode: string;
  materialName: string;
  stockUnit: string;
  usableQuantity: string;
  reorderLevel: string;
  reorderQuantity: string;
}

export interface StockOverview {
  today: string;
  /** Purchase orders due in: empty until purchase orders exist. */
  deliveriesDue: unknown[];
  countsOpen: OverviewCount[];
  expiringSoon: OverviewLot[];
  expiredInStock: OverviewLot[];
  temperatureAlerts: OverviewAlert[];
  segregationProblems: OverviewSegregationProblem[];
  belowReorder: OverviewReorder[];
}

/** Under the stock key, so every change of stock refreshes it. */
export const overviewKey = ['stock', 'overview'] as const;

export function getOverview(signal?: AbortSignal): Promise<StockOverview> {
  return apiGet<StockOverview>('/stock/overview', { signal });
}

export function overviewQueryOptions() {
  return queryOptions({ queryKey: overviewKey, queryFn: ({ signal }) => getOverview(signal) });
}

export function useOverview() {
  return useQuery(overviewQueryOptions());
}
