import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { Role } from '../../../lib/roles';

export interface Invitation {
  email: string;
  name: string;
  role: Role;
  companyName: string;
}

export function getInvitation(token: string, signal?: AbortSignal): Promise<Invitation> {
  return apiGet<Invitation>(`/auth/invitations/${encodeURIComponent(token)}`, { signal, auth: false });
}

export function invitationQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['auth', 'invitations', token],
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
  });
}

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
