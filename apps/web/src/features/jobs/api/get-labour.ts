import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { JobLabour } from './types';

/** Under the job, so whatever refreshes a job refreshes its hours. */
export const labourKey = (jobId: string) => [...jobsKeys.detail(jobId), 'labour'] as const;

export function getLabour(jobId: string, signal?: AbortSignal): Promise<JobLabour> {
  return apiGet<JobLabour>(`/jobs/${encodeURIComponent(jobId)}/labour`, { signal });
}

export function labourQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: labourKey(jobId),
    queryFn: ({ signal }) => getLabour(jobId, signal),
  });
}

/** The hours the crew worked on a job (no money: every role reads it). */
export function useLabour(jobId: string) {
  return useQuery(labourQueryOptions(jobId));
}
