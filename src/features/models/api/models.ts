// The piece model library's hooks: the list with the studio's storage, one model, one upload per
// request with progress, changes, the browser-rendered thumbnail and deletion.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PieceModel, PieceModelList, PieceModelPatch } from '../../../../shared/schemas/piece-model';
import { api } from '../../../lib/api';
import { sendForm } from '../../../lib/upload';

export type { PieceModel, PieceModelList, PieceModelPatch };

export const modelKeys = {
  all: ['piece-models'] as const,
  lists: () => [...modelKeys.all, 'list'] as const,
  details: () => [...modelKeys.all, 'detail'] as const,
  detail: (id: string) => [...modelKeys.details(), id] as const,
};

/** How often a page re-reads models while one is processing (normalising takes a few seconds). */
const PROCESSING_POLL_MS = 1500;
export const isProcessing = (m: PieceModel) => m.status === 'processing';

export const modelListQuery = () =>
  queryOptions({
    queryKey: modelKeys.lists(),
    queryFn: ({ signal }) => api<PieceModelList>('/api/piece-models', { signal }),
    refetchInterval: (query) => (query.state.data?.models.some(isProcessing) ? PROCESSING_POLL_MS : false),
  });

export const modelQuery = (id: string) =>
  queryOptions({
    queryKey: modelKeys.detail(id),
    queryFn: ({ signal }) => api<{ model: PieceModel }>(`/api/piece-models/${id}`, { signal }),
    refetchInterval: (query) => (query.state.data && isProcessing(query.state.data.model) ? PROCESSING_POLL_MS : false),
  });

/** The studio's models (newest first) with the storage they use of the quota. */
export const usePieceModels = () => useQuery(modelListQuery());
/** One model; an empty id waits (an upload not answered yet). */
export const usePieceModel = (id: string) => useQuery({ ...modelQuery(id), enabled: id !== '' });

/** Every model of the studio by id: what a piece's modelId points at. */
export const usePieceModelIndex = () =>
  useQuery({ ...modelListQuery(), select: (data) => new Map(data.models.map((m) => [m.id, m])) });

/** A changed model replaces its page's copy and the list is read again. */
function useModelAnswer() {
  const qc = useQueryClient();
  return (data: { model: PieceModel }) => {
    qc.setQueryData(modelKeys.detail(data.model.id), data);
    return qc.invalidateQueries({ queryKey: modelKeys.lists() });
  };
}

export function useUpdatePieceModel(id: string) {
  const answered = useModelAnswer();
  return useMutation({
    mutationFn: (patch: PieceModelPatch) =>
      api<{ model: PieceModel }>(`/api/piece-models/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: answered,
  });
}

export function useDeletePieceModel() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<void>(`/api/piece-models/${id}`, { method: 'DELETE' }),
    onSuccess: (_data, id) => {
      qc.removeQueries({ queryKey: modelKeys.detail(id) });
      qc.invalidateQueries({ queryKey: modelKeys.lists() });
    },
  });
}

export function useSetModelThumbnail() {
  const answered = useModelAnswer();
  return useMutation({
    mutationFn: ({ id, png }: { id: string; png: Blob }) => {
      const form = new FormData();
      form.append('thumbnail', png, 'thumbnail.png');
      return sendForm<{ model: PieceModel }>(`/api/piece-models/${id}/thumbnail`, form, { method: 'PUT' });
    },
    onSuccess: answered,
  });
}

/** Uploads one model file (one per request), reporting progress 0…1. Resolves with the model, still processing. */
export async function uploadModel(file: File, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<PieceModel> {
  const form = new FormData();
  form.append('model', file, file.name);
  const body = await sendForm<{ model: PieceModel }>('/api/piece-models', form, { okStatus: 201, onProgress, signal });
  return body.model;
}

/** People who can see a wearer of a model the server refused to delete: "Flat · Living room · Calm". */
export interface ModelWearer {
  projectName: string;
  roomName: string;
  optionName: string;
}
