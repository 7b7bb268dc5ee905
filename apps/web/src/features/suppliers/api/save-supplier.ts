import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost } from '../../../lib/api-client';
import { suppliersKeys, type Supplier } from './types';

export interface SupplierBody {
  name: string;
  orderEmail: string | null;
  phone: string | null;
  address: string | null;
  leadTimeDays: number;
  notes: string | null;
}

export function createSupplier(body: SupplierBody): Promise<Supplier> {
  return apiPost<Supplier>('/suppliers', body);
}

export function updateSupplier(
  id: string,
  body: Partial<SupplierBody> & { active?: boolean },
): Promise<Supplier> {
  return apiPatch<Supplier>(`/suppliers/${encodeURIComponent(id)}`, body);
}

export function useSaveSupplier() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id?: string; body: SupplierBody }) =>
      id ? updateSupplier(id, body) : createSupplier(body),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersKeys.all }),
  });
}

/** Archives (active false) or restores a supplier. */
export function useSetSupplierActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, active }: { id: string; active: boolean }) => updateSupplier(id, { active }),
    meta: { errorTitle: 'The supplier was not changed' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersKeys.all }),
  });
}
