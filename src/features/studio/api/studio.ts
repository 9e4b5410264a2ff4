// Query and mutation hooks for the Studio page: members and invitations, inviting, revoking,
// changing roles, removing members, and the studio's currency and locale.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InviteBody, InviteInfo, Member, Role, StudioSettingsBody } from '../../../../shared/schemas/studio';
import { api } from '../../../lib/api';
import { sessionKeys } from '../../../lib/session';

export const studioKeys = {
  all: ['studio'] as const,
  members: () => [...studioKeys.all, 'members'] as const,
  invites: () => [...studioKeys.all, 'invites'] as const,
};

export const membersQuery = queryOptions({
  queryKey: studioKeys.members(),
  queryFn: () => api<{ members: Member[] }>('/api/studio/members'),
});
export const invitesQuery = queryOptions({
  queryKey: studioKeys.invites(),
  queryFn: () => api<{ invites: InviteInfo[] }>('/api/studio/invites'),
});

export const useMembers = () => useQuery(membersQuery);
export const useInvites = (enabled: boolean) => useQuery({ ...invitesQuery, enabled });

export function useInvite() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: InviteBody) => api<{ invite: InviteInfo }>('/api/studio/invites', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: studioKeys.invites() }),
  });
}

export function useRevokeInvite() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api(`/api/studio/invites/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: studioKeys.invites() }),
  });
}

export function useChangeRole() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) =>
      api(`/api/studio/members/${id}`, { method: 'PATCH', body: { role } }),
    onSettled: () => qc.invalidateQueries({ queryKey: studioKeys.all }),
  });
}

export function useRemoveMember() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api(`/api/studio/members/${id}`, { method: 'DELETE' }),
    onSettled: () => qc.invalidateQueries({ queryKey: studioKeys.all }),
  });
}

/** The studio's currency and locale; every screen reads them from the session, so it is read again. */
export function useUpdateStudioSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: StudioSettingsBody) =>
      api<{ settings: { currency: string; locale: string } }>('/api/studio/settings', { method: 'PATCH', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: sessionKeys.all }),
  });
}
