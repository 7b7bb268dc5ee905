import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { SiteMovement } from './types';

export interface ReturnBody {
  lines: { lotId: string; fullPacks?: number; partQuantity?: string; toLocationId?: string }[];
  note?: string | null;
}

/** Takes back what the job did not use: full packs, and part-packs weighed or measured. */
export function returnMaterials({
  jobId,
  key,
  ...body
}: ReturnBody & { jobId: string; key: string }): Promise<SiteMovement> {
  // The same key for a retried submit: the API books it once.
  return apiPost<SiteMovement>(`/jobs/${encodeURIComponent(jobId)}/returns`, body, {
    headers: { 'Idempotency-Key': key },
  });
}

export function useReturnMaterials(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReturnBody & { key: string }) => returnMaterials({ jobId, ...body }),
    meta: { errorTitle: 'The return was not booked' },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['stock'] }),
      ]),
  });
}
