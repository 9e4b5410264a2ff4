// Query and mutation hooks for the studio's clients: the list (search and sort), add and edit.
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Client, ClientBody, ListQuery } from '../../../../shared/schemas/project';
import { api } from '../../../lib/api';

export const clientKeys = {
  all: ['clients'] as const,
  lists: () => [...clientKeys.all, 'list'] as const,
  list: (q: Partial<ListQuery>) => [...clientKeys.lists(), q] as const,
};

export const clientListQuery = (q: Partial<ListQuery>) =>
  queryOptions({
    queryKey: clientKeys.list(q),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (q.q) params.set('q', q.q);
      if (q.sort) params.set('sort', q.sort);
      return api<{ clients: Client[] }>(`/api/clients?${params}`, { signal });
    },
    placeholderData: keepPreviousData,
  });

export const useClients = (q: Partial<ListQuery> = {}) => useQuery(clientListQuery(q));

export function useCreateClient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ClientBody) => api<{ client: Client }>('/api/clients', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: clientKeys.all }),
  });
}

export function useUpdateClient(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<ClientBody>) => api<{ client: Client }>(`/api/clients/${id}`, { method: 'PATCH', body }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: clientKeys.all });
      qc.invalidateQueries({ queryKey: ['projects'] });
    },
  });
}
