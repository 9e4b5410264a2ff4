// Production entry: listen, and shut down cleanly on SIGTERM / SIGINT.
import { loadConfig } from './config';
import { createDb } from './db/database';
import { migrateToLatest } from './db/migrate';
import { createSmtpMailer } from './services/mail/mailer';
import { createAppWithServices, type AppDeps } from './app';
import { closeServices } from './compose';
import { createLogger } from './services/logging/logger';
import { storageFromConfig } from './services/storage/from-config';

export async function startServer(env: NodeJS.ProcessEnv = process.env) {
  const config = loadConfig(env);
  const logger = createLogger({ level: config.logLevel });
  const db = createDb(config.DATABASE_URL, 10, logger);
  await migrateToLatest(db);
  const mailer = createSmtpMailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM });
  const deps: AppDeps = { db, mailer, config, logger, storage: storageFromConfig(config) };
  const { app, services } = createAppWithServices(deps);
  // Started now rather than on the first job: what an earlier run left queued is picked up at once.
  await services.jobs.start();
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const s = app.listen(config.PORT, config.HOST, () => resolve(s));
  });
  return {
    server,
    config,
    async close() {
      await new Promise<void>((r) => server.close(() => r()));
      server.closeAllConnections();
      await closeServices(services);
      await db.destroy();
      logger.flush();
    },
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startServer();
  console.log(`Parlour is listening on ${running.config.publicUrl}`);
  const stop = async () => {
    await running.close();
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}
