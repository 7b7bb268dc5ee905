import type { MaterialKind } from '@potlife/domain';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';

// GET /api/materials?kind=…&active=true: the materials an estimator may choose for a run's roles.

/** An active catalogue material as the run's choice needs it (fields of GET /api/materials). */
export interface RunMaterial {
  id: string;
  code: string;
  name: string;
  kind: MaterialKind;
}

interface MaterialPage {
  items: RunMaterial[];
  total: number;
}

const PAGE = 100;

/** Every active material of these kinds, by code (page after page). */
export async function getRunMaterials(
  kinds: readonly MaterialKind[],
  signal?: AbortSignal,
): Promise<RunMaterial[]> {
  const out: RunMaterial[] = [];
  for (let page = 1; ; page++) {
    const search = new URLSearchParams({
      kind: [...kinds].sort().join(','),
      active: 'true',
      sort: 'code',
      order: 'asc',
      page: String(page),
      pageSize: String(PAGE),
    });
    const res = await apiGet<MaterialPage>(`/materials?${search.toString()}`, { signal });
    out.push(...res.items.map(({ id, code, name, kind }) => ({ id, code, name, kind })));
    if (res.items.length < PAGE || out.length >= res.total) {
      return out;
    }
  }
}

export function runMaterialsQueryOptions(kinds: readonly MaterialKind[]) {
  const sorted = [...new Set(kinds)].sort();
  return queryOptions({
    // under the catalogue's key, so a change to the catalogue refreshes it
    queryKey: ['catalogue', 'materials', 'for-run', sorted],
    queryFn: ({ signal }) => getRunMaterials(sorted, signal),
    staleTime: 60_000,
  });
}

export function useRunMaterials(kinds: readonly MaterialKind[], enabled: boolean) {
  return useQuery({ ...runMaterialsQueryOptions(kinds), enabled: enabled && kinds.length > 0 });
}
