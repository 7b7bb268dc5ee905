import type { HazardClass } from '@potlife/domain';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost, apiRequest } from '../../../lib/api-client';
import { stockKeys, type Location, type LocationKind } from './types';

export interface LocationBody {
  name: string;
  kind: LocationKind;
  parentId: string | null;
  capacityLitres?: string;
  allowedHazardClasses?: HazardClass[];
  notes?: string;
}

export function createLocation(body: LocationBody): Promise<Location> {
  const { parentId, ...rest } = body;
  return apiPost<Location>('/locations', parentId ? { ...rest, parentId } : rest);
}

export function updateLocation(
  id: string,
  body: Partial<LocationBody> & { active?: boolean },
): Promise<Location> {
  return apiPatch<Location>(`/locations/${encodeURIComponent(id)}`, body);
}

export function deleteLocation(id: string): Promise<void> {
  return apiRequest<void>(`/locations/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useSaveLocation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id?: string; body: LocationBody }) =>
      id ? updateLocation(id, body) : createLocation(body),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}

export function useSetLocationActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, active }: { id: string; active: boolean }) => updateLocation(id, { active }),
    meta: { errorTitle: 'The location was not changed' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}

export function useDeleteLocation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLocation,
    meta: { errorTitle: 'The location was not deleted' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}
