// The client's page talks to the token-authorised API only; one key factory for its queries.
import { QueryClient, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChoiceAnswer, ChoiceBody, ClientPresentation } from '../../../../shared/schemas/presentation';
import { api, ApiError } from '../../../lib/api';

export const presentationKeys = {
  all: ['presentation'] as const,
  detail: (token: string) => [...presentationKeys.all, token] as const,
};

/** Its own client, so the page works the same inside the designer's app (dev) and on its own entry. */
export function createPresentationQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 60_000,
        refetchOnWindowFocus: false,
        // A refused link will not start working by asking again.
        retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
      },
    },
  });
}

const base = (token: string) => `/api/p/${encodeURIComponent(token)}`;

export const presentationQuery = (token: string) =>
  queryOptions({
    queryKey: presentationKeys.detail(token),
    queryFn: ({ signal }) => api<{ presentation: ClientPresentation }>(base(token), { signal }).then((r) => r.presentation),
  });

export const usePresentation = (token: string) => useQuery(presentationQuery(token));

export function useChoose(token: string, roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ChoiceBody) => api<ChoiceAnswer>(`${base(token)}/rooms/${roomId}/choice`, { method: 'PUT', body }),
    onSuccess: ({ choice }) =>
      qc.setQueryData<ClientPresentation>(
        presentationKeys.detail(token),
        (p) => p && { ...p, rooms: p.rooms.map((r) => (r.id === roomId ? { ...r, choice } : r)) },
      ),
  });
}

/** Tells the designer an option was looked at. Best effort: a lost note never bothers the client. */
export function markLookedAt(token: string, optionId: string): void {
  void api(`${base(token)}/views`, { method: 'POST', body: { optionId } }).catch(() => undefined);
}
