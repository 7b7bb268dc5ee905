import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from './api-client';

// A customer as /api/customers answers it (apps/api/src/customers/dto), and adding one: shared by
// the Customers screens and New job, which adds a customer on the way.

export interface Customer {
  id: string;
  name: string;
  contactName: string | null;
  email: string | null;
  phone: string | null;
  billingAddress: string | null;
  notes: string | null;
  jobCount: number;
  createdAt: string;
  updatedAt: string;
}

/** The body of POST /api/customers (and PATCH, every field optional there but the name). */
export interface CustomerBody {
  name: string;
  contactName?: string | null;
  email?: string | null;
  phone?: string | null;
  billingAddress?: string | null;
  notes?: string | null;
}

/** Router state that opens New job on the jobs list with this customer chosen. */
export interface NewJobFor {
  newJobFor: { id: string; name: string };
}

/** Every customer query sits under this key: the customers screens' lists and New job's search. */
export const customersKey = ['customers'] as const;

export function createCustomer(body: CustomerBody): Promise<Customer> {
  return apiPost<Customer>('/customers', body);
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    meta: { errorTitle: 'The customer was not added' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersKey }),
  });
}
