// Query and mutation hooks for rooms and their options: list, load, create, import a plan file,
// save, delete, and add, save, delete and reorder options.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateOptionBody,
  CreateRoomBody,
  OptionRecord,
  RoomRecord,
  RoomSummary,
  SaveOptionBody,
  SaveRoomBody,
} from '../../../../shared/schemas/room-api';
import type { PlanFileInput } from '../../../../shared/schemas/plan-file';
import { api } from '../../../lib/api';

export const roomKeys = {
  all: ['rooms'] as const,
  lists: () => [...roomKeys.all, 'list'] as const,
  list: (projectId: string) => [...roomKeys.lists(), projectId] as const,
  details: () => [...roomKeys.all, 'detail'] as const,
  detail: (id: string) => [...roomKeys.details(), id] as const,
};

export interface RoomDetail {
  room: RoomRecord;
  options: OptionRecord[];
}

export const roomListQuery = (projectId: string) =>
  queryOptions({
    queryKey: roomKeys.list(projectId),
    queryFn: () => api<{ rooms: RoomSummary[] }>(`/api/projects/${projectId}/rooms`),
  });

export const roomQuery = (id: string) =>
  queryOptions({ queryKey: roomKeys.detail(id), queryFn: () => api<RoomDetail>(`/api/rooms/${id}`) });

export const useRooms = (projectId: string) => useQuery(roomListQuery(projectId));
export const useRoom = (id: string) => useQuery(roomQuery(id));

function useInvalidateProject() {
  const qc = useQueryClient();
  return () => {
    qc.invalidateQueries({ queryKey: roomKeys.all });
    qc.invalidateQueries({ queryKey: ['projects'] });
  };
}

export function useCreateRoom(projectId: string) {
  const invalidate = useInvalidateProject();
  return useMutation({
    mutationFn: (body: CreateRoomBody) => api<RoomDetail>(`/api/projects/${projectId}/rooms`, { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

export function useImportPlan(projectId: string) {
  const invalidate = useInvalidateProject();
  return useMutation({
    mutationFn: (plan: PlanFileInput | unknown) =>
      api<RoomDetail>(`/api/projects/${projectId}/rooms/import`, { method: 'POST', body: plan }),
    onSuccess: invalidate,
  });
}

export function useSaveRoom(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SaveRoomBody) => api<{ room: RoomRecord }>(`/api/rooms/${id}`, { method: 'PUT', body }),
    onSuccess: ({ room }) => {
      qc.setQueryData<RoomDetail>(roomKeys.detail(id), (d) => (d ? { ...d, room } : d));
      qc.invalidateQueries({ queryKey: roomKeys.lists() });
    },
  });
}

export function useDeleteRoom(id: string) {
  const invalidate = useInvalidateProject();
  return useMutation({ mutationFn: () => api(`/api/rooms/${id}`, { method: 'DELETE' }), onSuccess: invalidate });
}

export function useCreateOption(roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateOptionBody) =>
      api<{ option: OptionRecord }>(`/api/rooms/${roomId}/options`, { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: roomKeys.all }),
  });
}

export function useSaveOption(roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: SaveOptionBody & { id: string }) =>
      api<{ option: OptionRecord }>(`/api/options/${id}`, { method: 'PUT', body }),
    onSuccess: ({ option }) =>
      qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) =>
        d ? { ...d, options: d.options.map((o) => (o.id === option.id ? option : o)) } : d,
      ),
  });
}

export function useDeleteOption(_roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api(`/api/options/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: roomKeys.all }),
  });
}

export function useReorderOptions(roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (optionIds: string[]) =>
      api<{ options: OptionRecord[] }>(`/api/rooms/${roomId}/option-order`, { method: 'PUT', body: { optionIds } }),
    onSuccess: ({ options }) => qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, options } : d)),
  });
}
