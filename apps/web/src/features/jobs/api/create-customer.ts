import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { customersKeys } from './keys';
import type { Customer } from './types';

export interface CreateCustomerBody {
  name: string;
  contactName?: string | null;
  email?: string | null;
  phone?: string | null;
  billingAddress?: string | null;
}

export function createCustomer(body: CreateCustomerBody): Promise<Customer> {
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
