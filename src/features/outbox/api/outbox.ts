import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';

export interface OutboxSummary { id: string; from: string; to: string; subject: string; receivedAt: string; preview: string }
export interface OutboxMessage { id: string; from: string; to: string; subject: string; text: string; html: string | null; receivedAt: string }

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  detail: (id: string) => [...outboxKeys.all, 'detail', id] as const,
};

export const useOutbox = () =>
  useQuery(queryOptions({ queryKey: outboxKeys.list(), queryFn: () => api<{ messages: OutboxSummary[] }>('/api/outbox'), refetchInterval: 3000 }));
export const useOutboxMessage = (id: string) =>
  useQuery(queryOptions({ queryKey: outboxKeys.detail(id), queryFn: () => api<{ message: OutboxMessage }>(`/api/outbox/${id}`) }));
