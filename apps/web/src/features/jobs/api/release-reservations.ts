import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Reservations } from './types';

/** Lets go of every pack still held for the job. */
export function releaseReservations(jobId: string): Promise<Reservations | undefined> {
  return apiRequest<Reservations | undefined>(`/jobs/${encodeURIComponent(jobId)}/reservations`, {
    method: 'DELETE',
  });
}

export function useReleaseReservations(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => releaseReservations(jobId),
    meta: { errorTitle: 'The reservations were not released' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
  });
}
