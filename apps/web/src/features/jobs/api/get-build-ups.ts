import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { buildUpsKeys } from './keys';
import type { BuildUpChoice } from './types';

/** The company's active build-ups, to choose one for a job or an estimate. */
export function getBuildUps(signal?: AbortSignal): Promise<BuildUpChoice[]> {
  return apiGet<BuildUpChoice[]>('/build-ups', { signal });
}

export function buildUpsQueryOptions() {
  return queryOptions({
    queryKey: buildUpsKeys.active(),
    queryFn: ({ signal }) => getBuildUps(signal),
  });
}

export function useBuildUps(enabled = true) {
  return useQuery({ ...buildUpsQueryOptions(), enabled });
}
