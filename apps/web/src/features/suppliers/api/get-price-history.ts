import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { suppliersKeys } from './types';

// A material's prices with their history (GET /api/materials/{id}/prices?history=true), narrowed
// to one supplier and pack for the history under a price row.

export interface HistoryEntry {
  id: string;
  packPrice: string;
  validFrom: string;
  supplierCode: string | null;
  createdAt: string;
}

interface MaterialPricesAnswer {
  packs: { packSize: string; prices: { supplierId: string; history?: HistoryEntry[] }[] }[];
}

export async function getPriceHistory(
  supplierId: string,
  materialId: string,
  signal?: AbortSignal,
): Promise<Record<string, HistoryEntry[]>> {
  const answer = await apiGet<MaterialPricesAnswer>(
    `/materials/${encodeURIComponent(materialId)}/prices?history=true`,
    { signal },
  );
  const byPack: Record<string, HistoryEntry[]> = {};
  for (const pack of answer.packs) {
    const mine = pack.prices.find((price) => price.supplierId === supplierId);
    if (mine) {
      byPack[pack.packSize] = mine.history ?? [];
    }
  }
  return byPack;
}

export function priceHistoryQueryOptions(supplierId: string, materialId: string) {
  return queryOptions({
    queryKey: suppliersKeys.materialHistory(supplierId, materialId),
    queryFn: ({ signal }) => getPriceHistory(supplierId, materialId, signal),
  });
}

export function usePriceHistory(supplierId: string, materialId: string) {
  return useQuery(priceHistoryQueryOptions(supplierId, materialId));
}
