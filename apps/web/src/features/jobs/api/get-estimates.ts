import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { EstimateSummary } from './types';

export function getEstimates(jobId: string, signal?: AbortSignal): Promise<EstimateSummary[]> {
  return apiGet<EstimateSummary[]>(`/jobs/${encodeURIComponent(jobId)}/estimates`, { signal });
}

export function estimatesQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: jobsKeys.estimates(jobId),
    queryFn: ({ signal }) => getEstimates(jobId, signal),
  });
}

export function useEstimates(jobId: string, enabled = true) {
  return useQuery({ ...estimatesQueryOptions(jobId), enabled });
}
