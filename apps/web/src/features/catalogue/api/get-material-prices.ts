import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { catalogueKeys } from './types';

// Every supplier's price for one material (GET /api/materials/{id}/prices?history=true).

export interface PriceHistoryEntry {
  id: string;
  packPrice: string;
  validFrom: string;
  supplierCode: string | null;
  createdAt: string;
}

export interface MaterialSupplierPrice {
  id: string;
  supplierId: string;
  supplierName: string;
  supplierActive: boolean;
  packSize: string;
  packLabel: string | null;
  packPrice: string;
  unitPrice: string;
  validFrom: string;
  supplierCode: string | null;
  history?: PriceHistoryEntry[];
}

export interface MaterialPrices {
  material: { id: string; code: string; name: string; stockUnit: string };
  on: string;
  packs: { packSize: string; packLabel: string | null; prices: MaterialSupplierPrice[] }[];
}

export function getMaterialPrices(id: string, signal?: AbortSignal): Promise<MaterialPrices> {
  return apiGet<MaterialPrices>(`/materials/${encodeURIComponent(id)}/prices?history=true`, { signal });
}

export function materialPricesQueryOptions(id: string) {
  return queryOptions({
    queryKey: catalogueKeys.prices(id),
    queryFn: ({ signal }) => getMaterialPrices(id, signal),
  });
}

export function useMaterialPrices(id: string) {
  return useQuery(materialPricesQueryOptions(id));
}
