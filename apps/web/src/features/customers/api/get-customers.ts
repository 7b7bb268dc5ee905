import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer, CustomerListQuery, Page } from './types';

export function getCustomers(query: CustomerListQuery, signal?: AbortSignal): Promise<Page<Customer>> {
  const params = new URLSearchParams({
    sort: query.sort,
    page: String(query.page),
    pageSize: String(query.pageSize),
  });
  if (query.q.trim() !== '') {
    params.set('q', query.q.trim());
  }
  return apiGet<Page<Customer>>(`/customers?${params.toString()}`, { signal });
}

export function customersQueryOptions(query: CustomerListQuery) {
  return queryOptions({
    queryKey: customersKeys.list(query),
    queryFn: ({ signal }) => getCustomers(query, signal),
    placeholderData: keepPreviousData,
  });
}

/** The company's customers, searched, sorted and paged by the API. */
export function useCustomers(query: CustomerListQuery) {
  return useQuery(customersQueryOptions(query));
}
