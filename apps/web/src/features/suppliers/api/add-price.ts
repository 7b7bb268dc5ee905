import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { suppliersKeys, type SupplierPrice } from './types';

export interface PriceBody {
  materialId: string;
  packSize: string;
  packPrice: string;
  validFrom: string;
  supplierCode: string | null;
}

/** A new price from validFrom on; earlier prices stay as history. */
export function addPrice(supplierId: string, body: PriceBody): Promise<SupplierPrice> {
  return apiPost<SupplierPrice>(`/suppliers/${encodeURIComponent(supplierId)}/prices`, body);
}

export function useAddPrice(supplierId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PriceBody) => addPrice(supplierId, body),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersKeys.prices(supplierId) }),
  });
}
