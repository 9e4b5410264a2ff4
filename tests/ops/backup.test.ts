// npm run backup and npm run restore round-trip the demo studio: seeded into a throwaway database,
// backed up, restored into another empty database and data folder; every table's row count, every
// file's bytes, the presentation key and the job queue's waiting work come back, and the restored copy signs in.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative, resolve } from 'node:path';
import pg from 'pg';
import request from 'supertest';
import { createDb, type Db } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { seedDemo, DEMO_SIGN_IN } from '../../server/cli/seed';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { tableCounts } from '../../scripts/lib/data-target';
import { createJobQueue, JOBS_SCHEMA } from '../../server/services/jobs/job-queue';
import { createLogger } from '../../server/services/logging/logger';
import { siblingDatabase, type SiblingDatabase } from './lib/sibling-database';

const root = resolve(import.meta.dirname, '../..');
const SCRIPT_TIMEOUT_MS = 60_000;

function tsx(script: string, args: string[], env: Record<string, string>) {
  const res = spawnSync(process.execPath, [join(root, 'node_modules/tsx/dist/cli.mjs'), join(root, script), ...args], {
    cwd: root,
    env: { PATH: process.env.PATH ?? '', ...env },
    encoding: 'utf8',
    timeout: SCRIPT_TIMEOUT_MS,
  });
  return { status: res.status, out: `${res.stdout}${res.stderr}` };
}

function fileHashes(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of readdirSync(dir, { recursive: true, withFileTypes: true })) {
    if (e.isFile())
      out[relative(dir, join(e.parentPath, e.name))] = createHash('sha256')
        .update(readFileSync(join(e.parentPath, e.name)))
        .digest('hex');
  }
  return out;
}

async function counts(url: string) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await tableCounts((text) => client.query(text));
  } finally {
    await client.end();
  }
}

const scratch = mkdtempSync(join(tmpdir(), 'parlour-backup-test-'));
const sourceDir = join(scratch, 'source');
const restoredDir = join(scratch, 'restored');
const archive = join(scratch, 'demo.tar.gz');
let source: SiblingDatabase;
let target: SiblingDatabase;

beforeAll(async () => {
  // Two databases of this test's own: the restore needs an empty one.
  source = await siblingDatabase(inject('databaseUrl'), 'parlour_backup_src');
  target = await siblingDatabase(inject('databaseUrl'), 'parlour_backup_dst');
  const db = createDb(source.url, 2);
  await migrateToLatest(db);
  const dataDir = process.env.DATA_DIR;
  process.env.DATA_DIR = sourceDir; // the demo's photos go to this data folder's store
  try {
    expect(await seedDemo(db)).toBe(true);
  } finally {
    if (dataDir === undefined) delete process.env.DATA_DIR;
    else process.env.DATA_DIR = dataDir;
    await db.destroy();
  }
  // Work waiting on the job queue at the time of the backup (as a photo or a mail would leave it):
  // the queue's schema is backed up with the app's tables, so a restored copy finishes that work.
  const jobs = createJobQueue({
    connectionString: source.url,
    logger: createLogger({ level: 'warn' }),
    kinds: [
      {
        name: 'mail',
        policy: { retryLimit: 1, retryDelaySeconds: 1, timeoutSeconds: 60, concurrency: 1 },
        handler: async () => {},
      },
    ],
    work: false,
  });
  await jobs.send('mail', { mailId: 'waiting-at-backup-time' });
  await jobs.stop();
  // A start writes the link key beside the files; the backup must carry it.
  loadConfig({ DATABASE_URL: source.url, DATA_DIR: sourceDir });
}, 120_000);

afterAll(async () => {
  await source?.drop();
  await target?.drop();
  rmSync(scratch, { recursive: true, force: true });
});

describe('backup and restore', () => {
  it('round-trips the demo studio: rows, files and the link key', async () => {
    const started = Date.now();
    const backup = tsx('scripts/backup.ts', ['--out', archive], { DATABASE_URL: source.url, DATA_DIR: sourceDir });
    expect(backup.status, backup.out).toBe(0);
    const backupMs = Date.now() - started;
    expect(statSync(archive).mode & 0o777).toBe(0o600);
    console.log(`[backup] ${statSync(archive).size} bytes in ${backupMs} ms: ${backup.out.trim()}`);

    const restore = tsx('scripts/restore.ts', [archive], { DATABASE_URL: target.url, DATA_DIR: restoredDir });
    expect(restore.status, restore.out).toBe(0);

    const [before, after] = await Promise.all([counts(source.url), counts(target.url)]);
    expect(after).toEqual(before);
    expect(before.members).toBe(3);
    expect(before.finish_files).toBeGreaterThan(0);
    const files = fileHashes(join(sourceDir, 'files'));
    expect(Object.keys(files).length).toBeGreaterThan(10);
    expect(fileHashes(join(restoredDir, 'files'))).toEqual(files);
    expect(readFileSync(join(restoredDir, 'presentation-key'), 'utf8')).toBe(
      readFileSync(join(sourceDir, 'presentation-key'), 'utf8'),
    );
    expect(statSync(join(restoredDir, 'presentation-key')).mode & 0o777).toBe(0o600);
    // The job queue's schema came back with its waiting job.
    const client = new pg.Client({ connectionString: target.url });
    await client.connect();
    try {
      const waiting = await client.query(
        `select name, data->>'mailId' as mail_id, state from ${JOBS_SCHEMA}.job where name = 'mail'`,
      );
      expect(waiting.rows).toEqual([{ name: 'mail', mail_id: 'waiting-at-backup-time', state: 'created' }]);
    } finally {
      await client.end();
    }
  });

  it('gives a restored copy that signs in and serves the demo’s files', async () => {
    const db: Db = createDb(target.url, 2);
    try {
      await migrateToLatest(db); // nothing to do: the migration record came back too
      const app = createApp({
        db,
        mailer: { send: async () => undefined },
        config: loadConfig({ DATABASE_URL: target.url, DATA_DIR: restoredDir, NODE_ENV: 'test', CLIENT_DIST: '/nonexistent' }),
      });
      const agent = request.agent(app);
      expect((await agent.post('/api/auth/sign-in').send(DEMO_SIGN_IN)).status).toBe(200);
      const finishes = (await agent.get('/api/finishes')).body.finishes as { files?: { swatchUrl: string | null } }[];
      const swatch = finishes.find((f) => f.files?.swatchUrl)?.files?.swatchUrl;
      expect(swatch).toBeTruthy();
      const file = await agent.get(swatch!);
      expect(file.status).toBe(200);
    } finally {
      await db.destroy();
    }
  });

  it('refuses to restore over data that is already there, and changes nothing', async () => {
    const before = await counts(target.url);
    const again = tsx('scripts/restore.ts', [archive], { DATABASE_URL: target.url, DATA_DIR: restoredDir });
    expect(again.status).toBe(1);
    expect(again.out).toMatch(/already has tables: restore needs an empty one/);
    expect(await counts(target.url)).toEqual(before);
    const missing = tsx('scripts/restore.ts', [join(scratch, 'nope.tar.gz')], {
      DATABASE_URL: target.url,
      DATA_DIR: restoredDir,
    });
    expect(missing.status).toBe(1);
    expect(missing.out).toMatch(/no such file/);
    expect(existsSync(join(restoredDir, 'files'))).toBe(true);
  });
});
