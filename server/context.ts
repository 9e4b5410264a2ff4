// What the server is made of. A caller (server/index.ts, a test, a bench) hands createApp the
// outside world as AppDeps; server/compose.ts builds every service from it exactly once, as
// AppServices, and createApp hands that one object down to every route. Nothing below imports the app.
import type { AppConfig } from './config';
import type { Db } from './db/database';
import type { Mailer } from './services/mail/mailer';
import type { FileStorage } from './services/storage/storage';
import type { Logger } from './services/logging/logger';
import type { PasswordVerifier } from './services/auth/passwords';
import type { JobQueue } from './services/jobs/job-queue';
import type { ClientLinkCache } from './features/presentations/client-cache';
import type { UploadRoom } from './http/upload-room';

/** The outside world a server is started with. */
export interface AppDeps {
  db: Db;
  mailer: Mailer;
  config: AppConfig;
  /** Where photos and textures are kept; DATA_DIR/files on local disk when not given. */
  storage?: FileStorage;
  /** Structured logs; a logger at the configured level on stdout when not given. */
  logger?: Logger;
  /** Checks a password at sign-in; scrypt when not given (tests count the calls). */
  verifyPassword?: PasswordVerifier;
  /** The job queue's schema; `pgboss` when not given (each test app has its own). */
  jobsSchema?: string;
}

/** Every service of one running app, built once by createServices (server/compose.ts). */
export interface AppServices {
  db: Db;
  mailer: Mailer;
  config: AppConfig;
  storage: FileStorage;
  /** The process logger; a request's own (with its id) is `ctx.log` in a route. */
  logger: Logger;
  verifyPassword: PasswordVerifier;
  /** Work off the request path (photo processing, mail nobody waits for), in PostgreSQL: see server/services/jobs. */
  jobs: JobQueue;
  /** Presentation answers kept ready per link on this instance. */
  links: ClientLinkCache;
  /** Memory uploads may hold on this instance while they are checked (UPLOAD_MEMORY_MB). */
  uploads: UploadRoom;
}
