// Query and mutation hooks for projects: the list, one project, create, update, and Reopen for a
// decided project.
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateProjectBody,
  ListQuery,
  ProjectDetail,
  ProjectPatch,
  ProjectSummary,
} from '../../../../shared/schemas/project';
import { api } from '../../../lib/api';

export const projectKeys = {
  all: ['projects'] as const,
  lists: () => [...projectKeys.all, 'list'] as const,
  list: (q: Partial<ListQuery>) => [...projectKeys.lists(), q] as const,
  details: () => [...projectKeys.all, 'detail'] as const,
  detail: (id: string) => [...projectKeys.details(), id] as const,
};

export const projectListQuery = (q: Partial<ListQuery>) =>
  queryOptions({
    queryKey: projectKeys.list(q),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (q.q) params.set('q', q.q);
      if (q.sort) params.set('sort', q.sort);
      if (q.archived) params.set('archived', q.archived);
      return api<{ projects: ProjectSummary[] }>(`/api/projects?${params}`, { signal });
    },
    placeholderData: keepPreviousData,
  });

export const projectQuery = (id: string) =>
  queryOptions({ queryKey: projectKeys.detail(id), queryFn: () => api<ProjectDetail>(`/api/projects/${id}`) });

export const useProjects = (q: Partial<ListQuery>) => useQuery(projectListQuery(q));
export const useProject = (id: string) => useQuery(projectQuery(id));

export function useCreateProject() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateProjectBody) => api<{ project: ProjectSummary }>('/api/projects', { method: 'POST', body }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: projectKeys.lists() });
      qc.invalidateQueries({ queryKey: ['clients'] });
    },
  });
}

export function useUpdateProject(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: ProjectPatch) =>
      api<{ project: ProjectSummary }>(`/api/projects/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: () => qc.invalidateQueries({ queryKey: projectKeys.all }),
  });
}

/** Decided → presented, on purpose; the links, their choices and the rooms' frozen options change with it. */
export function useReopenProject(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<{ project: ProjectSummary }>(`/api/projects/${id}/reopen`, { method: 'POST' }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: projectKeys.all });
      void qc.invalidateQueries({ queryKey: ['presentations'] });
      void qc.invalidateQueries({ queryKey: ['rooms'] });
    },
  });
}
