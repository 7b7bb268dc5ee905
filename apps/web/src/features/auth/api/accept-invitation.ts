import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';
import type { AuthResponse } from '../../../lib/session-types';

export interface AcceptInvitationBody {
  token: string;
  password: string;
}

/** Sets the invitee's password; the answer signs them in. */
export function acceptInvitation({ token, password }: AcceptInvitationBody): Promise<AuthResponse> {
  return apiPost<AuthResponse>(
    `/auth/invitations/${encodeURIComponent(token)}/accept`,
    { password },
    { auth: false },
  );
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { notifyOnError: false },
    onSuccess: (auth) => startSession(queryClient, auth),
  });
}
