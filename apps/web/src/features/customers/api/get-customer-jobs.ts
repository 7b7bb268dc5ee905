import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { CustomerJob, Page } from './types';

interface JobsQuery {
  sort: string;
  page: number;
  pageSize: number;
}

export function getCustomerJobs(
  customerId: string,
  query: JobsQuery,
  signal?: AbortSignal,
): Promise<Page<CustomerJob>> {
  const params = new URLSearchParams({
    customerId,
    sort: query.sort,
    page: String(query.page),
    pageSize: String(query.pageSize),
  });
  return apiGet<Page<CustomerJob>>(`/jobs?${params.toString()}`, { signal });
}

export function customerJobsQueryOptions(customerId: string, query: JobsQuery) {
  return queryOptions({
    queryKey: customersKeys.jobs(customerId, query),
    queryFn: ({ signal }) => getCustomerJobs(customerId, query, signal),
    placeholderData: keepPreviousData,
  });
}

/** A customer's jobs, newest first unless sorted otherwise. */
export function useCustomerJobs(customerId: string, query: JobsQuery) {
  return useQuery(customerJobsQueryOptions(customerId, query));
}
