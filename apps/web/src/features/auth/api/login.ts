import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';
import type { AuthResponse } from '../../../lib/session-types';

export interface LoginBody {
  email: string;
  password: string;
}

export function login(body: LoginBody): Promise<AuthResponse> {
  return apiPost<AuthResponse>('/auth/login', body, { auth: false });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    meta: { notifyOnError: false },
    onSuccess: (auth) => startSession(queryClient, auth),
  });
}
