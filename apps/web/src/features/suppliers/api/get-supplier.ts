import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { suppliersKeys, type Supplier } from './types';

export function getSupplier(id: string, signal?: AbortSignal): Promise<Supplier> {
  return apiGet<Supplier>(`/suppliers/${encodeURIComponent(id)}`, { signal });
}

export function supplierQueryOptions(id: string) {
  return queryOptions({
    queryKey: suppliersKeys.detail(id),
    queryFn: ({ signal }) => getSupplier(id, signal),
  });
}

export function useSupplier(id: string) {
  return useQuery(supplierQueryOptions(id));
}
