// What every part of the server is handed: the database, mail, configuration and the shared
// services. createApp (app.ts) is the one place that fills it; nothing below imports the app.
import type { AppConfig } from './config';
import type { Db } from './db/database';
import type { Mailer } from './services/mail/mailer';
import type { FileStorage } from './services/storage/storage';
import type { Logger } from './services/logging/logger';
import type { PasswordVerifier } from './services/auth/passwords';

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
}
