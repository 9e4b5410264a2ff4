// PostgreSQL stopped under a running app (a throwaway cluster of this test's own, never the shared
// one): requests meanwhile get a quick, clear 503, nothing crashes, and once the database is back
// the app answers again by itself: sessions, writes and client links included.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { startServer } from '../../server/index';
import { freePort, throwawayCluster, type ThrowawayCluster } from '../../scripts/lib/throwaway-cluster';
import { presentedProject, type PresentedProject } from './lib/fixtures';
import request from 'supertest';

/** No request may hang while the database is away. */
const ANSWER_WITHIN_MS = 5000;
const RECOVERY_LIMIT_MS = 20_000;

let cluster: ThrowawayCluster;
let app: Awaited<ReturnType<typeof startServer>>;
let url = '';
let cookie = '';
let shown: PresentedProject;

async function call(method: string, path: string, body?: unknown) {
  const res = await fetch(`${url}${path}`, {
    method,
    headers: { 'content-type': 'application/json', cookie },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(ANSWER_WITHIN_MS),
  });
  const text = await res.text();
  return {
    status: res.status,
    retryAfter: res.headers.get('retry-after'),
    body: text ? (JSON.parse(text) as { error?: { code: string; message: string } }) : {},
  };
}

beforeAll(async () => {
  cluster = await throwawayCluster({ fsync: false, prefix: 'parlour-outage-' });
  const databaseUrl = await cluster.createDatabase('parlour_outage');
  const db = createDb(databaseUrl, 1);
  await migrateToLatest(db);
  await db.destroy();
  app = await startServer({
    DATABASE_URL: databaseUrl,
    PORT: String(await freePort()),
    HOST: '127.0.0.1',
    DATA_DIR: join(cluster.dir, 'data'),
    CLIENT_DIST: '/nonexistent',
    PRESENTATION_KEY: 'd5'.repeat(32),
    NODE_ENV: 'production',
    LOG_LEVEL: 'silent',
  });
  url = app.config.publicUrl;
  const agent = request.agent(url);
  const signUp = await agent
    .post('/api/auth/sign-up')
    .send({ studioName: 'Outage Studio', name: 'Oz Out', email: 'outage@test.parlour', password: 'a-long-outage-password' });
  cookie = (signUp.headers['set-cookie'] as unknown as string[])[0].split(';')[0];
  shown = await presentedProject(agent, 'Outage flat');
  // Open the link once so its ready answer is cached before the outage.
  expect((await call('GET', `/api/p/${shown.token}`)).status).toBe(200);
}, 60_000);

afterAll(async () => {
  await app?.close();
  cluster?.destroy();
});

describe('the database going away under a running app', () => {
  it('answers 503 with a clear message meanwhile, and recovers by itself', async () => {
    expect((await call('GET', '/api/projects')).status).toBe(200);
    cluster.stop();

    const during = [
      await call('GET', '/api/projects'),
      await call('POST', '/api/clients', { name: 'Bo Down', email: '' }),
      await call('POST', '/api/auth/sign-in', { email: 'outage@test.parlour', password: 'a-long-outage-password' }),
      await call('GET', `/api/p/${shown.token}`),
      await call('PUT', `/api/p/${shown.token}/rooms/${shown.roomId}/choice`, { optionId: shown.optionIds[0], comment: '' }),
    ];
    for (const res of during) {
      expect(res.status).toBe(503);
      expect(res.body.error?.code).toBe('unavailable');
      expect(res.body.error?.message).toMatch(/database is not answering/);
      expect(Number(res.retryAfter)).toBeGreaterThan(0);
    }
    // Pages that need no database still load.
    expect((await fetch(`${url}/api/nothing-here`)).status).toBe(404);

    cluster.start();
    const back = Date.now();
    let status = 0;
    while (Date.now() - back < RECOVERY_LIMIT_MS) {
      status = (await call('GET', '/api/projects')).status;
      if (status === 200) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(status).toBe(200);
    console.log(`[outage] answering again ${Date.now() - back} ms after the database came back`);
    expect((await call('POST', '/api/clients', { name: 'Bo Back', email: '' })).status).toBe(201);
    expect((await call('GET', `/api/p/${shown.token}`)).status).toBe(200);
    expect(
      (await call('PUT', `/api/p/${shown.token}/rooms/${shown.roomId}/choice`, { optionId: shown.optionIds[0], comment: '' }))
        .status,
    ).toBe(200);
  }, 60_000);
});
