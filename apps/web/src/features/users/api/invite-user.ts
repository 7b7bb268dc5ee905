import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import type { Role } from '../../../lib/roles';
import { usersKeys, type CompanyUser } from './get-users';

export interface InviteUserBody {
  email: string;
  name: string;
  role: Role;
}

/** Adds an invited user; the API e-mails them a one-time link to set their password. */
export function inviteUser(body: InviteUserBody): Promise<CompanyUser> {
  return apiPost<CompanyUser>('/users/invitations', body);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    meta: { errorTitle: 'The invitation was not sent' },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
