// The app's job queue: work that runs off the request path (photo processing, mail nobody waits
// for) kept in PostgreSQL by pg-boss, in a schema of its own next to the app's tables. Jobs survive
// restarts, are retried with backoff, time out, and any process that works the queue picks them up.
import PgBoss from 'pg-boss';
import { CompiledQuery } from 'kysely';
import type { Db } from '../../db/database';
import type { Logger } from '../logging/logger';

/** The schema pg-boss creates and keeps its tables in (the app's own tables stay in `public`). */
export const JOBS_SCHEMA = 'pgboss';
/** How often an idle worker asks for work; a job sent by this process wakes its workers at once. */
const POLL_SECONDS = 2;
/** How often one of the processes (whichever gets there first) fails timed-out jobs and tidies up. */
const MAINTENANCE_SECONDS = 30;
/** Finished jobs are kept this long to be looked at, then deleted. */
const KEEP_DONE_SECONDS = 24 * 60 * 60;
const KEEP_DELETED_DAYS = 7;
/** A process stopping waits this long for the jobs it is running before it gives them back. */
const STOP_WAIT_MS = 15_000;
/** Connections the queue holds at most, beside the app's own pool. */
const POOL_SIZE = 3;

/** How one kind of job is run, retried and timed out. */
export interface JobPolicy {
  /** Runs again after the first one fails; after the last, the job fails for good. */
  retryLimit: number;
  /**
   * Seconds before the first retry. With backoff each later retry waits about twice as long as
   * the one before: retry n waits between delay × 2^(n−1) and delay × 2^n seconds.
   */
  retryDelaySeconds: number;
  /** A run still going after this long has failed, and is retried (a killed process's job comes back after it). */
  timeoutSeconds: number;
  /** Jobs of this kind one working process runs at once. */
  concurrency: number;
  /** Where a job that failed for good goes (with its data and last error), to be finished off there. */
  deadLetter?: string;
}

export interface JobRun {
  id: string;
  /** 0 on the first run, 1 on the first retry… */
  retryCount: number;
  retryLimit: number;
  /** What the last run left: pg-boss's error object for a job that failed for good. */
  output: unknown;
}

export type JobHandler<T> = (data: T, run: JobRun) => Promise<void>;

export interface JobQueue {
  /** Installs or updates the schema, makes the queues and, when this process works, starts its workers. */
  start(): Promise<void>;
  /** Stops taking jobs, waits a while for the running ones, and closes the connections. */
  stop(): Promise<void>;
  /**
   * Queues a job of a defined kind (starting the queue when needed). With `db` a transaction, the
   * job is part of it: it exists only if the transaction commits; call `wake` after the commit.
   */
  send(name: string, data: object, opts?: { db?: Db }): Promise<void>;
  /** Tells this process's workers of `name` to look for work now rather than at their next poll. */
  wake(name: string): void;
}

export interface JobKind<T = never> {
  name: string;
  policy: JobPolicy;
  handler: JobHandler<T>;
}

/** pg-boss's statements run on a Kysely connection, so a job can be sent inside an app transaction. */
function onKysely(db: Db): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const result = await db.executeQuery(CompiledQuery.raw(text, values as unknown[]));
      return { rows: result.rows as unknown[] as never[] };
    },
  };
}

export function createJobQueue(opts: {
  connectionString: string;
  logger: Logger;
  /** Every kind of job this app sends or works. */
  kinds: JobKind<never>[];
  /** False on an app instance that leaves the work to worker processes: it only sends. */
  work: boolean;
  schema?: string;
  /** How often pg-boss looks for jobs that ran out of time; MAINTENANCE_SECONDS unless set. */
  maintenanceSeconds?: number;
}): JobQueue {
  const { logger } = opts;
  const schema = opts.schema ?? JOBS_SCHEMA;
  const kinds = new Map(opts.kinds.map((k) => [k.name, k]));
  const workerIds = new Map<string, string[]>();
  let boss: PgBoss | null = null;
  let starting: Promise<void> | null = null;
  let stopped = false;

  const begin = async () => {
    const b = new PgBoss({
      connectionString: opts.connectionString,
      schema,
      max: POOL_SIZE,
      application_name: 'parlour-jobs',
      schedule: false,
      supervise: true,
      maintenanceIntervalSeconds: opts.maintenanceSeconds ?? MAINTENANCE_SECONDS,
      archiveCompletedAfterSeconds: KEEP_DONE_SECONDS,
      deleteAfterDays: KEEP_DELETED_DAYS,
    });
    b.on('error', (err) => logger.error({ err }, 'job queue error'));
    await b.start();
    // Dead-letter queues first: a queue names its dead letter, which must exist.
    const ordered = [...kinds.values()].sort(
      (x, y) => Number(Boolean(x.policy.deadLetter)) - Number(Boolean(y.policy.deadLetter)),
    );
    for (const k of ordered) {
      const queue = {
        name: k.name,
        retryLimit: k.policy.retryLimit,
        retryDelay: k.policy.retryDelaySeconds,
        retryBackoff: true,
        expireInSeconds: k.policy.timeoutSeconds,
        ...(k.policy.deadLetter ? { deadLetter: k.policy.deadLetter } : {}),
      };
      await b.createQueue(k.name, queue);
      // A queue made by an earlier version keeps its old settings unless told the current ones.
      await b.updateQueue(k.name, queue);
    }
    if (opts.work) {
      for (const k of ordered) {
        const ids: string[] = [];
        for (let i = 0; i < k.policy.concurrency; i += 1) {
          // pg-boss waits a polling interval after every batch, even a full one: a worker that has
          // just done a job tells itself to look again at once, so a queue of work drains
          // back to back (one job per interval otherwise) and the interval only applies when idle.
          let self = '';
          self = await b.work<unknown>(
            k.name,
            { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: POLL_SECONDS },
            async ([job]) => {
              try {
                await k.handler(job.data as never, {
                  id: job.id,
                  retryCount: job.retryCount,
                  retryLimit: job.retryLimit,
                  output: job.output,
                });
              } catch (err) {
                const last = job.retryCount >= job.retryLimit;
                logger.warn(
                  { err, job: k.name, jobId: job.id, retryCount: job.retryCount },
                  last ? 'job failed for good' : 'job failed, will retry',
                );
                throw err;
              } finally {
                if (self) b.notifyWorker(self);
              }
            },
          );
          ids.push(self);
        }
        workerIds.set(k.name, ids);
      }
    }
    boss = b;
  };

  const start = (): Promise<void> => {
    if (stopped) return Promise.reject(new Error('The job queue is stopped.'));
    // A failed start (the database away) is tried again by the next caller.
    starting ??= begin().catch((err: unknown) => {
      starting = null;
      throw err;
    });
    return starting;
  };

  return {
    start,
    async stop() {
      stopped = true;
      const pending = starting;
      if (!pending) return;
      await pending.catch(() => undefined);
      await boss?.stop({ graceful: true, wait: true, timeout: STOP_WAIT_MS });
      boss = null;
    },
    async send(name, data, sendOpts = {}) {
      if (!kinds.has(name)) throw new Error(`No job kind named ${name}.`);
      await start();
      await boss!.send(name, data, sendOpts.db ? { db: onKysely(sendOpts.db) } : {});
      if (!sendOpts.db) this.wake(name);
    },
    wake(name) {
      for (const id of workerIds.get(name) ?? []) boss?.notifyWorker(id);
    },
  };
}
