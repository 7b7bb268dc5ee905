import type { LineRole, MaterialKind } from '@potlife/domain';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../../lib/api-client';
import type { Estimate } from '../../api/types';

// What the estimator may choose before a run: the material of each line role. The roles come from
// the last version (or, with none yet, every role a build-up can have); the choices are the
// company's active catalogue materials of the role's kind (GET /api/materials?kind=…).

/** Every role of a take-off, in the engine's order, with the material kind it is costed as. */
export const ROLE_KINDS: readonly [LineRole, MaterialKind][] = [
  ['mat', 'mat'],
  ['base-resin', 'base-resin'],
  ['bandage-resin', 'base-resin'],
  ['topcoat', 'topcoat'],
  ['catalyst', 'catalyst'],
  ['trim:drip', 'trim'],
  ['trim:kerb', 'trim'],
  ['trim:wall', 'trim'],
  ['trim:angle', 'trim'],
  ['corner:external', 'trim'],
  ['corner:internal', 'trim'],
  ['outlet', 'outlet'],
  ['bandage', 'bandage'],
  ['acetone', 'acetone'],
  ['adhesive', 'adhesive'],
  ['battens', 'batten'],
  ['nails', 'fixing'],
];

/** A line role in plain words. */
export const roleLabels: Record<LineRole, string> = {
  mat: 'Mat',
  'base-resin': 'Deck resin',
  'bandage-resin': 'Resin for the bandage',
  topcoat: 'Topcoat',
  catalyst: 'Catalyst',
  'trim:drip': 'Drip trim',
  'trim:kerb': 'Kerb trim',
  'trim:wall': 'Wall trim',
  'trim:angle': 'Angle trim',
  'corner:external': 'External corner pieces',
  'corner:internal': 'Internal corner pieces',
  outlet: 'Outlet pieces',
  bandage: 'Bandage',
  acetone: 'Acetone',
  adhesive: 'Trim adhesive',
  battens: 'Battens',
  nails: 'Clout nails',
};

export interface RunRole {
  role: LineRole;
  kind: MaterialKind;
  /** what the last version used for it, if anything */
  used: { id: string; name: string } | null;
}

/** The roles to choose for: those of the last version, or every role when there is none. */
export function runRoles(last: Estimate | undefined): RunRole[] {
  if (!last) {
    return ROLE_KINDS.map(([role, kind]) => ({ role, kind, used: null }));
  }
  return last.lines.map((l) => ({ role: l.role, kind: l.materialKind, used: l.material }));
}

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
export async function getRunMaterials(kinds: readonly MaterialKind[], signal?: AbortSignal): Promise<RunMaterial[]> {
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
