import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer, CustomerBody } from './types';

export function updateCustomer({ id, ...body }: CustomerBody & { id: string }): Promise<Customer> {
  return apiPatch<Customer>(`/customers/${encodeURIComponent(id)}`, body);
}

export function useUpdateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCustomer,
    meta: { errorTitle: 'The customer was not saved' },
    // Jobs show the customer's name and contact too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: customersKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['jobs'] }),
      ]),
  });
}
