// Presentations of a project, for the designer: one key factory, mutations invalidate through it.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreatePresentationBody,
  ExtendPresentationBody,
  PresentationSummary,
  SendPresentationBody,
} from '../../../../shared/schemas/presentation';
import type { OptionRecord, RoomRecord, RoomSummary } from '../../../../shared/schemas/room-api';
import { api } from '../../../lib/api';

export const presentationKeys = {
  all: ['presentations'] as const,
  lists: () => [...presentationKeys.all, 'list'] as const,
  list: (projectId: string) => [...presentationKeys.lists(), projectId] as const,
  pickers: () => [...presentationKeys.all, 'picker'] as const,
  picker: (projectId: string) => [...presentationKeys.pickers(), projectId] as const,
};

export const presentationListQuery = (projectId: string) =>
  queryOptions({
    queryKey: presentationKeys.list(projectId),
    // What the client opened and chose, and which shown options changed since, move outside this page: read afresh.
    staleTime: 0,
    queryFn: () =>
      api<{ presentations: PresentationSummary[] }>(`/api/projects/${projectId}/presentations`).then((r) => r.presentations),
  });

export const usePresentations = (projectId: string) => useQuery(presentationListQuery(projectId));

export interface PickerRoom {
  id: string;
  name: string;
  options: Pick<OptionRecord, 'id' | 'name' | 'position'>[];
}

/** The project's rooms with their options, read fresh whenever a new presentation is started. */
export const presentationPickerQuery = (projectId: string) =>
  queryOptions({
    queryKey: presentationKeys.picker(projectId),
    staleTime: 0,
    queryFn: async (): Promise<PickerRoom[]> => {
      const { rooms } = await api<{ rooms: RoomSummary[] }>(`/api/projects/${projectId}/rooms`);
      return Promise.all(
        rooms.map(async (r) => {
          const detail = await api<{ room: RoomRecord; options: OptionRecord[] }>(`/api/rooms/${r.id}`);
          return { id: r.id, name: r.name, options: detail.options.map(({ id, name, position }) => ({ id, name, position })) };
        }),
      );
    },
  });

export const usePresentationPicker = (projectId: string) => useQuery(presentationPickerQuery(projectId));

// A presentation changes its project's state and the project's "changed" time as well.
function useInvalidate(projectId: string) {
  const qc = useQueryClient();
  return () => {
    void qc.invalidateQueries({ queryKey: presentationKeys.list(projectId) });
    void qc.invalidateQueries({ queryKey: ['projects'] });
  };
}

type One = { presentation: PresentationSummary };

export function useCreatePresentation(projectId: string) {
  const invalidate = useInvalidate(projectId);
  return useMutation({
    mutationFn: (body: CreatePresentationBody) => api<One>(`/api/projects/${projectId}/presentations`, { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

export function useSendPresentation(projectId: string) {
  const invalidate = useInvalidate(projectId);
  return useMutation({
    mutationFn: ({ id, ...body }: SendPresentationBody & { id: string }) =>
      api<One>(`/api/presentations/${id}/send`, { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

export function useWithdrawPresentation(projectId: string) {
  const invalidate = useInvalidate(projectId);
  return useMutation({
    mutationFn: (id: string) => api<One>(`/api/presentations/${id}/withdraw`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}

export function useExtendPresentation(projectId: string) {
  const invalidate = useInvalidate(projectId);
  return useMutation({
    mutationFn: ({ id, ...body }: ExtendPresentationBody & { id: string }) =>
      api<One>(`/api/presentations/${id}/extend`, { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

export function useDecideProject(projectId: string) {
  const invalidate = useInvalidate(projectId);
  return useMutation({
    mutationFn: (presentationId: string) =>
      api<One>(`/api/projects/${projectId}/decide`, { method: 'POST', body: { presentationId } }),
    onSuccess: invalidate,
  });
}
