import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { apiGetBlob } from '../../../lib/api-client';
import { apiSendWithProgress, type SendProgress } from '../../../lib/upload';
import { receivingKeys, type Receipt } from './types';

/** Sends the delivery note (PDF, JPEG or PNG, at most 10 MB) as the multipart field "file". */
export function uploadDeliveryNote(
  receiptId: string,
  file: File,
  onProgress?: (progress: SendProgress) => void,
): Promise<Receipt> {
  const form = new FormData();
  form.append('file', file, file.name);
  return apiSendWithProgress<Receipt>(`/receipts/${encodeURIComponent(receiptId)}/delivery-note`, {
    body: form,
    onProgress,
  });
}

export function useUploadDeliveryNote() {
  const queryClient = useQueryClient();
  return useCallback(
    async (receiptId: string, file: File, onProgress?: (progress: SendProgress) => void) => {
      const receipt = await uploadDeliveryNote(receiptId, file, onProgress);
      queryClient.setQueryData(receivingKeys.detail(receipt.id), receipt);
      await queryClient.invalidateQueries({ queryKey: receivingKeys.lists() });
      return receipt;
    },
    [queryClient],
  );
}

export function getDeliveryNote(receiptId: string): Promise<Blob> {
  return apiGetBlob(`/receipts/${encodeURIComponent(receiptId)}/delivery-note`);
}

/** A label for every pack received, each with the QR code of its lot. */
export function getReceiptLabels(receiptId: string): Promise<Blob> {
  return apiGetBlob(`/receipts/${encodeURIComponent(receiptId)}/labels.pdf`);
}
