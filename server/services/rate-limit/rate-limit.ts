// Rate limits counted in PostgreSQL, so every app instance sees the same counts. Each rule counts
// hits per key in fixed windows with one atomic upsert; the estimate weighs the previous window by
// how much of it still falls inside the sliding window (a "sliding window counter"), which keeps a
// burst at a window boundary from doubling the limit.
import { sql } from 'kysely';
import type { Response } from 'express';
import type { Db } from '../../db/database';
import { HttpError } from '../../http/errors';

export interface RateRule {
  /** Names the rule in the table; one per thing limited. */
  bucket: string;
  /** Hits allowed per window. */
  limit: number;
  windowMs: number;
}

export interface RateCheck {
  allowed: boolean;
  /** The weighted count, this hit included. */
  count: number;
  /** Whole seconds until the current window closes: the earliest a refused caller should retry. */
  retryAfterS: number;
}

/** Counts one hit of `key` under `rule` and says whether it is within the limit. A refused hit counts too. */
export async function hitRateLimit(db: Db, rule: RateRule, key: string, now = new Date()): Promise<RateCheck> {
  const windowStart = Math.floor(now.getTime() / rule.windowMs) * rule.windowMs;
  const current = new Date(windowStart);
  const previous = new Date(windowStart - rule.windowMs);
  const row = await db
    .insertInto('rate_limit_counts')
    .values({ bucket: rule.bucket, key, window_start: current, count: 1 })
    .onConflict((oc) => oc.columns(['bucket', 'key', 'window_start']).doUpdateSet({ count: sql`rate_limit_counts.count + 1` }))
    .returning('count')
    .executeTakeFirstOrThrow();
  const prior = await db
    .selectFrom('rate_limit_counts')
    .select('count')
    .where('bucket', '=', rule.bucket)
    .where('key', '=', key)
    .where('window_start', '=', previous)
    .executeTakeFirst();
  // The first hit of a window clears this key's windows that can no longer count.
  if (row.count === 1) {
    await db.deleteFrom('rate_limit_counts').where('bucket', '=', rule.bucket).where('key', '=', key).where('window_start', '<', previous).execute();
  }
  const elapsed = (now.getTime() - windowStart) / rule.windowMs;
  const count = row.count + (prior?.count ?? 0) * (1 - elapsed);
  return { allowed: count <= rule.limit, count, retryAfterS: Math.max(1, Math.ceil((windowStart + rule.windowMs - now.getTime()) / 1000)) };
}

/** Counts a hit and, over the limit, answers 429 with Retry-After and `message`. */
export async function enforceRateLimit(db: Db, res: Response, rule: RateRule, key: string, message: string): Promise<void> {
  const check = await hitRateLimit(db, rule, key);
  if (check.allowed) return;
  res.setHeader('Retry-After', String(check.retryAfterS));
  throw new HttpError(429, 'too_many', message);
}
