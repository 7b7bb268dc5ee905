import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { catalogueKeys, type Material } from './types';

export function getMaterial(id: string, signal?: AbortSignal): Promise<Material> {
  return apiGet<Material>(`/materials/${encodeURIComponent(id)}`, { signal });
}

export function materialQueryOptions(id: string) {
  return queryOptions({
    queryKey: catalogueKeys.detail(id),
    queryFn: ({ signal }) => getMaterial(id, signal),
  });
}

export function useMaterial(id: string) {
  return useQuery(materialQueryOptions(id));
}
