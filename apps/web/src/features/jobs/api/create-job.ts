import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { customersKeys, jobsKeys } from './keys';
import type { JobDetail, Substrate } from './types';

export interface CreateJobBody {
  customerId: string;
  title?: string | null;
  siteAddress: string;
  substrate: Substrate;
  scheduledOn?: string | null;
  estimatorId?: string | null;
  crew?: string | null;
  topcoatColour?: string | null;
  buildUpId?: string | null;
  notes?: string | null;
}

export function createJob(body: CreateJobBody): Promise<JobDetail> {
  return apiPost<JobDetail>('/jobs', body);
}

export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    meta: { errorTitle: 'The job was not created' },
    // A customer's count of jobs changes too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
        queryClient.invalidateQueries({ queryKey: customersKeys.all }),
      ]),
  });
}
