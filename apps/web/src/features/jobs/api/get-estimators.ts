import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { Estimator } from './types';

export const estimatorsKey = ['users', 'estimators'] as const;

/** The company's active owners and estimators: who can be a job's estimator (every role may ask). */
export function getEstimators(signal?: AbortSignal): Promise<Estimator[]> {
  return apiGet<Estimator[]>('/users/estimators', { signal });
}

export function estimatorsQueryOptions() {
  return queryOptions({
    queryKey: estimatorsKey,
    queryFn: ({ signal }) => getEstimators(signal),
    staleTime: 60_000,
  });
}

export function useEstimators(enabled = true) {
  return useQuery({ ...estimatorsQueryOptions(), enabled });
}
