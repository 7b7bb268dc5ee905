import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { temperatureKeys, type ReadingsChart } from './types';

/** A location's readings over the last `days` days, with the band of what is stored there. */
export function getReadings(locationId: string, days: number, signal?: AbortSignal): Promise<ReadingsChart> {
  const from = new Date(Date.now() - days * 24 * 3600 * 1000).toISOString();
  const search = new URLSearchParams({ locationId, from });
  return apiGet<ReadingsChart>(`/temperature-readings?${search.toString()}`, { signal });
}

export function readingsQueryOptions(locationId: string, days: number) {
  return queryOptions({
    queryKey: temperatureKeys.chart(locationId, days),
    queryFn: ({ signal }) => getReadings(locationId, days, signal),
    placeholderData: keepPreviousData,
    enabled: locationId !== '',
  });
}

export function useReadings(locationId: string, days: number) {
  return useQuery(readingsQueryOptions(locationId, days));
}
