import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { searchOf, stockKeys, type Lot, type LotFilters } from './types';

export function getLots(filters: LotFilters, signal?: AbortSignal): Promise<Lot[]> {
  return apiGet<Lot[]>(`/lots${searchOf(filters)}`, { signal });
}

export function lotsQueryOptions(filters: LotFilters) {
  return queryOptions({
    queryKey: stockKeys.lots(filters),
    queryFn: ({ signal }) => getLots(filters, signal),
  });
}

export function useLots(filters: LotFilters) {
  return useQuery(lotsQueryOptions(filters));
}
