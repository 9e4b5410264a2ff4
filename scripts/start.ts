// npm start: local PostgreSQL, mail stand-in, migrations, demo data, client build, server.
import { join, resolve } from 'node:path';
import { spawn } from 'node:child_process';
import { clusterUrl, ensureDatabase, startCluster, stopCluster, type ClusterOptions } from './lib/postgres';
import { buildClientIfStale } from './lib/build-client';
import { startStandInSmtp } from '../server/services/mail/stand-in-smtp';
import { startServer } from '../server/index';
import { createDb } from '../server/db/database';
import { migrateToLatest } from '../server/db/migrate';
import { seedDemo, DEMO_SIGN_IN } from '../server/cli/seed';

const root = resolve(import.meta.dirname, '..');
const dev = process.argv.includes('--dev');
const dataDir = resolve(process.env.DATA_DIR ?? join(root, 'data'));
const cluster: ClusterOptions = {
  dataDir: join(dataDir, 'pg'),
  port: Number(process.env.PG_PORT ?? 5481),
  fsync: true, // data must survive a crash
};

async function main() {
  let startedDb = false;
  let databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    startedDb = startCluster(cluster);
    await ensureDatabase(cluster, 'parlour');
    databaseUrl = clusterUrl(cluster, 'parlour');
  }
  const db = createDb(databaseUrl, 2);
  await migrateToLatest(db);
  const seeded = await seedDemo(db);
  await db.destroy();

  const smtpPort = Number(process.env.SMTP_PORT ?? 5482);
  const outboxDir = process.env.OUTBOX_DIR ?? join(dataDir, 'outbox');
  const smtp = process.env.SMTP_HOST ? null : await startStandInSmtp({ port: smtpPort, dir: outboxDir });

  if (!dev) buildClientIfStale(root);
  const port = Number(process.env.PORT ?? 5480);
  const app = await startServer({
    ...process.env,
    DATABASE_URL: databaseUrl,
    PORT: String(port),
    SMTP_PORT: String(smtpPort),
    OUTBOX_DIR: smtp ? outboxDir : process.env.OUTBOX_DIR,
    DATA_DIR: dataDir,
    CLIENT_DIST: join(root, 'dist'),
  });

  let vite: ReturnType<typeof spawn> | null = null;
  if (dev) {
    vite = spawn(process.execPath, [join(root, 'node_modules/vite/bin/vite.js'), '--port', '5173', '--strictPort'], {
      cwd: root,
      stdio: 'inherit',
      env: { ...process.env, PORT: String(port) },
    });
  }

  const url = dev ? 'http://127.0.0.1:5173' : app.config.publicUrl;
  console.log('');
  console.log(`  Parlour is running at ${url}`);
  console.log(`  Demo sign-in: ${DEMO_SIGN_IN.email} / ${DEMO_SIGN_IN.password}${seeded ? ' (demo data created)' : ''}`);
  if (smtp) console.log(`  Mail goes to the stand-in SMTP server on 127.0.0.1:${smtp.port}; read it on the Outbox page.`);
  if (startedDb) console.log(`  PostgreSQL: ${clusterUrl(cluster, 'parlour')} (data in ${cluster.dataDir})`);
  console.log('  Press Ctrl-C to stop.');

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    console.log('\nParlour: stopping…');
    vite?.kill('SIGTERM');
    await app.close().catch(() => undefined);
    await smtp?.close().catch(() => undefined);
    if (startedDb) {
      try {
        stopCluster(cluster);
      } catch (err) {
        console.error(String(err));
      }
    }
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error(`Parlour could not start: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
