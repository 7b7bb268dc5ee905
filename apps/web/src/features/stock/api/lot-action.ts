import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiGetBlob, apiPost } from '../../../lib/api-client';
import { STOCK_CHANGED, type LotDetail } from './types';

export type LotAction = 'quarantine' | 'release' | 'clear-flag';

/** Quarantine, release or clear the exposure flag, with the note why. */
export function actOnLot(
  lotId: string,
  action: LotAction,
  note: string,
  idempotencyKey: string,
): Promise<LotDetail> {
  return apiPost<LotDetail>(
    `/lots/${encodeURIComponent(lotId)}/${action}`,
    { note },
    { headers: { 'Idempotency-Key': idempotencyKey } },
  );
}

export function useLotAction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      lotId,
      action,
      note,
      key,
    }: {
      lotId: string;
      action: LotAction;
      note: string;
      key: string;
    }) => actOnLot(lotId, action, note, key),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: STOCK_CHANGED }),
  });
}

/** The lot's label as a PDF (QR code of the lot), `copies` times. */
export function getLotLabel(lotId: string, copies: number): Promise<Blob> {
  return apiGetBlob(`/lots/${encodeURIComponent(lotId)}/label.pdf?copies=${copies}`);
}
