// The Finish library's hooks. The room editor reads finishes through useFinishes / useFinishIndex
// and turns each into a scene material with toSceneFinish (shared/finishes/scene-finish).
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreatePaintBody,
  Finish,
  FinishListQuery,
  FinishPatch,
  PaintFinish,
  PhotoFinish,
} from '../../../../shared/schemas/finish';
import { api, ApiError } from '../../../lib/api';
import { sendForm } from '../../../lib/upload';

export type { Finish, PaintFinish, PhotoFinish };
export { toSceneFinish, type SceneFinish } from '../../../../shared/finishes/scene-finish';

export const finishKeys = {
  all: ['finishes'] as const,
  lists: () => [...finishKeys.all, 'list'] as const,
  list: (q: Partial<FinishListQuery>) => [...finishKeys.lists(), q] as const,
  details: () => [...finishKeys.all, 'detail'] as const,
  detail: (id: string) => [...finishKeys.details(), id] as const,
};

/** How often a page re-reads finishes while a photo is processing (processing takes about a second). */
const PROCESSING_POLL_MS = 1000;
const isProcessing = (f: Finish) => f.kind === 'photo' && f.status === 'processing';

export const finishListQuery = (q: Partial<FinishListQuery> = {}) =>
  queryOptions({
    queryKey: finishKeys.list(q),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (q.q) params.set('q', q.q);
      if (q.category) params.set('category', q.category);
      if (q.kind) params.set('kind', q.kind);
      return api<{ finishes: Finish[] }>(`/api/finishes?${params}`, { signal });
    },
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data?.finishes.some(isProcessing) ? PROCESSING_POLL_MS : false),
  });

export const finishQuery = (id: string) =>
  queryOptions({
    queryKey: finishKeys.detail(id),
    queryFn: ({ signal }) => api<{ finish: Finish }>(`/api/finishes/${id}`, { signal }),
    refetchInterval: (query) => (query.state.data && isProcessing(query.state.data.finish) ? PROCESSING_POLL_MS : false),
  });

/** The studio's finishes (newest first), optionally searched and filtered. */
export const useFinishes = (q: Partial<FinishListQuery> = {}) => useQuery(finishListQuery(q));
/** One finish; an empty id waits (an upload not answered yet). */
export const useFinish = (id: string) => useQuery({ ...finishQuery(id), enabled: id !== '' });

/** Every finish of the studio by id: what an option's finish assignments point at. */
export const useFinishIndex = () =>
  useQuery({ ...finishListQuery({}), select: (data) => new Map(data.finishes.map((f) => [f.id, f])) });

export function useCreatePaint() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreatePaintBody) => api<{ finish: PaintFinish }>('/api/finishes/paints', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: finishKeys.lists() }),
  });
}

export function useUpdateFinish(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: FinishPatch) => api<{ finish: Finish }>(`/api/finishes/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: (data) => {
      qc.setQueryData(finishKeys.detail(id), data);
      qc.invalidateQueries({ queryKey: finishKeys.lists() });
    },
  });
}

export function useDeleteFinish() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<void>(`/api/finishes/${id}`, { method: 'DELETE' }),
    onSuccess: (_data, id) => {
      qc.removeQueries({ queryKey: finishKeys.detail(id) });
      qc.invalidateQueries({ queryKey: finishKeys.lists() });
    },
  });
}

/**
 * Uploads one photo, reporting progress 0…1 as its bytes leave. Resolves with the new photo
 * finish, still processing.
 */
export async function uploadPhoto(
  file: File,
  onProgress: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<PhotoFinish> {
  const form = new FormData();
  form.append('photos', file, file.name);
  const body = await sendForm<{ finishes?: PhotoFinish[] }>('/api/finishes/photos', form, { okStatus: 201, onProgress, signal });
  if (!body.finishes?.[0]) throw new ApiError(500, 'error', 'The server answered without the photo.');
  return body.finishes[0];
}
