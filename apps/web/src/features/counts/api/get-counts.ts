import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { countsKeys, type CountSummary } from './types';

export function getCounts(signal?: AbortSignal): Promise<CountSummary[]> {
  return apiGet<CountSummary[]>('/stock-counts', { signal });
}

export function countsQueryOptions() {
  return queryOptions({ queryKey: countsKeys.list(), queryFn: ({ signal }) => getCounts(signal) });
}

export function useCounts() {
  return useQuery(countsQueryOptions());
}
