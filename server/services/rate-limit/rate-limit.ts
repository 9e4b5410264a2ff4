// Rate limits counted in PostgreSQL, so every app instance sees the same counts. Each rule counts
// hits per key in fixed windows with one atomic upsert; the estimate weighs the previous window by
// how much of it still falls inside the sliding window (a "sliding window counter"), which keeps a
// burst at a window boundary from doubling the limit.
import { sql } from 'kysely';
import type { Db } from '../../db/database';
import { tooManyRequests } from '../../http/errors';

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
  /** Whole seconds until a new hit would be allowed again (1 when it is allowed now). */
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
    await db
      .deleteFrom('rate_limit_counts')
      .where('bucket', '=', rule.bucket)
      .where('key', '=', key)
      .where('window_start', '<', previous)
      .execute();
  }
  const priorCount = prior?.count ?? 0;
  const elapsed = (now.getTime() - windowStart) / rule.windowMs;
  const count = row.count + priorCount * (1 - elapsed);
  const allowed = count <= rule.limit;
  return {
    allowed,
    count,
    retryAfterS: allowed ? 1 : secondsUntilAllowed(rule, windowStart, now.getTime(), row.count, priorCount),
  };
}

/**
 * When the next hit's estimate falls back within the limit: later in this window, as the previous
 * window weighs less (current + 1 + prior·(1 − e) ≤ limit), or else in the next one, where this
 * window becomes the weighed one (1 + current·(1 − e) ≤ limit).
 */
function secondsUntilAllowed(rule: RateRule, windowStart: number, nowMs: number, current: number, prior: number): number {
  const w = rule.windowMs;
  const at =
    prior > 0 && current + 1 <= rule.limit
      ? windowStart + w * (1 - (rule.limit - current - 1) / prior)
      : windowStart + w + w * Math.max(0, 1 - (rule.limit - 1) / current);
  return Math.max(1, Math.ceil((at - nowMs) / 1000));
}

/** Forgets every count of `key` under `rule` (a right password clears that e-mail's attempts). */
export async function clearRateLimit(db: Db, rule: RateRule, key: string): Promise<void> {
  await db.deleteFrom('rate_limit_counts').where('bucket', '=', rule.bucket).where('key', '=', key).execute();
}

/** The refusal's message: fixed, or worded from how long the caller has to wait. */
export type RateMessage = string | ((retryAfterS: number) => string);

function refuse(check: RateCheck, message: RateMessage): never {
  throw tooManyRequests(typeof message === 'string' ? message : message(check.retryAfterS), check.retryAfterS);
}

/** Counts a hit and, over the limit, answers 429 with Retry-After and `message`. */
export async function enforceRateLimit(db: Db, rule: RateRule, key: string, message: RateMessage): Promise<void> {
  const check = await hitRateLimit(db, rule, key);
  if (!check.allowed) refuse(check, message);
}

export interface RateHit {
  rule: RateRule;
  key: string;
  message: RateMessage;
}

/**
 * Counts a hit under every rule in one transaction: all are within their limits and counted, or
 * the first that is not answers 429 and none is counted (a mail refused for its recipient does not
 * use up the studio's allowance).
 */
export async function enforceRateLimits(db: Db, hits: RateHit[]): Promise<void> {
  await db.transaction().execute(async (trx) => {
    for (const hit of hits) {
      const check = await hitRateLimit(trx, hit.rule, hit.key);
      if (!check.allowed) refuse(check, hit.message);
    }
  });
}

/** "3 minutes", "2 hours": a wait in the words a person reads. */
export function waitInWords(seconds: number): string {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  if (minutes < 90) return `${minutes} minute${minutes === 1 ? '' : 's'}`;
  const hours = Math.ceil(minutes / 60);
  return `${hours} hours`;
}
