import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { searchOf, suppliersKeys, type SupplierListParams, type SupplierPage } from './types';

export function getSuppliers(params: SupplierListParams, signal?: AbortSignal): Promise<SupplierPage> {
  return apiGet<SupplierPage>(`/suppliers${searchOf(params)}`, { signal });
}

export function suppliersQueryOptions(params: SupplierListParams) {
  return queryOptions({
    queryKey: suppliersKeys.list(params),
    queryFn: ({ signal }) => getSuppliers(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useSuppliers(params: SupplierListParams) {
  return useQuery(suppliersQueryOptions(params));
}
