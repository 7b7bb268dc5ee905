import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { catalogueKeys, materialSearch, type MaterialListParams, type MaterialPage } from './types';

export function getMaterials(params: MaterialListParams, signal?: AbortSignal): Promise<MaterialPage> {
  return apiGet<MaterialPage>(`/materials${materialSearch(params)}`, { signal });
}

export function materialsQueryOptions(params: MaterialListParams) {
  return queryOptions({
    queryKey: catalogueKeys.list(params),
    queryFn: ({ signal }) => getMaterials(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useMaterials(params: MaterialListParams) {
  return useQuery(materialsQueryOptions(params));
}
