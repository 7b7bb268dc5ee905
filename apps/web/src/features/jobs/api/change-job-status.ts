import type { JobStatus } from '@potlife/domain';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { JobDetail } from './types';

export interface ChangeStatusBody {
  id: string;
  status: JobStatus;
  reason?: string | null;
}

export function changeJobStatus({ id, ...body }: ChangeStatusBody): Promise<JobDetail> {
  return apiPost<JobDetail>(`/jobs/${encodeURIComponent(id)}/status`, body);
}

export function useChangeJobStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeJobStatus,
    meta: { errorTitle: 'The status was not changed' },
    // A lost or cancelled job releases its reservations: everything about jobs may have moved.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
  });
}
