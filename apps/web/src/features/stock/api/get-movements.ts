import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { searchOf, stockKeys, type MovementPage } from './types';

export const MOVEMENTS_PAGE_SIZE = 25;

/** A lot's movements, newest first, a page at a time. */
export function getLotMovements(lotId: string, page: number, signal?: AbortSignal): Promise<MovementPage> {
  const offset = (page - 1) * MOVEMENTS_PAGE_SIZE;
  return apiGet<MovementPage>(`/stock-movements${searchOf({ lotId, limit: MOVEMENTS_PAGE_SIZE, offset })}`, {
    signal,
  });
}

export function lotMovementsQueryOptions(lotId: string, page: number) {
  return queryOptions({
    queryKey: stockKeys.movements(lotId, page),
    queryFn: ({ signal }) => getLotMovements(lotId, page, signal),
    placeholderData: keepPreviousData,
  });
}

export function useLotMovements(lotId: string, page: number) {
  return useQuery(lotMovementsQueryOptions(lotId, page));
}
