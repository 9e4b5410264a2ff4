// Model processing as queue jobs: normalising an upload (a model that cannot be read fails at once,
// with its reason; storage or the process going away is retried), and giving up on one that kept
// failing, which marks the model failed and removes its original.
import type { Db } from '../../db/database';
import type { Logger } from '../../services/logging/logger';
import type { FileStorage } from '../../services/storage/storage';
import type { JobKind } from '../../services/jobs/job-queue';
import { MODEL_JOB, runModelJob, type ModelJobData } from './models.service';
import { finishModelJob, getModelRowById } from './models.repository';

export const MODEL_GAVE_UP_JOB = 'piece-model-gave-up';

/**
 * Retried 3 times after 10–20 s, 20–40 s and 40–80 s; a run over 5 minutes has failed (a 25 MB model
 * normalises in well under a minute on this project's machine: see the README's Performance table).
 * One model at a time per working process: normalising holds the whole model in memory.
 */
export const MODEL_JOB_POLICY = { retryLimit: 3, retryDelaySeconds: 10, timeoutSeconds: 300, concurrency: 1 } as const;

export function modelJobKinds(deps: { db: Db; storage: FileStorage; logger: Logger }): JobKind<never>[] {
  const process: JobKind<ModelJobData> = {
    name: MODEL_JOB,
    policy: { ...MODEL_JOB_POLICY, deadLetter: MODEL_GAVE_UP_JOB },
    handler: (data) => runModelJob(deps.db, deps.storage, data.modelId),
  };
  const gaveUp: JobKind<ModelJobData> = {
    name: MODEL_GAVE_UP_JOB,
    policy: { retryLimit: 5, retryDelaySeconds: 10, timeoutSeconds: 60, concurrency: 1 },
    handler: async (data) => {
      const row = await getModelRowById(deps.db, data.modelId);
      const failed = await finishModelJob(deps.db, data.modelId, {
        status: 'failed',
        failure_reason: 'This model could not be processed after several tries. Upload it again.',
        source_key: null,
      });
      if (failed && row?.source_key) await deps.storage.delete(row.source_key).catch(() => undefined);
      if (failed) deps.logger.warn({ modelId: data.modelId }, 'model processing gave up');
    },
  };
  return [process, gaveUp] as JobKind<never>[];
}
