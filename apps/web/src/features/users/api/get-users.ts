import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { Role } from '../../../lib/roles';

export type UserStatus = 'active' | 'invited' | 'inactive';

export interface CompanyUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  status: UserStatus;
  createdAt: string;
}

export const usersKeys = {
  all: ['users'] as const,
  list: () => [...usersKeys.all, 'list'] as const,
};

export function getUsers(signal?: AbortSignal): Promise<CompanyUser[]> {
  return apiGet<CompanyUser[]>('/users', { signal });
}

export function usersQueryOptions() {
  return queryOptions({
    queryKey: usersKeys.list(),
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
