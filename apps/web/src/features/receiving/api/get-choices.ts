import type { HazardClass, MaterialKind } from '@potlife/domain';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { receivingKeys } from './types';

// What a receipt's fields offer: suppliers, materials and locations in use.

export interface SupplierChoice {
  id: string;
  name: string;
}

export interface MaterialChoice {
  id: string;
  code: string;
  name: string;
  kind: MaterialKind;
  stockUnit: string;
  packSizes: { size: string; label: string }[];
  lotTracked: boolean;
  shelfLifeDays: number | null;
  hazardClass: HazardClass;
}

export interface LocationChoice {
  id: string;
  path: string;
  kind: string;
  active: boolean;
  allowedHazardClasses: HazardClass[];
}

export function supplierChoicesQueryOptions() {
  return queryOptions({
    queryKey: receivingKeys.choices('suppliers'),
    queryFn: async ({ signal }) =>
      (await apiGet<{ items: SupplierChoice[] }>('/suppliers?active=true&pageSize=200&sort=name', { signal }))
        .items,
    staleTime: 5 * 60_000,
  });
}

export function materialChoicesQueryOptions() {
  return queryOptions({
    queryKey: receivingKeys.choices('materials'),
    queryFn: async ({ signal }) =>
      (await apiGet<{ items: MaterialChoice[] }>('/materials?active=true&pageSize=200&sort=code', { signal }))
        .items,
    staleTime: 5 * 60_000,
  });
}

export function locationChoicesQueryOptions() {
  return queryOptions({
    queryKey: receivingKeys.choices('locations'),
    queryFn: async ({ signal }) =>
      (await apiGet<LocationChoice[]>('/locations', { signal })).filter((l) => l.active),
    staleTime: 60_000,
  });
}

export const useSupplierChoices = () => useQuery(supplierChoicesQueryOptions());
export const useMaterialChoices = () => useQuery(materialChoicesQueryOptions());
export const useLocationChoices = () => useQuery(locationChoicesQueryOptions());
