import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { countsKeys, type Count } from './types';

export function getCount(id: string, signal?: AbortSignal): Promise<Count> {
  return apiGet<Count>(`/stock-counts/${encodeURIComponent(id)}`, { signal });
}

export function countQueryOptions(id: string) {
  return queryOptions({ queryKey: countsKeys.detail(id), queryFn: ({ signal }) => getCount(id, signal) });
}

export function useCount(id: string) {
  return useQuery(countQueryOptions(id));
}
