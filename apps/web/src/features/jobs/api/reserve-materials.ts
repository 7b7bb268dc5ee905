import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Reservations } from './types';

/** Holds the accepted estimate's packs for the job date (FEFO, in date on the day plus the margin). */
export function reserveMaterials(jobId: string): Promise<Reservations> {
  return apiPost<Reservations>(`/jobs/${encodeURIComponent(jobId)}/reservations`);
}

export function useReserveMaterials(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => reserveMaterials(jobId),
    meta: { errorTitle: 'Nothing was reserved' },
    // The job's material state shows in the list and the calendar too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobsKeys.all }),
  });
}
