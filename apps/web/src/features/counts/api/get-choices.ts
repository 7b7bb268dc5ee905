import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { countsKeys } from './types';

export interface CountLocation {
  id: string;
  name: string;
  path: string;
  active: boolean;
  lotCount: number;
}

export interface FoundLot {
  id: string;
  materialCode: string;
  materialName: string;
  batchNumber: string | null;
  stockUnit: string;
}

export function locationsQueryOptions() {
  return queryOptions({
    queryKey: countsKeys.locations(),
    queryFn: ({ signal }) => apiGet<CountLocation[]>('/locations', { signal }),
    staleTime: 60_000,
  });
}

export const useCountLocations = () => useQuery(locationsQueryOptions());

/** Lots to pick from when one is found on the shelf that the count did not list (empty ones too). */
export function useFoundLotSearch(q: string) {
  return useQuery({
    queryKey: countsKeys.lots(q),
    queryFn: ({ signal }) =>
      apiGet<FoundLot[]>(`/lots?includeEmpty=true&q=${encodeURIComponent(q)}`, { signal }),
    enabled: q.trim().length >= 2,
    staleTime: 30_000,
  });
}
