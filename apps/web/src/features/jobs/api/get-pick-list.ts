import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { PickList } from './types';

export function getPickList(jobId: string, signal?: AbortSignal): Promise<PickList> {
  return apiGet<PickList>(`/jobs/${encodeURIComponent(jobId)}/pick-list`, { signal });
}

export function pickListQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: [...jobsKeys.materials(jobId), 'pick-list'] as const,
    queryFn: ({ signal }) => getPickList(jobId, signal),
  });
}

export function usePickList(jobId: string, enabled = true) {
  return useQuery({ ...pickListQueryOptions(jobId), enabled });
}
