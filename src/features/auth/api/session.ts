// Sign-in, sign-up, sign-out and invitation hooks; each refreshes the cached session before the next page reads it.
import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { InviteInfo, SignInBody } from '../../../../shared/schemas/studio';
import type { AcceptInviteBody, SignUpBody } from '../../../../shared/schemas/account';
import { api } from '../../../lib/api';
import { sessionKeys, sessionQuery } from '../../../lib/session';

/**
 * After signing in (or up, or joining), the cached "nobody is signed in" answer from before must be
 * replaced before the next page reads it: wait for the fresh session, then let the rest refetch.
 */
async function refreshSession(qc: QueryClient) {
  await qc.fetchQuery({ ...sessionQuery, staleTime: 0 });
  await qc.invalidateQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.all[0] });
}

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => api('/api/auth/sign-in', { method: 'POST', body }),
    onSuccess: () => refreshSession(qc),
  });
}

export function useSignUp() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SignUpBody) => api('/api/auth/sign-up', { method: 'POST', body }),
    onSuccess: () => refreshSession(qc),
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
    onSuccess: () => refreshSession(qc),
  });
}
