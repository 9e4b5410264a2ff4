// Edges of how requests are read: the session cookie is read one way by the origin check and the
// session alike, static paths answer a plain 404 (never an API error about JSON), and a GET's body
// is never parsed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { inject } from 'vitest';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb, type Db } from '../../server/db/database';
import { TEST_PRESENTATION_KEY, TEST_SIGN_UP_LIMIT, uniqueEmail } from '../setup/app';
import type { Express } from 'express';

let db: Db;
let app: Express;
let dist: string;

beforeAll(() => {
  // A stand-in client build, so the static routes are mounted as in production.
  dist = mkdtempSync(join(tmpdir(), 'parlour-dist-'));
  mkdirSync(join(dist, 'assets'));
  writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Parlour</title>');
  writeFileSync(join(dist, 'assets', 'app-1234.js'), 'console.log(1)');
  db = createDb(inject('databaseUrl'), 2);
  const config = loadConfig({
    DATABASE_URL: inject('databaseUrl'),
    NODE_ENV: 'test',
    PUBLIC_URL: 'http://parlour.test',
    CLIENT_DIST: dist,
    PRESENTATION_KEY: TEST_PRESENTATION_KEY,
    SIGN_UP_LIMIT_PER_HOUR: TEST_SIGN_UP_LIMIT,
  });
  app = createApp({ db, mailer: { send: async () => undefined }, config });
});
afterAll(async () => {
  await db.destroy();
  rmSync(dist, { recursive: true, force: true });
});

describe('one cookie reader', () => {
  it('a session cookie spelled loosely is still the session to the origin check', async () => {
    const signUp = await request(app)
      .post('/api/auth/sign-up')
      .send({ studioName: 'Cookie Studio', name: 'Cy', email: uniqueEmail('owner'), password: 'correct-horse-battery' });
    expect(signUp.status).toBe(201);
    const setCookie = ([] as string[]).concat(signUp.headers['set-cookie'] ?? []);
    const token = setCookie.map((c) => /^parlour_session=([^;]+)/.exec(c)?.[1]).find(Boolean);
    expect(token).toBeTruthy();
    // A space before "=": the session reads it as the session cookie, so the origin check must too.
    const loose = `other=1; parlour_session =${token}`;
    expect((await request(app).get('/api/auth/me').set('Cookie', loose)).status).toBe(200);
    const forged = await request(app)
      .post('/api/clients')
      .set('Cookie', loose)
      .set('Origin', 'https://evil.example')
      .send({ name: 'Forged', email: uniqueEmail('client') });
    expect(forged.status).toBe(403);
    expect(forged.body.error.code).toBe('cross_site');
    const clients = (await request(app).get('/api/clients').set('Cookie', `parlour_session=${token}`)).body.clients.map(
      (c: { name: string }) => c.name,
    );
    expect(clients).not.toContain('Forged');
  });
});

describe('static paths', () => {
  it('answer a plain 404 for a path climbing out, a missing asset or a malformed address', async () => {
    for (const path of ['/assets/../../x', '/assets/%2e%2e/%2e%2e/etc/passwd', '/assets/missing.js', '/assets/%E0%A4%A']) {
      const res = await request(app).get(path);
      expect(res.status, path).toBe(404);
      expect(res.headers['content-type'], path).toMatch(/^text\/plain/);
      expect(res.text, path).not.toMatch(/JSON|error/i);
    }
    expect((await request(app).get('/assets/app-1234.js')).status).toBe(200);
    expect((await request(app).get('/projects')).text).toContain('<title>Parlour</title>');
  });

  it('never reads a GET’s body, so a GET cannot fail as invalid JSON; a write still can', async () => {
    const get = await request(app).get('/api/auth/me').set('Content-Type', 'application/json').send('{not json');
    expect(get.status).toBe(401);
    expect(JSON.stringify(get.body)).not.toMatch(/JSON/);
    const post = await request(app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{not json');
    expect(post.status).toBe(400);
    expect(post.body.error).toEqual({ code: 'bad_request', message: 'The request body is not valid JSON.' });
  });
});
