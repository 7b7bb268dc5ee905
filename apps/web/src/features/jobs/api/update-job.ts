import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { JobDetail, Substrate } from './types';

export interface UpdateJobBody {
  title?: string;
  siteAddress?: string;
  substrate?: Substrate;
  scheduledOn?: string | null;
  estimatorId?: string | null;
  crew?: string | null;
  topcoatColour?: string | null;
  buildUpId?: string | null;
  notes?: string | null;
}

export function updateJob({ id, ...body }: UpdateJobBody & { id: string }): Promise<JobDetail> {
  return apiPatch<JobDetail>(`/jobs/${encodeURIComponent(id)}`, body);
}

export function useUpdateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateJob,
    meta: { errorTitle: 'The job was not changed' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
  });
}
