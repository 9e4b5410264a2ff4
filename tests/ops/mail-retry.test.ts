// Mail nobody waits for goes through the job queue: with the mail stand-in stopped, a client's
// choice is saved and answered at once, the project page shows the designer's notice as failing,
// and once the stand-in is back the retry delivers it and the page shows it as sent.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { startServer } from '../../server/index';
import { startStandInSmtp, type FiledMessage, type StandInSmtp } from '../../server/services/mail/stand-in-smtp';
import type { ProjectMail } from '../../shared/schemas/project';
import { freePort } from '../../scripts/lib/throwaway-cluster';
import { siblingDatabase, type SiblingDatabase } from './lib/sibling-database';

/** The first retry comes 5–10 s after the failed try; a worker polls every 2 s. */
const DELIVERY_WAIT_MS = 30_000;

type Instance = Awaited<ReturnType<typeof startServer>>;
const scratch = mkdtempSync(join(tmpdir(), 'parlour-mail-'));
const outbox = join(scratch, 'outbox');
let database: SiblingDatabase;
let smtp: StandInSmtp | null = null;
let smtpPort = 0;
let app: Instance;
let cookie = '';

async function call(method: string, path: string, body?: unknown): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await fetch(`${app.config.publicUrl}${path}`, {
    method,
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (res.headers.get('set-cookie')) cookie = res.headers.get('set-cookie')!.split(';')[0];
  const text = await res.text();
  return { status: res.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
}

async function projectMailUntil(projectId: string, done: (mail: ProjectMail[]) => boolean): Promise<ProjectMail[]> {
  const until = Date.now() + DELIVERY_WAIT_MS;
  for (;;) {
    const mail = (await call('GET', `/api/projects/${projectId}`)).body.mail as ProjectMail[];
    if (done(mail) || Date.now() > until) return mail;
    await new Promise((r) => setTimeout(r, 100));
  }
}

const filed = (): FiledMessage[] =>
  readdirSync(outbox)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(readFileSync(join(outbox, f), 'utf8')) as FiledMessage);

beforeAll(async () => {
  database = await siblingDatabase(inject('databaseUrl'), 'parlour_mail');
  const db = createDb(database.url, 1);
  await migrateToLatest(db);
  await db.destroy();
  smtpPort = await freePort();
  smtp = await startStandInSmtp({ port: smtpPort, dir: outbox });
  app = await startServer({
    DATABASE_URL: database.url,
    HOST: '127.0.0.1',
    PORT: String(await freePort()),
    DATA_DIR: join(scratch, 'data'),
    CLIENT_DIST: '/nonexistent',
    PRESENTATION_KEY: 'a7'.repeat(32),
    NODE_ENV: 'production',
    LOG_LEVEL: 'silent',
    SMTP_PORT: String(smtpPort),
    OUTBOX_DIR: outbox,
  });
}, 60_000);

afterAll(async () => {
  await app?.close();
  await smtp?.close();
  await database?.drop();
  rmSync(scratch, { recursive: true, force: true });
});

describe('a choice made while the mail server is away', () => {
  it('is saved at once, shown as failing, and its notice arrives once the mail server is back', async () => {
    const signUp = await call('POST', '/api/auth/sign-up', {
      studioName: 'Postal Studio',
      name: 'Pia Post',
      email: 'pia@test.parlour',
      password: 'a-long-postal-password',
    });
    expect(signUp.status).toBe(201);
    const project = await call('POST', '/api/projects', { name: 'Post house', newClient: { name: 'Quin Vale', email: '' } });
    const projectId = (project.body.project as { id: string }).id;
    const room = await call('POST', `/api/projects/${projectId}/rooms`, {
      name: 'Study',
      shell: {
        outline: [
          [0, 0],
          [3000, 0],
          [3000, 3000],
          [0, 3000],
        ],
      },
    });
    const roomId = (room.body.room as { id: string }).id;
    const optionId = (room.body.options as { id: string }[])[0].id;
    const made = await call('POST', `/api/projects/${projectId}/presentations`, { rooms: [{ roomId, optionIds: [optionId] }] });
    expect(made.status).toBe(201);
    const token = (made.body.presentation as { link: string }).link.split('/p/')[1];

    await smtp!.close();
    smtp = null;
    const chosen = await call('PUT', `/api/p/${token}/rooms/${roomId}/choice`, { optionId, comment: 'This one, please.' });
    expect(chosen.status).toBe(200);

    const failing = await projectMailUntil(projectId, (m) => m[0]?.state === 'failing');
    expect(failing).toEqual([
      expect.objectContaining({ kind: 'choice', to: 'pia@test.parlour', state: 'failing', attempts: 1, sentAt: null }),
    ]);
    expect(filed().filter((m) => m.to === 'pia@test.parlour')).toEqual([]);

    smtp = await startStandInSmtp({ port: smtpPort, dir: outbox });
    const back = Date.now();
    const sent = await projectMailUntil(projectId, (m) => m[0]?.state === 'sent');
    expect(sent).toEqual([expect.objectContaining({ kind: 'choice', state: 'sent', attempts: 1 })]);
    console.log(`[mail] the notice went ${Date.now() - back} ms after the mail server came back`);
    const arrived = filed().filter((m) => m.to === 'pia@test.parlour');
    expect(arrived).toHaveLength(1);
    expect(arrived[0].subject).toBe('Quin Vale chose Option A for Study (Post house)');
    expect(arrived[0].text).toContain('This one, please.');
    // The local Outbox lists it once it has gone.
    const listed = await call('GET', '/api/outbox');
    expect((listed.body.messages as { kind: string }[]).map((m) => m.kind)).toEqual(['choice']);
  }, 60_000);
});
