// The signed-in member, read by every feature (roles decide what is editable).
import { DEFAULT_MONEY, formatMoney, type MoneySettings } from '../../shared/units/money';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionInfo } from '../../shared/schemas/studio';
import { api, ApiError } from './api';

export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
  invite: (token: string) => [...sessionKeys.all, 'invite', token] as const,
};

export const sessionQuery = queryOptions({
  queryKey: sessionKeys.me(),
  queryFn: async (): Promise<SessionInfo | null> => {
    try {
      return await api<SessionInfo>('/api/auth/me');
    } catch (err) {
      if (err instanceof ApiError && err.status === 401) return null;
      throw err;
    }
  },
  staleTime: 60_000,
});

export const useSession = () => useQuery(sessionQuery);

/** The studio's currency and locale for every price on the screen (the demo's until the session is known). */
export function useMoney(): MoneySettings {
  const studio = useSession().data?.studio;
  return studio ? { currency: studio.currency, locale: studio.locale } : DEFAULT_MONEY;
}

/** Formats a price in the studio's currency and locale. */
export function useFormatMoney(): (value: number) => string {
  const money = useMoney();
  return (value) => formatMoney(value, money);
}

/** True for owners and designers; viewers see everything read-only. */
export function useCanEdit(): boolean {
  const role = useSession().data?.member.role;
  return role === 'owner' || role === 'designer';
}
