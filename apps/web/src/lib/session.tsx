import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { createContext, use, type ReactNode } from 'react';
import { apiGet } from './api-client';
import { clearAccessToken, setAccessToken } from './auth-token';
import type { AuthResponse, SessionUser } from './session-types';

// The signed-in user: fetched once from GET /api/auth/me, primed by sign-in, registration and
// an accepted invitation, and handed to every screen behind the sign-in guard.

export const currentUserQueryKey = ['auth', 'me'] as const;

export function getCurrentUser(signal?: AbortSignal): Promise<SessionUser> {
  return apiGet<SessionUser>('/auth/me', { signal });
}

export function currentUserQueryOptions(enabled = true) {
  return queryOptions({
    queryKey: currentUserQueryKey,
    queryFn: ({ signal }) => getCurrentUser(signal),
    staleTime: 5 * 60_000,
    enabled,
  });
}

export function useCurrentUserQuery(enabled = true) {
  return useQuery(currentUserQueryOptions(enabled));
}

/** Keeps the new token and the user it belongs to. */
export function startSession(queryClient: QueryClient, auth: AuthResponse): void {
  setAccessToken(auth.accessToken);
  queryClient.setQueryData(currentUserQueryKey, auth.user);
}

/** Signs out: forgets the token and every cached answer that belonged to it. */
export function endSession(queryClient: QueryClient): void {
  clearAccessToken();
  queryClient.clear();
}

const SessionUserContext = createContext<SessionUser | null>(null);

export function SessionUserProvider({ user, children }: { user: SessionUser; children: ReactNode }) {
  return <SessionUserContext value={user}>{children}</SessionUserContext>;
}

/** The signed-in user; only for screens behind the sign-in guard. */
export function useSessionUser(): SessionUser {
  const user = use(SessionUserContext);
  if (user === null) {
    throw new Error('useSessionUser is only for screens behind the sign-in guard');
  }
  return user;
}
