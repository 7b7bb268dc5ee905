import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';
import type { AuthResponse } from '../../../lib/session-types';

export interface RegisterBody {
  companyName: string;
  name: string;
  email: string;
  password: string;
}

/** Creates a company with its owner, who is signed in at once. */
export function registerCompany(body: RegisterBody): Promise<AuthResponse> {
  return apiPost<AuthResponse>('/auth/register', body, { auth: false });
}

export function useRegisterCompany() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: registerCompany,
    meta: { notifyOnError: false },
    onSuccess: (auth) => startSession(queryClient, auth),
  });
}
