import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { STOCK_KEY } from './types';

/** Clear the exposure flag (checked, fine to use) or quarantine the lot, with the note why. */
export function actOnFlaggedLot(
  lotId: string,
  action: 'clear-flag' | 'quarantine',
  note: string,
  key: string,
): Promise<unknown> {
  return apiPost<unknown>(
    `/lots/${encodeURIComponent(lotId)}/${action}`,
    { note },
    { headers: { 'Idempotency-Key': key } },
  );
}

export function useFlaggedLotAction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      lotId,
      action,
      note,
      key,
    }: {
      lotId: string;
      action: 'clear-flag' | 'quarantine';
      note: string;
      key: string;
    }) => actOnFlaggedLot(lotId, action, note, key),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: STOCK_KEY }),
  });
}
