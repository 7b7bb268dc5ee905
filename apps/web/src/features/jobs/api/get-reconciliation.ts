import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { jobsKeys } from './keys';
import type { Reconciliation } from './types';

export function getReconciliation(jobId: string, signal?: AbortSignal): Promise<Reconciliation> {
  return apiGet<Reconciliation>(`/jobs/${encodeURIComponent(jobId)}/reconciliation`, { signal });
}

export function reconciliationQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: [...jobsKeys.materials(jobId), 'reconciliation'] as const,
    queryFn: ({ signal }) => getReconciliation(jobId, signal),
  });
}

/** Estimated against issued, returned and used (owners and estimators: it carries money). */
export function useReconciliation(jobId: string, enabled: boolean) {
  return useQuery({ ...reconciliationQueryOptions(jobId), enabled });
}
