import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { receivingKeys, type Receipt } from './types';

export function getReceipt(id: string, signal?: AbortSignal): Promise<Receipt> {
  return apiGet<Receipt>(`/receipts/${encodeURIComponent(id)}`, { signal });
}

export function receiptQueryOptions(id: string) {
  return queryOptions({
    queryKey: receivingKeys.detail(id),
    queryFn: ({ signal }) => getReceipt(id, signal),
  });
}

export function useReceipt(id: string) {
  return useQuery(receiptQueryOptions(id));
}
