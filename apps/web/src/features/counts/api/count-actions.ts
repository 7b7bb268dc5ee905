import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost } from '../../../lib/api-client';
import { countsKeys, STOCK_KEY, type Count, type CountEntry } from './types';

const base = (id: string) => `/stock-counts/${encodeURIComponent(id)}`;
const keyed = (key: string) => ({ headers: { 'Idempotency-Key': key } });

export function openCount(body: { locationId?: string; note?: string }, key: string): Promise<Count> {
  return apiPost<Count>('/stock-counts', body, keyed(key));
}

/** Saves counted quantities while the count is open. */
export function saveEntries(id: string, lines: CountEntry[]): Promise<Count> {
  return apiPatch<Count>(base(id), { lines });
}

export function submitCount(id: string, lines: CountEntry[], key: string): Promise<Count> {
  return apiPost<Count>(`${base(id)}/submit`, lines.length > 0 ? { lines } : {}, keyed(key));
}

export function approveCount(id: string, note: string | undefined, key: string): Promise<Count> {
  return apiPost<Count>(`${base(id)}/approve`, note ? { note } : {}, keyed(key));
}

export function rejectCount(
  id: string,
  action: 'reopen' | 'cancel',
  note: string,
  key: string,
): Promise<Count> {
  return apiPost<Count>(`${base(id)}/reject`, { action, note }, keyed(key));
}

function settle(queryClient: QueryClient, count: Count, stockChanged = false) {
  queryClient.setQueryData(countsKeys.detail(count.id), count);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: countsKeys.list() }),
    stockChanged ? queryClient.invalidateQueries({ queryKey: STOCK_KEY }) : Promise.resolve(),
  ]);
}

export function useOpenCount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, key }: { body: { locationId?: string; note?: string }; key: string }) =>
      openCount(body, key),
    meta: { notifyOnError: false },
    onSuccess: (count) => settle(queryClient, count),
  });
}

export function useSaveEntries(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lines: CountEntry[]) => saveEntries(id, lines),
    meta: { errorTitle: 'The counts were not saved' },
    onSuccess: (count) => settle(queryClient, count),
  });
}

export function useSubmitCount(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ lines, key }: { lines: CountEntry[]; key: string }) => submitCount(id, lines, key),
    meta: { errorTitle: 'The count was not submitted' },
    onSuccess: (count) => settle(queryClient, count),
  });
}

export function useApproveCount(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ note, key }: { note?: string; key: string }) => approveCount(id, note, key),
    meta: { errorTitle: 'The count was not approved' },
    onSuccess: (count) => settle(queryClient, count, true),
  });
}

export function useRejectCount(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ action, note, key }: { action: 'reopen' | 'cancel'; note: string; key: string }) =>
      rejectCount(id, action, note, key),
    meta: { notifyOnError: false },
    onSuccess: (count) => settle(queryClient, count),
  });
}
