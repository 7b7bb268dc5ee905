import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch } from '../../../lib/api-client';
import type { Role } from '../../../lib/roles';
import { currentUserQueryKey } from '../../../lib/session';
import { usersKeys, type CompanyUser } from './get-users';

export interface UpdateUserBody {
  id: string;
  role?: Role;
  active?: boolean;
}

export function updateUser({ id, ...changes }: UpdateUserBody): Promise<CompanyUser> {
  return apiPatch<CompanyUser>(`/users/${encodeURIComponent(id)}`, changes);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    meta: { errorTitle: 'The user was not changed' },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: usersKeys.all }),
        // The owner may have changed their own role.
        queryClient.invalidateQueries({ queryKey: currentUserQueryKey }),
      ]),
  });
}
