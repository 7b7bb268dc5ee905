import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { suppliersKeys } from './types';

// The materials a price can be given for (active ones, up to the API's largest page).

export interface PricedMaterial {
  id: string;
  code: string;
  name: string;
  stockUnit: string;
  packSizes: { size: string; label: string }[];
}

export async function getMaterialChoices(signal?: AbortSignal): Promise<PricedMaterial[]> {
  const page = await apiGet<{ items: PricedMaterial[] }>('/materials?active=true&pageSize=200&sort=code', {
    signal,
  });
  return page.items;
}

export function materialChoicesQueryOptions() {
  return queryOptions({
    queryKey: suppliersKeys.materials(),
    queryFn: ({ signal }) => getMaterialChoices(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMaterialChoices(enabled = true) {
  return useQuery({ ...materialChoicesQueryOptions(), enabled });
}
