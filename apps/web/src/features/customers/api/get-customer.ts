import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer } from './types';

export function getCustomer(id: string, signal?: AbortSignal): Promise<Customer> {
  return apiGet<Customer>(`/customers/${encodeURIComponent(id)}`, { signal });
}

export function customerQueryOptions(id: string) {
  return queryOptions({
    queryKey: customersKeys.detail(id),
    queryFn: ({ signal }) => getCustomer(id, signal),
  });
}

export function useCustomer(id: string) {
  return useQuery(customerQueryOptions(id));
}
