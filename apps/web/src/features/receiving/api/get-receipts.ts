import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { receivingKeys, searchOf, type ReceiptListParams, type ReceiptPage } from './types';

export function getReceipts(params: ReceiptListParams, signal?: AbortSignal): Promise<ReceiptPage> {
  return apiGet<ReceiptPage>(`/receipts${searchOf(params)}`, { signal });
}

export function receiptsQueryOptions(params: ReceiptListParams) {
  return queryOptions({
    queryKey: receivingKeys.list(params),
    queryFn: ({ signal }) => getReceipts(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useReceipts(params: ReceiptListParams) {
  return useQuery(receiptsQueryOptions(params));
}
