import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost, apiRequest } from '../../../lib/api-client';
import { suppliersKeys, type Contact } from './types';

export interface ContactBody {
  name: string;
  email: string | null;
  phone: string | null;
  role: string | null;
}

const base = (supplierId: string) => `/suppliers/${encodeURIComponent(supplierId)}/contacts`;

export function addContact(supplierId: string, body: ContactBody): Promise<Contact> {
  return apiPost<Contact>(base(supplierId), body);
}

export function updateContact(supplierId: string, contactId: string, body: ContactBody): Promise<Contact> {
  return apiPatch<Contact>(`${base(supplierId)}/${encodeURIComponent(contactId)}`, body);
}

export function deleteContact(supplierId: string, contactId: string): Promise<void> {
  return apiRequest<void>(`${base(supplierId)}/${encodeURIComponent(contactId)}`, { method: 'DELETE' });
}

export function useSaveContact(supplierId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ contactId, body }: { contactId?: string; body: ContactBody }) =>
      contactId ? updateContact(supplierId, contactId, body) : addContact(supplierId, body),
    meta: { notifyOnError: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersKeys.detail(supplierId) }),
  });
}

export function useDeleteContact(supplierId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (contactId: string) => deleteContact(supplierId, contactId),
    meta: { errorTitle: 'The contact was not removed' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersKeys.detail(supplierId) }),
  });
}
