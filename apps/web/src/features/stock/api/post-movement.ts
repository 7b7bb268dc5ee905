import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { STOCK_CHANGED, type MovementResult } from './types';

export type WriteOffReason = 'expired' | 'damaged' | 'temperature';

export type MovementBody =
  | {
      kind: 'transfer';
      lotId: string;
      fromLocationId: string;
      toLocationId: string;
      quantity: string;
      note?: string;
    }
  | {
      kind: 'write-off';
      lotId: string;
      locationId: string;
      quantity: string;
      reason: WriteOffReason;
      note?: string;
    };

/** Posts a transfer or write-off; the key makes a double-submitted form count once. */
export function postMovement(body: MovementBody, idempotencyKey: string): Promise<MovementResult> {
  return apiPost<MovementResult>('/stock-movements', body, {
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function usePostMovement() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, key }: { body: MovementBody; key: string }) => postMovement(body, key),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: STOCK_CHANGED }),
  });
}

export function reverseMovement(id: string, note: string, idempotencyKey: string): Promise<MovementResult> {
  return apiPost<MovementResult>(
    `/stock-movements/${encodeURIComponent(id)}/reverse`,
    { note },
    { headers: { 'Idempotency-Key': idempotencyKey } },
  );
}

export function useReverseMovement() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, note, key }: { id: string; note: string; key: string }) =>
      reverseMovement(id, note, key),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: STOCK_CHANGED }),
  });
}
