import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { searchOf, suppliersKeys, type PriceListParams, type SupplierPricePage } from './types';

export function getSupplierPrices(
  supplierId: string,
  params: PriceListParams,
  signal?: AbortSignal,
): Promise<SupplierPricePage> {
  return apiGet<SupplierPricePage>(`/suppliers/${encodeURIComponent(supplierId)}/prices${searchOf(params)}`, {
    signal,
  });
}

export function supplierPricesQueryOptions(supplierId: string, params: PriceListParams) {
  return queryOptions({
    queryKey: suppliersKeys.priceList(supplierId, params),
    queryFn: ({ signal }) => getSupplierPrices(supplierId, params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useSupplierPrices(supplierId: string, params: PriceListParams) {
  return useQuery(supplierPricesQueryOptions(supplierId, params));
}
