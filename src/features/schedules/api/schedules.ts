// Query hooks for the take-off and schedule pages: the project take-off, the options comparison and
// one option's schedule, keyed by their settings, and the schedule's CSV address.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { takeoffQuery, type TakeoffSettings } from '../../../../shared/analysis/takeoff-settings';
import { type CompareAnswer, type ProjectTakeoffAnswer, type ScheduleAnswer } from '../../../../shared/schemas/schedule-api';
import { api } from '../../../lib/api';

export const scheduleKeys = {
  all: ['schedules'] as const,
  takeoffs: () => [...scheduleKeys.all, 'takeoff'] as const,
  takeoff: (projectId: string, query: string) => [...scheduleKeys.takeoffs(), projectId, query] as const,
  compares: () => [...scheduleKeys.all, 'compare'] as const,
  compare: (projectId: string, query: string) => [...scheduleKeys.compares(), projectId, query] as const,
  schedules: () => [...scheduleKeys.all, 'schedule'] as const,
  schedule: (optionId: string, query: string) => [...scheduleKeys.schedules(), optionId, query] as const,
};

/** The query string of the settings, plus the counted options when given. */
export function settingsQuery(settings: TakeoffSettings, countedOptionIds: readonly string[] = []): string {
  const query = takeoffQuery(settings);
  if (countedOptionIds.length === 0) return query;
  return `${query}&options=${encodeURIComponent([...countedOptionIds].sort().join(','))}`;
}

export const projectTakeoffQuery = (projectId: string, query: string) =>
  queryOptions({
    queryKey: scheduleKeys.takeoff(projectId, query),
    queryFn: () => api<ProjectTakeoffAnswer>(`/api/projects/${projectId}/takeoff?${query}`),
  });

export const compareQuery = (projectId: string, query: string) =>
  queryOptions({
    queryKey: scheduleKeys.compare(projectId, query),
    queryFn: () => api<CompareAnswer>(`/api/projects/${projectId}/compare?${query}`),
  });

export const scheduleQuery = (optionId: string, query: string) =>
  queryOptions({
    queryKey: scheduleKeys.schedule(optionId, query),
    queryFn: () => api<ScheduleAnswer>(`/api/options/${optionId}/schedule?${query}`),
  });

// The previous answer stays on screen while a changed setting is fetched, so typing does not flash.
export const useProjectTakeoff = (projectId: string, query: string) =>
  useQuery({ ...projectTakeoffQuery(projectId, query), placeholderData: keepPreviousData });
export const useCompare = (projectId: string, query: string) =>
  useQuery({ ...compareQuery(projectId, query), placeholderData: keepPreviousData });
export const useSchedule = (optionId: string, query: string) =>
  useQuery({ ...scheduleQuery(optionId, query), placeholderData: keepPreviousData });

/** Where the CSV of an option's schedule downloads from, with the same settings as the page. */
export const scheduleCsvUrl = (optionId: string, query: string) => `/api/options/${optionId}/schedule.csv?${query}`;
