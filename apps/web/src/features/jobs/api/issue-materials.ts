import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { SiteMovement } from './types';

export interface IssueBody {
  lines: { lotId: string; quantity: string; fromLocationId?: string }[];
  note?: string | null;
}

/** Sends stock to the job's site: one issue movement per line (part of a reservation is fine). */
export function issueMaterials({
  jobId,
  key,
  ...body
}: IssueBody & { jobId: string; key: string }): Promise<SiteMovement> {
  // The same key for a retried submit: the API books it once.
  return apiPost<SiteMovement>(`/jobs/${encodeURIComponent(jobId)}/issues`, body, {
    headers: { 'Idempotency-Key': key },
  });
}

export function useIssueMaterials(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: IssueBody & { key: string }) => issueMaterials({ jobId, ...body }),
    meta: { errorTitle: 'Nothing was issued' },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['stock'] }),
      ]),
  });
}
