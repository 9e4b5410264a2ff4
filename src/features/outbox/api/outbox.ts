// Query hooks for the Outbox: the studio's sent mail page by page, and one message.
import { infiniteQueryOptions, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { OutboxMessage, OutboxPage } from '../../../../shared/schemas/outbox';
import { api } from '../../../lib/api';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  detail: (id: string) => [...outboxKeys.all, 'detail', id] as const,
};

/** The studio's sent mail, newest first, one page at a time; the pages already shown are refreshed while it is open. */
export const useOutbox = () =>
  useInfiniteQuery(
    infiniteQueryOptions({
      queryKey: outboxKeys.list(),
      queryFn: ({ pageParam }) =>
        api<OutboxPage>(pageParam ? `/api/outbox?before=${encodeURIComponent(pageParam)}` : '/api/outbox'),
      initialPageParam: '',
      getNextPageParam: (last) => last.next ?? undefined,
      refetchInterval: 5000,
    }),
  );
export const useOutboxMessage = (id: string) =>
  useQuery(
    queryOptions({ queryKey: outboxKeys.detail(id), queryFn: () => api<{ message: OutboxMessage }>(`/api/outbox/${id}`) }),
  );
