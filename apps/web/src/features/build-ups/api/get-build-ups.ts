import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BuildUpRates } from '@potlife/domain';
import { apiGet } from '../../../lib/api-client';

export type BuildUp = BuildUpRates & {
  id: string;
  name: string;
  description: string | null;
  active: boolean;
  labourRate: string;
  markupPct: string;
  vatRatePct: string;
  createdAt: string;
  updatedAt: string;
};

export const buildUpsKeys = {
  all: ['build-ups'] as const,
  list: (includeInactive: boolean) => [...buildUpsKeys.all, 'list', { includeInactive }] as const,
};

export function getBuildUps(includeInactive: boolean, signal?: AbortSignal): Promise<BuildUp[]> {
  return apiGet<BuildUp[]>(`/build-ups${includeInactive ? '?includeInactive=true' : ''}`, { signal });
}

export function buildUpsQueryOptions(includeInactive: boolean) {
  return queryOptions({
    queryKey: buildUpsKeys.list(includeInactive),
    queryFn: ({ signal }) => getBuildUps(includeInactive, signal),
  });
}

export function useBuildUps(includeInactive: boolean) {
  return useQuery(buildUpsQueryOptions(includeInactive));
}
