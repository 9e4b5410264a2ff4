import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteInfo, SignInBody } from '../../../../shared/schemas/studio';
import type { AcceptInviteBody, SignUpBody } from '../../../../shared/schemas/account';
import { api } from '../../../lib/api';
import { sessionKeys } from '../../../lib/session';

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => api('/api/auth/sign-in', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries(),
  });
}

export function useSignUp() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SignUpBody) => api('/api/auth/sign-up', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries(),
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/auth/sign-out', { method: 'POST' }),
    onSettled: () => {
      qc.clear();
    },
  });
}

export const inviteQuery = (token: string) =>
  queryOptions({
    queryKey: sessionKeys.invite(token),
    queryFn: () => api<{ invite: InviteInfo }>(`/api/invites/${encodeURIComponent(token)}`),
    retry: false,
  });

export function useAcceptInvite(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInviteBody) => api(`/api/invites/${encodeURIComponent(token)}/accept`, { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries(),
  });
}
