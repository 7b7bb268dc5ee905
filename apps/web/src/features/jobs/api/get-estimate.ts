import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Estimate } from './types';

export function getEstimate(jobId: string, version: number, signal?: AbortSignal): Promise<Estimate> {
  return apiGet<Estimate>(`/jobs/${encodeURIComponent(jobId)}/estimates/${version}`, { signal });
}

export function estimateQueryOptions(jobId: string, version: number) {
  return queryOptions({
    queryKey: jobsKeys.estimate(jobId, version),
    queryFn: ({ signal }) => getEstimate(jobId, version, signal),
    // A version never changes once made (only whether it is the accepted one).
    staleTime: 60_000,
  });
}

export function useEstimate(jobId: string, version: number | null) {
  return useQuery({ ...estimateQueryOptions(jobId, version ?? 0), enabled: version !== null });
}
