import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EdgeKind } from '@potlife/domain';
import { apiGet } from '../../../lib/api-client';

/** The scalar rates of a build-up, each a decimal string (apps/api build-up.entity SCALAR_RATES). */
export const SCALAR_RATES = [
  'matGsm',
  'layers',
  'rollWidthM',
  'lapM',
  'resinToGlass',
  'topcoatKgPerM2',
  'matWastagePct',
  'resinWastagePct',
  'trimLengthM',
  'trimLapM',
  'upstandM',
  'bandageWidthMm',
  'bandageGsm',
  'bandageMPerEdgeM',
  'bandageMPerTrimJoint',
  'bandageMPerCorner',
  'bandageMPerPipe',
  'bandageMPerOutlet',
  'extraResinKgPerPipe',
  'extraResinKgPerOutlet',
  'acetoneLPerM2',
  'adhesiveTrimMPerCartridge',
  'labourHoursPerM2',
  'labourHoursPerTrimM',
] as const;
export type ScalarRate = (typeof SCALAR_RATES)[number];

export type BuildUpRates = Record<ScalarRate, string> & {
  catalystBands: { fromC: string; percent: string }[];
  battenMPerEdgeM: Record<EdgeKind, string>;
  nailsPerEdgeM: Record<EdgeKind, string>;
};

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
