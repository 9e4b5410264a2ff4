// A worker killed in the middle of a photo job: the app instance leaves processing to workers
// (WORKERS=0), a worker process takes the job and is killed with SIGKILL while the job runs. The
// finish stays `processing` (never half-written), and once the job has run out of time a second
// worker takes it again and the finish comes out ready, with every derived file served.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import pg from 'pg';
import sharp from 'sharp';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { startServer } from '../../server/index';
import { startWorker } from '../../server/cli/worker';
import { PHOTO_JOB } from '../../server/features/finishes/finishes.service';
import { JOBS_SCHEMA } from '../../server/services/jobs/job-queue';
import { freePort } from '../../scripts/lib/throwaway-cluster';
import { siblingDatabase, type SiblingDatabase } from './lib/sibling-database';

const root = resolve(import.meta.dirname, '../..');
/** The shortest time-out the config accepts: the killed worker's job is taken again after it. */
const JOB_TIMEOUT_SECONDS = 10;
/** Time-out, a maintenance pass (every second here) and the first retry's 10–20 s, with room to spare. */
const RECOVERY_WAIT_MS = 90_000;
const WORKER_READY_MS = 30_000;

type Instance = Awaited<ReturnType<typeof startServer>>;
let database: SiblingDatabase;
let app: Instance;
let cookie = '';
let killed: ChildProcess | null = null;
let second: Awaited<ReturnType<typeof startWorker>> | null = null;
const scratch = mkdtempSync(join(tmpdir(), 'parlour-worker-crash-'));

const env = (port: number): Record<string, string> => ({
  DATABASE_URL: database.url,
  HOST: '127.0.0.1',
  PORT: String(port),
  DATA_DIR: join(scratch, 'data'),
  CLIENT_DIST: '/nonexistent',
  PRESENTATION_KEY: 'c4'.repeat(32),
  NODE_ENV: 'production',
  LOG_LEVEL: 'silent',
  PHOTO_JOB_TIMEOUT_SECONDS: String(JOB_TIMEOUT_SECONDS),
  JOB_MAINTENANCE_SECONDS: '1',
});

async function call(method: string, path: string, body?: unknown) {
  const isForm = body instanceof FormData;
  const res = await fetch(`${app.config.publicUrl}${path}`, {
    method,
    headers: { ...(isForm || body === undefined ? {} : { 'content-type': 'application/json' }), ...(cookie ? { cookie } : {}) },
    body: isForm ? body : body === undefined ? undefined : JSON.stringify(body),
  });
  if (res.headers.get('set-cookie')) cookie = res.headers.get('set-cookie')!.split(';')[0];
  return { status: res.status, body: (await res.json().catch(() => ({}))) as Record<string, unknown> };
}

/** A worker process of its own (npm run worker), resolved once it says it is working. */
function startWorkerProcess(): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server/cli/worker.ts')], {
    cwd: root,
    env: { PATH: process.env.PATH ?? '', ...env(0) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  return new Promise((res, rej) => {
    const timer = setTimeout(() => rej(new Error('the worker did not start')), WORKER_READY_MS);
    child.stdout!.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('Parlour worker')) {
        clearTimeout(timer);
        res(child);
      }
    });
    child.once('exit', (code) => rej(new Error(`the worker exited with ${code}`)));
  });
}

async function jobOf(finishId: string): Promise<{ state: string; retry_count: number } | undefined> {
  const client = new pg.Client({ connectionString: database.url });
  await client.connect();
  try {
    const { rows } = await client.query(
      `select state, retry_count from ${JOBS_SCHEMA}.job where name = $1 and data->>'finishId' = $2`,
      [PHOTO_JOB, finishId],
    );
    return rows[0] as { state: string; retry_count: number } | undefined;
  } finally {
    await client.end();
  }
}

beforeAll(async () => {
  database = await siblingDatabase(inject('databaseUrl'), 'parlour_worker_crash');
  const db = createDb(database.url, 1);
  await migrateToLatest(db);
  await db.destroy();
  app = await startServer({ ...env(await freePort()), WORKERS: '0' });
  const signUp = await call('POST', '/api/auth/sign-up', {
    studioName: 'Crash Studio',
    name: 'Cas Crash',
    email: 'crash@test.parlour',
    password: 'a-long-crash-password',
  });
  expect(signUp.status).toBe(201);
}, 60_000);

afterAll(async () => {
  killed?.kill('SIGKILL');
  await second?.close();
  await app?.close();
  await database?.drop();
  rmSync(scratch, { recursive: true, force: true });
});

describe('a worker killed mid-job', () => {
  it('leaves the finish processing, and a second worker finishes it once the job has run out of time', async () => {
    // A large photo (36 MP, near the 40 MP limit), so the job runs long enough to be caught running.
    const photo = await sharp({ create: { width: 6000, height: 6000, channels: 3, background: { r: 120, g: 96, b: 70 } } })
      .jpeg()
      .toBuffer();
    killed = await startWorkerProcess();
    const form = new FormData();
    form.append('photos', new Blob([photo], { type: 'image/jpeg' }), 'walnut.jpg');
    const uploaded = await call('POST', '/api/finishes/photos', form);
    expect(uploaded.status).toBe(201);
    const id = (uploaded.body.finishes as { id: string }[])[0].id;

    // Killed as soon as its job is running.
    const until = Date.now() + WORKER_READY_MS;
    while ((await jobOf(id))?.state !== 'active' && Date.now() < until) await new Promise((r) => setTimeout(r, 5));
    killed.kill('SIGKILL');
    await new Promise((r) => killed!.once('exit', r));
    killed = null;
    expect((await jobOf(id))?.state).toBe('active');
    const half = (await call('GET', `/api/finishes/${id}`)).body.finish as { status: string };
    expect(half.status).toBe('processing');

    second = await startWorker(env(0));
    const recovered = Date.now() + RECOVERY_WAIT_MS;
    let finish = half as { status: string; files: { swatchUrl: string | null } };
    while (finish.status === 'processing' && Date.now() < recovered) {
      await new Promise((r) => setTimeout(r, 250));
      finish = (await call('GET', `/api/finishes/${id}`)).body.finish as typeof finish;
    }
    expect(finish.status).toBe('ready');
    // The second run was a retry of the same job, not a new one.
    expect((await jobOf(id))?.retry_count).toBeGreaterThanOrEqual(1);
    expect((await call('GET', finish.files.swatchUrl!)).status).toBe(200);
  }, 150_000);
});
