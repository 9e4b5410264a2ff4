// Photo processing as queue jobs: the kinds the job queue runs for finishes (process a photo; give
// up on one that kept failing), their retry and time-out policy, and how a finish sends its job.
import type { Db } from '../../db/database';
import type { Logger } from '../../services/logging/logger';
import type { FileStorage } from '../../services/storage/storage';
import type { JobKind } from '../../services/jobs/job-queue';
import { failureReason, PHOTO_JOB, runPhotoJob, type PhotoJobData } from './finishes.service';
import { finishJobIfCurrent } from './finishes.repository';

/** Where a photo job goes once it has failed for good: it marks the finish failed. */
export const PHOTO_GAVE_UP_JOB = 'photo-gave-up';

/**
 * Photo jobs: a photo that could not be decoded fails at once (processing it again would fail the
 * same way); anything else (storage or database away, the process killed) is retried 3 times,
 * after 10–20 s, 20–40 s and 40–80 s. A run taking over 3 minutes (PHOTO_JOB_TIMEOUT_SECONDS) has
 * failed (a 12 MP photo takes a few seconds; the pixel limit's largest well under a minute).
 */
export const PHOTO_JOB_POLICY = { retryLimit: 3, retryDelaySeconds: 10, timeoutSeconds: 180 } as const;

const errorMessage = (output: unknown): string =>
  output && typeof output === 'object' && 'message' in output ? String(output.message) : 'the job failed';

/** The finishes' job kinds; `concurrency` photos are processed at once by a working process. */
export function photoJobKinds(
  deps: { db: Db; storage: FileStorage; logger: Logger },
  concurrency: number,
  timeoutSeconds: number = PHOTO_JOB_POLICY.timeoutSeconds,
): JobKind<never>[] {
  const process: JobKind<PhotoJobData> = {
    name: PHOTO_JOB,
    policy: { ...PHOTO_JOB_POLICY, timeoutSeconds, concurrency, deadLetter: PHOTO_GAVE_UP_JOB },
    handler: (data) => runPhotoJob(deps.db, deps.storage, data.finishId, data.revision),
  };
  const gaveUp: JobKind<PhotoJobData> = {
    name: PHOTO_GAVE_UP_JOB,
    policy: { retryLimit: 5, retryDelaySeconds: 10, timeoutSeconds: 60, concurrency: 1 },
    handler: async (data, run) => {
      const reason = failureReason(new Error(errorMessage(run.output)));
      const failed = await finishJobIfCurrent(deps.db, data.finishId, data.revision, {
        status: 'failed',
        failure_reason: reason,
      });
      if (failed) deps.logger.warn({ finishId: data.finishId, reason: errorMessage(run.output) }, 'photo processing gave up');
    },
  };
  return [process, gaveUp] as JobKind<never>[];
}
