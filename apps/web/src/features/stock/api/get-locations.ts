import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { stockKeys, type Location } from './types';

export function getLocations(signal?: AbortSignal): Promise<Location[]> {
  return apiGet<Location[]>('/locations', { signal });
}

export function locationsQueryOptions() {
  return queryOptions({ queryKey: stockKeys.locations(), queryFn: ({ signal }) => getLocations(signal) });
}

export function useLocations() {
  return useQuery(locationsQueryOptions());
}
