import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { RoofBody, RoofRecord } from './types';

export function putRoof({ jobId, roof }: { jobId: string; roof: RoofBody }): Promise<RoofRecord> {
  return apiRequest<RoofRecord>(`/jobs/${encodeURIComponent(jobId)}/roof`, { method: 'PUT', body: roof });
}

export function usePutRoof(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (roof: RoofBody) => putRoof({ jobId, roof }),
    meta: { errorTitle: 'The roof was not saved' },
    onSuccess: (saved) => {
      queryClient.setQueryData(jobsKeys.roof(jobId), saved);
      // The job's hasRoof and the list change with it.
      return queryClient.invalidateQueries({
        queryKey: jobsKeys.all,
        predicate: (q) => q.queryKey[3] !== 'roof',
      });
    },
  });
}
