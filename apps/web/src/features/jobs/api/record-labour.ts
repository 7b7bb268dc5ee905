import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { labourKey } from './get-labour';
import { jobsKeys } from './keys';
import type { JobLabour } from './types';

export interface RecordLabourBody {
  workedOn: string;
  hours: string;
  crewMember: string;
  note?: string | null;
}

export function recordLabour({ jobId, ...body }: RecordLabourBody & { jobId: string }): Promise<JobLabour> {
  return apiPost<JobLabour>(`/jobs/${encodeURIComponent(jobId)}/labour`, body);
}

export function useRecordLabour(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordLabourBody) => recordLabour({ jobId, ...body }),
    meta: { errorTitle: 'The hours were not recorded' },
    onSuccess: (sheet) => {
      queryClient.setQueryData(labourKey(jobId), sheet);
      // The reconciliation's labour follows the recorded hours.
      return queryClient.invalidateQueries({ queryKey: jobsKeys.materials(jobId) });
    },
  });
}
