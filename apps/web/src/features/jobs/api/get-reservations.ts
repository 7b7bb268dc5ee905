import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Reservations } from './types';

export function getReservations(jobId: string, signal?: AbortSignal): Promise<Reservations> {
  return apiGet<Reservations>(`/jobs/${encodeURIComponent(jobId)}/reservations`, { signal });
}

export function reservationsQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: [...jobsKeys.materials(jobId), 'reservations'] as const,
    queryFn: ({ signal }) => getReservations(jobId, signal),
  });
}

export function useReservations(jobId: string) {
  return useQuery(reservationsQueryOptions(jobId));
}
