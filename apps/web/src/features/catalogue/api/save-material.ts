import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost } from '../../../lib/api-client';
import { catalogueKeys, type Material, type MaterialBody } from './types';

export function createMaterial(body: MaterialBody): Promise<Material> {
  return apiPost<Material>('/materials', body);
}

export function updateMaterial({
  id,
  ...changes
}: Partial<MaterialBody> & { id: string }): Promise<Material> {
  return apiPatch<Material>(`/materials/${encodeURIComponent(id)}`, changes);
}

/** Creates a material, or changes one when an id is given. */
export function useSaveMaterial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { id?: string; body: MaterialBody }) =>
      input.id ? updateMaterial({ id: input.id, ...input.body }) : createMaterial(input.body),
    // The form shows the server's refusal beside the fields.
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}

/** Archives or restores a material (there is no hard delete). */
export function useSetMaterialActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, active }: { id: string; active: boolean }) => updateMaterial({ id, active }),
    meta: { errorTitle: 'The material was not changed' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
