// Growing past one machine: two app instances on different ports against one database and one
// S3-compatible store (s3rver on loopback). A session started on one continues on the other, a
// photo uploaded through one is served by the other from the bucket, a client link works on
// either and a withdrawal on one stops it on the other, and rate limits count across both. Both
// leave photo processing to a worker: a photo uploaded through an instance killed straight after
// is processed all the same.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import sharp from 'sharp';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { startServer } from '../../server/index';
import { startWorker } from '../../server/cli/worker';
import { startServerProcess } from '../../scripts/lib/server-process';
import { startStandInSmtp, type StandInSmtp } from '../../server/services/mail/stand-in-smtp';
import { INVITE_RATE } from '../../server/features/studio/studio.service';
import { SIGN_IN_RATE } from '../../server/features/auth/auth.service';
import { freePort } from '../../scripts/lib/throwaway-cluster';
import { siblingDatabase, type SiblingDatabase } from './lib/sibling-database';

const BUCKET = 'parlour-files';
/** How long a database change notice may take between instances on a loaded test machine. */
const NOTICE_WAIT_MS = 2000;
const PROCESSING_WAIT_MS = 30_000;

type Instance = Awaited<ReturnType<typeof startServer>>;
let worker: Awaited<ReturnType<typeof startWorker>>;
/** An instance's environment (set once the stores are up). */
let env: (name: string, port: number) => Record<string, string>;
const scratch = mkdtempSync(join(tmpdir(), 'parlour-two-'));
let database: SiblingDatabase;
let s3: S3rver;
let smtp: StandInSmtp;
let a: Instance;
let b: Instance;
let cookie = '';

interface Answer {
  status: number;
  body: Record<string, unknown>;
  bytes: Buffer;
}

async function call(instance: Instance, method: string, path: string, body?: unknown, withCookie = true): Promise<Answer> {
  const res = await fetch(`${instance.config.publicUrl}${path}`, {
    method,
    headers: {
      ...(body instanceof FormData ? {} : { 'content-type': 'application/json' }),
      ...(withCookie && cookie ? { cookie } : {}),
    },
    body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
  });
  const bytes = Buffer.from(await res.arrayBuffer());
  const json =
    (res.headers.get('content-type') ?? '').includes('json') && bytes.length
      ? (JSON.parse(bytes.toString('utf8')) as Record<string, unknown>)
      : {};
  if (res.headers.get('set-cookie')) cookie = res.headers.get('set-cookie')!.split(';')[0];
  return { status: res.status, body: json, bytes };
}

interface ProcessedFinish {
  status: string;
  files: { swatchUrl: string | null };
}

/** Polls instance B until the photo uploaded through another instance has been processed (by the worker). */
async function processedOnB(id: string): Promise<ProcessedFinish> {
  const until = Date.now() + PROCESSING_WAIT_MS;
  for (;;) {
    const finish = (await call(b, 'GET', `/api/finishes/${id}`)).body.finish as ProcessedFinish;
    if (finish.status !== 'processing' || Date.now() > until) return finish;
    await new Promise((r) => setTimeout(r, 100));
  }
}

beforeAll(async () => {
  database = await siblingDatabase(inject('databaseUrl'), 'parlour_two');
  const db = createDb(database.url, 1);
  await migrateToLatest(db);
  await db.destroy();
  s3 = new S3rver({
    port: 0,
    address: '127.0.0.1',
    silent: true,
    directory: join(scratch, 's3'),
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  const { port: s3Port } = await s3.run();
  smtp = await startStandInSmtp({ port: 0, dir: join(scratch, 'outbox') });
  env = (name: string, port: number) => ({
    DATABASE_URL: database.url,
    HOST: '127.0.0.1',
    PORT: String(port),
    DATA_DIR: join(scratch, name),
    CLIENT_DIST: '/nonexistent',
    PRESENTATION_KEY: 'e6'.repeat(32),
    NODE_ENV: 'production',
    LOG_LEVEL: 'silent',
    SMTP_PORT: String(smtp.port),
    STORAGE: 's3',
    S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    S3_BUCKET: BUCKET,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_FORCE_PATH_STYLE: 'true',
  });
  // Both instances leave the job queue to a worker process of its own (here in the test's process).
  a = await startServer({ ...env('a', await freePort()), WORKERS: '0' });
  b = await startServer({ ...env('b', await freePort()), WORKERS: '0' });
  worker = await startWorker(env('worker', 0));
}, 60_000);

afterAll(async () => {
  await a?.close();
  await b?.close();
  await worker?.close();
  await smtp?.close();
  await s3?.close();
  await database?.drop();
  rmSync(scratch, { recursive: true, force: true });
});

describe('two instances, one database, one store', () => {
  let projectId = '';
  let roomId = '';
  let optionId = '';

  it('continues on B a session started on A', async () => {
    const signUp = await call(a, 'POST', '/api/auth/sign-up', {
      studioName: 'Twin Studio',
      name: 'Tam Twin',
      email: 'twin@test.parlour',
      password: 'a-long-twin-password',
    });
    expect(signUp.status).toBe(201);
    const me = await call(b, 'GET', '/api/auth/me');
    expect(me.status).toBe(200);
    expect((me.body.member as { email: string }).email).toBe('twin@test.parlour');
    const project = await call(b, 'POST', '/api/projects', {
      name: 'Twin flat',
      newClient: { name: 'Ro Twin', email: 'ro@example.com' },
    });
    expect(project.status).toBe(201);
    projectId = (project.body.project as { id: string }).id;
    expect(((await call(a, 'GET', '/api/projects')).body.projects as { id: string }[]).map((p) => p.id)).toContain(projectId);
  });

  it('serves from B, out of the shared bucket, a photo uploaded through A', async () => {
    const photo = await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 150, g: 110, b: 70 } } })
      .jpeg()
      .toBuffer();
    const form = new FormData();
    form.append('photos', new Blob([photo], { type: 'image/jpeg' }), 'oak.jpg');
    const uploaded = await call(a, 'POST', '/api/finishes/photos', form);
    expect(uploaded.status).toBe(201);
    const id = (uploaded.body.finishes as { id: string }[])[0].id;
    const finish = await processedOnB(id);
    expect(finish.status).toBe('ready');
    const fromB = await call(b, 'GET', finish.files.swatchUrl!);
    const fromA = await call(a, 'GET', finish.files.swatchUrl!);
    expect(fromB.status).toBe(200);
    expect(createHash('sha256').update(fromB.bytes).digest('hex')).toBe(createHash('sha256').update(fromA.bytes).digest('hex'));
    // The bytes live in the bucket; neither instance wrote files to its own disk.
    expect(readdirSync(join(scratch, 's3'), { recursive: true }).some((f) => String(f).includes('derived'))).toBe(true);
    expect(existsSync(join(scratch, 'a', 'files'))).toBe(false);
    expect(existsSync(join(scratch, 'b', 'files'))).toBe(false);
  });

  it('processes on the worker a photo uploaded through an instance that was killed straight after', async () => {
    const port = await freePort();
    const killed = await startServerProcess({
      port,
      env: { ...env('killed', port), WORKERS: '0', LOG_LEVEL: 'warn' },
      logFile: join(scratch, 'killed.log'),
    });
    const photo = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 90, g: 120, b: 150 } } })
      .jpeg()
      .toBuffer();
    const form = new FormData();
    form.append('photos', new Blob([photo], { type: 'image/jpeg' }), 'slate.jpg');
    const res = await fetch(`${killed.url}/api/finishes/photos`, { method: 'POST', headers: { cookie }, body: form });
    expect(res.status).toBe(201);
    const id = ((await res.json()) as { finishes: { id: string }[] }).finishes[0].id;
    killed.child.kill('SIGKILL');
    await killed.exited;
    const finish = await processedOnB(id);
    expect(finish.status).toBe('ready');
    expect((await call(b, 'GET', finish.files.swatchUrl!)).status).toBe(200);
  });

  it('opens a client link on either, and a withdrawal on one stops it on the other', async () => {
    const room = await call(a, 'POST', `/api/projects/${projectId}/rooms`, {
      name: 'Twin room',
      shell: {
        outline: [
          [0, 0],
          [3000, 0],
          [3000, 3000],
          [0, 3000],
        ],
      },
    });
    roomId = (room.body.room as { id: string }).id;
    optionId = (room.body.options as { id: string }[])[0].id;
    const made = await call(a, 'POST', `/api/projects/${projectId}/presentations`, {
      rooms: [{ roomId, optionIds: [optionId] }],
    });
    expect(made.status).toBe(201);
    const { id: presentationId, link } = made.body.presentation as { id: string; link: string };
    const token = link.split('/p/')[1];
    const onA = await call(a, 'GET', `/api/p/${token}`, undefined, false);
    const onB = await call(b, 'GET', `/api/p/${token}`, undefined, false);
    expect(onA.status).toBe(200);
    expect(onB.bytes.toString()).toBe(onA.bytes.toString());
    // Both now hold a ready answer; B withdraws, A must stop serving it.
    expect((await call(b, 'POST', `/api/presentations/${presentationId}/withdraw`)).status).toBe(200);
    const withdrawnAt = Date.now();
    let status = 200;
    while (status === 200 && Date.now() - withdrawnAt < NOTICE_WAIT_MS)
      status = (await call(a, 'GET', `/api/p/${token}`, undefined, false)).status;
    expect(status).toBe(410);
    console.log(`[two] link stopped on the other instance ${Date.now() - withdrawnAt} ms after the withdrawal was answered`);
    expect((await call(b, 'GET', `/api/p/${token}`, undefined, false)).status).toBe(410);
  });

  it('counts the invitation limit across both instances', async () => {
    for (let i = 0; i < INVITE_RATE.limit; i += 1) {
      const res = await call(i % 2 === 0 ? a : b, 'POST', '/api/studio/invites', {
        email: `invitee${i}@test.parlour`,
        role: 'viewer',
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    expect((await call(a, 'POST', '/api/studio/invites', { email: 'one-more@test.parlour', role: 'viewer' })).status).toBe(429);
    expect((await call(b, 'POST', '/api/studio/invites', { email: 'and-another@test.parlour', role: 'viewer' })).status).toBe(
      429,
    );
  });

  it('counts wrong passwords across both instances', async () => {
    for (let i = 0; i < SIGN_IN_RATE.limit; i += 1) {
      expect(
        (
          await call(
            i % 2 === 0 ? a : b,
            'POST',
            '/api/auth/sign-in',
            { email: 'twin@test.parlour', password: 'not-the-password' },
            false,
          )
        ).status,
      ).toBe(401);
    }
    expect(
      (await call(b, 'POST', '/api/auth/sign-in', { email: 'twin@test.parlour', password: 'a-long-twin-password' }, false))
        .status,
    ).toBe(429);
  });
});
