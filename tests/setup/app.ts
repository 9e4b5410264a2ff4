// API tests: the Express app from createApp on the migrated test database, with mail captured.
import { inject } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db/database';
import type { MailMessage, Mailer } from '../../server/services/mail/mailer';

/** Signs presentation links in API tests (256 bits, hex); tests craft tokens with it too. */
export const TEST_PRESENTATION_KEY = '5e'.repeat(32);

export interface TestApp {
  app: Express;
  db: Db;
  mail: MailMessage[];
  close(): Promise<void>;
}

/**
 * `env` adds configuration, e.g. `{ OUTBOX_DIR }` for the local setup's Outbox; `refuseMail` makes
 * the mail server refuse the messages it picks.
 */
export function createTestApp(env: Record<string, string> = {}, refuseMail?: (m: MailMessage) => boolean): TestApp {
  const db = createDb(inject('databaseUrl'), 4);
  const mail: MailMessage[] = [];
  const mailer: Mailer = {
    send: async (m) => {
      if (refuseMail?.(m)) throw new Error('550 mailbox unavailable');
      mail.push(m);
    },
  };
  const config = loadConfig({ DATABASE_URL: inject('databaseUrl'), NODE_ENV: 'test', PUBLIC_URL: 'http://parlour.test', CLIENT_DIST: '/nonexistent', PRESENTATION_KEY: TEST_PRESENTATION_KEY, ...env });
  const app = createApp({ db, mailer, config });
  return { app, db, mail, close: () => db.destroy() };
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
  const res = await agent.post('/api/auth/sign-up').send({ studioName, name: 'Olive Owner', email, password: 'correct-horse-battery' });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, email, member: res.body.member as { id: string } };
}

/** Invites a member with `role` into the agent's studio and returns an agent signed in as them. */
export async function addMember(t: TestApp, owner: request.Agent, role: 'owner' | 'designer' | 'viewer') {
  const email = uniqueEmail(role);
  const res = await owner.post('/api/studio/invites').send({ email, role });
  if (res.status !== 201) throw new Error(`invite failed: ${res.status} ${JSON.stringify(res.body)}`);
  const mail = t.mail.findLast((m) => m.to === email);
  const token = mail?.text.match(/\/invite\/([A-Za-z0-9_-]+)/)?.[1];
  if (!token) throw new Error('no invite link in the mail');
  const agent = request.agent(t.app);
  const accepted = await agent.post(`/api/invites/${token}/accept`).send({ name: `Member ${role}`, password: 'correct-horse-battery' });
  if (accepted.status !== 201) throw new Error(`accept failed: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return { agent, email, member: accepted.body.member as { id: string } };
}
