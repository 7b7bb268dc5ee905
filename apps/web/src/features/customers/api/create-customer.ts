import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer, CustomerBody } from './types';

export function createCustomer(body: CustomerBody): Promise<Customer> {
  return apiPost<Customer>('/customers', body);
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    meta: { errorTitle: 'The customer was not added' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersKeys.all }),
  });
}
