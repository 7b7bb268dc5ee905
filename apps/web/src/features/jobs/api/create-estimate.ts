import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { LineRole } from '@potlife/domain';
import type { CostBasis, Estimate } from './types';

export interface CreateEstimateBody {
  buildUpId?: string;
  airC?: string;
  note?: string | null;
  /** supplier prices (the default) or the stock the job could reserve for its date */
  costBasis?: CostBasis;
  /** a material for a role instead of the best fit */
  materials?: { role: LineRole; materialId: string }[];
}

export function createEstimate({
  jobId,
  ...body
}: CreateEstimateBody & { jobId: string }): Promise<Estimate> {
  return apiPost<Estimate>(`/jobs/${encodeURIComponent(jobId)}/estimates`, body);
}

export function useCreateEstimate(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateEstimateBody) => createEstimate({ jobId, ...body }),
    meta: { errorTitle: 'The estimate was not made' },
    onSuccess: (estimate) => {
      queryClient.setQueryData(jobsKeys.estimate(jobId, estimate.version), estimate);
      return queryClient.invalidateQueries({ queryKey: jobsKeys.estimates(jobId), exact: true });
    },
  });
}
