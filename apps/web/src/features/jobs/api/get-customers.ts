import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer, Page } from './types';

export function getCustomers(q: string, signal?: AbortSignal): Promise<Page<Customer>> {
  const params = new URLSearchParams({ pageSize: '50' });
  if (q.trim() !== '') {
    params.set('q', q.trim());
  }
  return apiGet<Page<Customer>>(`/customers?${params.toString()}`, { signal });
}

export function customersQueryOptions(q: string) {
  return queryOptions({
    queryKey: customersKeys.search(q.trim()),
    queryFn: ({ signal }) => getCustomers(q, signal),
    placeholderData: keepPreviousData,
  });
}

export function useCustomers(q: string, enabled = true) {
  return useQuery({ ...customersQueryOptions(q), enabled });
}
