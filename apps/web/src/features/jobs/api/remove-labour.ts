import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { labourKey } from './get-labour';
import { jobsKeys } from './keys';
import type { JobLabour } from './types';

/** Strikes an entry out: it stays on the sheet, marked, and stops counting. */
export function removeLabour(jobId: string, entryId: string, reason: string | null): Promise<JobLabour> {
  const query = reason ? `?${new URLSearchParams({ reason }).toString()}` : '';
  return apiRequest<JobLabour>(
    `/jobs/${encodeURIComponent(jobId)}/labour/${encodeURIComponent(entryId)}${query}`,
    { method: 'DELETE' },
  );
}

export function useRemoveLabour(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, reason }: { entryId: string; reason: string | null }) =>
      removeLabour(jobId, entryId, reason),
    meta: { errorTitle: 'The entry was not struck out' },
    onSuccess: (sheet) => {
      queryClient.setQueryData(labourKey(jobId), sheet);
      return queryClient.invalidateQueries({ queryKey: jobsKeys.materials(jobId) });
    },
  });
}
