import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { receivingKeys, STOCK_KEY, type Receipt, type ReceiptBody } from './types';

/** Books a delivery in: every line becomes a lot, in one transaction; the key makes a double submit count once. */
export function createReceipt(body: ReceiptBody, idempotencyKey: string): Promise<Receipt> {
  return apiPost<Receipt>('/receipts', body, { headers: { 'Idempotency-Key': idempotencyKey } });
}

export function useCreateReceipt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, key }: { body: ReceiptBody; key: string }) => createReceipt(body, key),
    meta: { notifyOnError: false },
    onSuccess: (receipt) => {
      queryClient.setQueryData(receivingKeys.detail(receipt.id), receipt);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: receivingKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: STOCK_KEY }),
      ]);
    },
  });
}
