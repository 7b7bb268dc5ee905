import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys, type JobFilters } from './keys';
import type { Job, Page } from './types';

export function jobsSearch(filters: JobFilters): string {
  const params = new URLSearchParams();
  if (filters.statuses.length > 0) {
    params.set('status', filters.statuses.join(','));
  }
  if (filters.q.trim() !== '') {
    params.set('q', filters.q.trim());
  }
  params.set('sort', filters.sort);
  params.set('page', String(filters.page));
  params.set('pageSize', String(filters.pageSize));
  return params.toString();
}

export function getJobs(filters: JobFilters, signal?: AbortSignal): Promise<Page<Job>> {
  return apiGet<Page<Job>>(`/jobs?${jobsSearch(filters)}`, { signal });
}

export function jobsQueryOptions(filters: JobFilters) {
  return queryOptions({
    queryKey: jobsKeys.list(filters),
    queryFn: ({ signal }) => getJobs(filters, signal),
    // Keep the last page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useJobs(filters: JobFilters) {
  return useQuery(jobsQueryOptions(filters));
}
