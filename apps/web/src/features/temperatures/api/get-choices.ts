import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { flaggedLotsKey, temperatureKeys, type ExposedLot, type TempLocation } from './types';

export function locationsQueryOptions() {
  return queryOptions({
    queryKey: temperatureKeys.locations(),
    queryFn: ({ signal }) => apiGet<TempLocation[]>('/locations', { signal }),
    staleTime: 60_000,
  });
}

export const useTempLocations = () => useQuery(locationsQueryOptions());

/** Every lot flagged "check before use", wherever it is. */
export function useFlaggedLots() {
  return useQuery({
    queryKey: flaggedLotsKey,
    queryFn: ({ signal }) => apiGet<ExposedLot[]>('/lots?flagged=true', { signal }),
  });
}
