// The composition root: every service of an app is built here, once, from what the caller handed
// in. Routes receive the result (AppServices) and never build or look up a service themselves.
import type { AppDeps, AppServices } from './context';
import { createLogger } from './services/logging/logger';
import { dataDirStorage } from './services/storage/local-disk';
import { verifyPassword } from './services/auth/passwords';
import { createJobQueue } from './services/jobs/job-queue';
import { photoJobKinds } from './features/finishes/finishes.jobs';
import { mailJobKinds } from './features/outbox/mail-queue';
import { modelJobKinds } from './features/models/models.jobs';
import { UploadRoom } from './http/upload-room';
import { ClientLinkCache } from './features/presentations/client-cache';

export function createServices(deps: AppDeps): AppServices {
  const logger = deps.logger ?? createLogger({ level: deps.config.logLevel });
  const storage = deps.storage ?? dataDirStorage(deps.config.DATA_DIR);
  // The queue connects on first use (or when the server starts it), so an app that never sends a
  // job holds no extra connection.
  const jobs = createJobQueue({
    connectionString: deps.config.DATABASE_URL,
    logger,
    schema: deps.jobsSchema,
    work: deps.config.WORKERS > 0,
    maintenanceSeconds: deps.config.JOB_MAINTENANCE_SECONDS,
    kinds: [
      ...photoJobKinds({ db: deps.db, storage, logger }, Math.max(1, deps.config.WORKERS), deps.config.PHOTO_JOB_TIMEOUT_SECONDS),
      ...modelJobKinds({ db: deps.db, storage, logger }),
      ...mailJobKinds({ db: deps.db, mailer: deps.mailer, config: deps.config, logger }),
    ],
  });
  // The link cache opens its listening connection on first use, so an app that never serves a
  // presentation link holds no extra connection.
  const links = new ClientLinkCache(deps.db, deps.config.DATABASE_URL, logger);
  return {
    db: deps.db,
    mailer: deps.mailer,
    config: deps.config,
    storage,
    logger,
    verifyPassword: deps.verifyPassword ?? verifyPassword,
    jobs,
    links,
    uploads: new UploadRoom(deps.config.UPLOAD_MEMORY_MB * 1024 * 1024),
  };
}

/** Stops what the services hold open (the job queue, the link cache's connection and its pending counts). */
export async function closeServices(services: AppServices): Promise<void> {
  await services.jobs.stop();
  await services.links.close();
}
