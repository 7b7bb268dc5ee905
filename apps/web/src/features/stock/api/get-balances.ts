import type { MaterialKind } from '@potlife/domain';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import {
  searchOf,
  stockKeys,
  type Balances,
  type LocationBalanceRow,
  type MaterialBalanceRow,
} from './types';

export function getMaterialBalances(
  kind?: MaterialKind,
  signal?: AbortSignal,
): Promise<Balances<MaterialBalanceRow>> {
  return apiGet<Balances<MaterialBalanceRow>>(`/stock${searchOf({ by: 'material', kind })}`, { signal });
}

export function getLocationBalances(signal?: AbortSignal): Promise<Balances<LocationBalanceRow>> {
  return apiGet<Balances<LocationBalanceRow>>('/stock?by=location', { signal });
}

export function materialBalancesQueryOptions(kind?: MaterialKind) {
  return queryOptions({
    queryKey: stockKeys.balances('material', kind),
    queryFn: ({ signal }) => getMaterialBalances(kind, signal),
  });
}

export function locationBalancesQueryOptions() {
  return queryOptions({
    queryKey: stockKeys.balances('location'),
    queryFn: ({ signal }) => getLocationBalances(signal),
  });
}

export function useMaterialBalances(kind?: MaterialKind) {
  return useQuery(materialBalancesQueryOptions(kind));
}

export function useLocationBalances() {
  return useQuery(locationBalancesQueryOptions());
}
