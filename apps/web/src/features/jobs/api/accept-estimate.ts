import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Estimate } from './types';

export function acceptEstimate({ jobId, version }: { jobId: string; version: number }): Promise<Estimate> {
  return apiPost<Estimate>(`/jobs/${encodeURIComponent(jobId)}/estimates/${version}/accept`);
}

export function useAcceptEstimate(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) => acceptEstimate({ jobId, version }),
    meta: { errorTitle: 'The estimate was not accepted' },
    // The job's value, the accepted flag of every version and the materials all follow.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
  });
}
