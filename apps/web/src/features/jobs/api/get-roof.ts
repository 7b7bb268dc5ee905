import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { RoofRecord } from './types';

export function getRoof(jobId: string, signal?: AbortSignal): Promise<RoofRecord> {
  return apiGet<RoofRecord>(`/jobs/${encodeURIComponent(jobId)}/roof`, { signal });
}

export function roofQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: jobsKeys.roof(jobId),
    queryFn: ({ signal }) => getRoof(jobId, signal),
  });
}

export function useRoof(jobId: string) {
  return useQuery(roofQueryOptions(jobId));
}
