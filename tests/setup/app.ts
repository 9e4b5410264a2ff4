// API tests: the Express app from createApp on the migrated test database, with mail captured.
import { inject } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { sql } from 'kysely';
import { createAppWithServices, type AppDeps } from '../../server/app';
import { closeServices } from '../../server/compose';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db/database';
import type { MailMessage, Mailer } from '../../server/services/mail/mailer';

/** Signs presentation links in API tests (256 bits, hex); tests craft tokens with it too. */
export const TEST_PRESENTATION_KEY = '5e'.repeat(32);

export interface TestApp {
  app: Express;
  db: Db;
  mail: MailMessage[];
  /** Resolves once the app's job queue has nothing to run now and nothing running (a retry waiting its turn is not run). */
  settled(): Promise<void>;
  close(): Promise<void>;
}

/** Sign-ups per hour per client address in test apps: every test file signs up studios from loopback. */
export const TEST_SIGN_UP_LIMIT = '100000';

export interface TestAppOptions {
  /** Environment on top of the test app's own; `undefined` leaves a variable to its default. */
  env?: Record<string, string | undefined>;
  /** Replaces the sign-in password check (to count the calls). */
  verifyPassword?: AppDeps['verifyPassword'];
  /** Makes the mail server refuse the messages it picks. */
  refuseMail?: (m: MailMessage) => boolean;
}

export function createTestApp(options: TestAppOptions = {}): TestApp {
  const db = createDb(inject('databaseUrl'), 4);
  const mail: MailMessage[] = [];
  const mailer: Mailer = {
    send: async (m) => {
      if (options.refuseMail?.(m)) throw new Error('550 mailbox unavailable');
      mail.push(m);
    },
  };
  const config = loadConfig({
    DATABASE_URL: inject('databaseUrl'),
    NODE_ENV: 'test',
    PUBLIC_URL: 'http://parlour.test',
    CLIENT_DIST: '/nonexistent',
    PRESENTATION_KEY: TEST_PRESENTATION_KEY,
    SIGN_UP_LIMIT_PER_HOUR: TEST_SIGN_UP_LIMIT,
    ...options.env,
  });
  const { app, settled, close } = startTestApp({ db, mailer, config, verifyPassword: options.verifyPassword });
  return { app, db, mail, settled, close };
}

let apps = 0;
const SETTLE_LIMIT_MS = 15_000;
/**
 * The app for `deps` with a job queue of its own (a schema of its own in the shared test database),
 * so a job is worked by the app that sent it, with its mailer and storage. `close` stops the app's
 * services, drops the queue's schema and closes `deps.db`.
 */
export function startTestApp(deps: AppDeps): Pick<TestApp, 'app' | 'settled' | 'close'> {
  apps += 1;
  const jobsSchema = `pgboss_test_${process.pid}_${apps}`;
  const { app, services } = createAppWithServices({ ...deps, jobsSchema });
  return {
    app,
    async settled() {
      const until = Date.now() + SETTLE_LIMIT_MS;
      await services.jobs.start();
      for (;;) {
        const { rows } = await sql<{ n: number }>`
          SELECT count(*)::int AS n FROM ${sql.id(jobsSchema, 'job')}
          WHERE state = 'active' OR (state IN ('created', 'retry') AND start_after <= now())`.execute(deps.db);
        if (rows[0].n === 0) return;
        if (Date.now() > until) throw new Error(`the job queue still has ${rows[0].n} jobs to run`);
        await new Promise((r) => setTimeout(r, 20));
      }
    },
    async close() {
      await closeServices(services);
      await sql`DROP SCHEMA IF EXISTS ${sql.id(jobsSchema)} CASCADE`.execute(deps.db);
      await deps.db.destroy();
    },
  };
}

/** The newest mail to `email` once the job queue has sent what it holds (invitations go through it). */
export async function mailTo(t: Pick<TestApp, 'mail' | 'settled'>, email: string): Promise<MailMessage> {
  await t.settled();
  const mail = t.mail.findLast((m) => m.to === email);
  if (!mail) throw new Error(`no mail to ${email}`);
  return mail;
}

/** The token in the newest invitation mailed to `email`. */
export async function inviteToken(t: Pick<TestApp, 'mail' | 'settled'>, email: string): Promise<string> {
  const token = (await mailTo(t, email)).text.match(/\/invite\/([A-Za-z0-9_-]+)/)?.[1];
  if (!token) throw new Error('no invite link in the mail');
  return token;
}

let counter = 0;
/** A unique e-mail per call, so test files never collide in the shared test database. */
export function uniqueEmail(tag: string): string {
  counter += 1;
  return `${tag}-${process.pid}-${Date.now().toString(36)}-${counter}@test.parlour`;
}

/** Signs up a new studio and returns an agent carrying its owner's session cookie. */
export async function signUpStudio(app: Express, studioName = 'Test Studio') {
  const agent = request.agent(app);
  const email = uniqueEmail('owner');
  const res = await agent
    .post('/api/auth/sign-up')
    .send({ studioName, name: 'Olive Owner', email, password: 'correct-horse-battery' });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, email, member: res.body.member as { id: string } };
}

/** Invites a member with `role` into the agent's studio and returns an agent signed in as them. */
export async function addMember(t: TestApp, owner: request.Agent, role: 'owner' | 'designer' | 'viewer') {
  const email = uniqueEmail(role);
  const res = await owner.post('/api/studio/invites').send({ email, role });
  if (res.status !== 201) throw new Error(`invite failed: ${res.status} ${JSON.stringify(res.body)}`);
  const token = await inviteToken(t, email);
  const agent = request.agent(t.app);
  const accepted = await agent
    .post(`/api/invites/${token}/accept`)
    .send({ name: `Member ${role}`, password: 'correct-horse-battery' });
  if (accepted.status !== 201) throw new Error(`accept failed: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return { agent, email, member: accepted.body.member as { id: string } };
}
