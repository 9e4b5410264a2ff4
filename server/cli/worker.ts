// npm run worker: a process that only works the job queue (photo processing, queued mail) for app
// instances started with WORKERS=0; as many as wanted, on any machine that reaches the database and
// the file store. Stops cleanly on SIGTERM / SIGINT, giving back what it could not finish.
import { loadConfig } from '../config';
import { createDb } from '../db/database';
import { migrateToLatest } from '../db/migrate';
import { createServices, closeServices } from '../compose';
import { createLogger } from '../services/logging/logger';
import { createSmtpMailer } from '../services/mail/mailer';
import { storageFromConfig } from '../services/storage/from-config';

export async function startWorker(env: NodeJS.ProcessEnv = process.env) {
  const loaded = loadConfig(env);
  // A worker works: WORKERS=0 (meant for app instances) still gives one.
  const config = { ...loaded, WORKERS: Math.max(1, loaded.WORKERS) };
  const logger = createLogger({ level: config.logLevel });
  const db = createDb(config.DATABASE_URL, 4, logger);
  await migrateToLatest(db);
  const mailer = createSmtpMailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM });
  const services = createServices({ db, mailer, config, logger, storage: storageFromConfig(config) });
  await services.jobs.start();
  return {
    config,
    async close() {
      await closeServices(services);
      await db.destroy();
      logger.flush();
    },
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startWorker();
  console.log(`Parlour worker: ${running.config.WORKERS} photo(s) at a time, and queued mail`);
  const stop = async () => {
    await running.close();
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}
