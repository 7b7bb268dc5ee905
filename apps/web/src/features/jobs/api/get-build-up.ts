import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { buildUpsKeys } from './keys';
import type { BuildUpChoice } from './types';

export function getBuildUp(id: string, signal?: AbortSignal): Promise<BuildUpChoice> {
  return apiGet<BuildUpChoice>(`/build-ups/${encodeURIComponent(id)}`, { signal });
}

export function buildUpQueryOptions(id: string) {
  return queryOptions({
    queryKey: buildUpsKeys.detail(id),
    queryFn: ({ signal }) => getBuildUp(id, signal),
  });
}

/** One build-up (owners and estimators only: it carries rates). */
export function useBuildUp(id: string | null | undefined, enabled = true) {
  return useQuery({ ...buildUpQueryOptions(id ?? ''), enabled: enabled && !!id });
}
