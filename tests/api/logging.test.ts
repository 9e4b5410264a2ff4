// Structured logs: every request line carries a request id (the caller's, or a fresh one echoed
// back), and no line ever holds a password, a session cookie or a presentation token.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Writable } from 'node:stream';
import { inject } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db/database';
import { createLogger } from '../../server/services/logging/logger';
import { SESSION_COOKIE } from '../../server/services/auth/session';
import { TEST_PRESENTATION_KEY, TEST_SIGN_UP_LIMIT, uniqueEmail } from '../setup/app';
import { presentedProject } from '../ops/lib/fixtures';

const PASSWORD = 'hunter2-but-much-longer';
const lines: string[] = [];
const capture = new Writable({
  write(chunk: Buffer, _enc, done) {
    lines.push(...chunk.toString('utf8').split('\n').filter(Boolean));
    done();
  },
});

let db: Db;
let app: Express;
beforeAll(() => {
  db = createDb(inject('databaseUrl'), 4);
  const config = loadConfig({
    DATABASE_URL: inject('databaseUrl'),
    NODE_ENV: 'test',
    PUBLIC_URL: 'http://parlour.test',
    CLIENT_DIST: '/nonexistent',
    PRESENTATION_KEY: TEST_PRESENTATION_KEY,
    SIGN_UP_LIMIT_PER_HOUR: TEST_SIGN_UP_LIMIT,
  });
  app = createApp({
    db,
    config,
    mailer: { send: async () => undefined },
    logger: createLogger({ level: 'info', destination: capture }),
  });
});
afterAll(() => db.destroy());

const sessionToken = (setCookie: string[] | string | undefined) => {
  const all = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const cookie = all.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  return cookie ? decodeURIComponent(cookie.split(';')[0].slice(SESSION_COOKIE.length + 1)) : null;
};

describe('request logs', () => {
  const secrets: string[] = [PASSWORD];
  let token = '';

  it('logs sign-up, sign-in, a presentation open and a choice without a secret in any line', async () => {
    const email = uniqueEmail('logged');
    const agent = request.agent(app);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .send({ studioName: 'Ledger Studio', name: 'Lou Ledger', email, password: PASSWORD });
    expect(signUp.status).toBe(201);
    secrets.push(sessionToken(signUp.headers['set-cookie'])!);

    const wrong = await request(app)
      .post('/api/auth/sign-in')
      .send({ email, password: `${PASSWORD}-typo` });
    expect(wrong.status).toBe(401);
    secrets.push(`${PASSWORD}-typo`);
    const signIn = await agent.post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(signIn.status).toBe(200);
    secrets.push(sessionToken(signIn.headers['set-cookie'])!);

    const p = await presentedProject(agent);
    token = p.token;
    secrets.push(token, token.split('.')[2]);
    const client = request(app);
    expect((await client.get(`/api/p/${token}`)).status).toBe(200);
    // Again: now the ready answer, written ahead of the middleware, with a request line all the same.
    expect((await client.get(`/api/p/${token}`)).status).toBe(200);
    expect((await client.get(`/p/${token}`)).status).toBe(404); // no client build here; the path is still logged
    expect(
      (
        await client
          .put(`/api/p/${token}/rooms/${p.roomId}/choice`)
          .send({ optionId: p.optionIds[1], comment: 'The walnut, please' })
      ).status,
    ).toBe(200);
    expect((await client.get(`/api/p/${token}x`)).status).toBe(404);

    const text = lines.join('\n');
    for (const secret of secrets) {
      expect(secret.length).toBeGreaterThan(8);
      expect(text).not.toContain(secret);
    }
    expect(text).not.toMatch(/parlour_session=/);
    expect(text).toContain('/api/p/[redacted]/rooms/');
    expect(text).toContain('"url":"/p/[redacted]"');
    const linkLines = lines.filter((l) => l.includes('"url":"/api/p/[redacted]"') && l.includes('"statusCode":200'));
    expect(linkLines).toHaveLength(2);
  });

  it('gives every request line an id, and echoes a plain incoming one', async () => {
    const res = await request(app).get('/api/auth/me').set('x-request-id', 'lb-7f3a.19');
    expect(res.headers['x-request-id']).toBe('lb-7f3a.19');
    const forged = await request(app).get('/api/auth/me').set('x-request-id', 'bad id {"level":60}');
    expect(forged.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);

    const requestLines = lines
      .map((l) => JSON.parse(l) as { reqId?: string; req?: { id?: string; url?: string }; res?: { statusCode: number } })
      .filter((l) => l.req);
    expect(requestLines.length).toBeGreaterThanOrEqual(10);
    for (const l of requestLines) {
      expect(typeof l.reqId).toBe('string');
      expect(l.req?.id).toBe(l.reqId);
    }
    expect(requestLines.some((l) => l.reqId === 'lb-7f3a.19' && l.res?.statusCode === 401)).toBe(true);
  });
});
