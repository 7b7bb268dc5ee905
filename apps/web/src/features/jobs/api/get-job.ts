import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { JobDetail } from './types';

export function getJob(id: string, signal?: AbortSignal): Promise<JobDetail> {
  return apiGet<JobDetail>(`/jobs/${encodeURIComponent(id)}`, { signal });
}

export function jobQueryOptions(id: string) {
  return queryOptions({
    queryKey: jobsKeys.detail(id),
    queryFn: ({ signal }) => getJob(id, signal),
  });
}

export function useJob(id: string) {
  return useQuery(jobQueryOptions(id));
}
