import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { stockKeys, type LotDetail } from './types';

export function getLot(id: string, signal?: AbortSignal): Promise<LotDetail> {
  return apiGet<LotDetail>(`/lots/${encodeURIComponent(id)}`, { signal });
}

export function lotQueryOptions(id: string) {
  return queryOptions({ queryKey: stockKeys.lot(id), queryFn: ({ signal }) => getLot(id, signal) });
}

export function useLot(id: string) {
  return useQuery(lotQueryOptions(id));
}
