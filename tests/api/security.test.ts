// Web defences: security headers with a strict content security policy, the origin check on
// cookie-authenticated writes, and the invitation rate limit counted in PostgreSQL.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { INVITE_RATE } from '../../server/features/studio/studio.service';
import { hitRateLimit } from '../../server/services/rate-limit/rate-limit';
import { createTestApp, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';
import { presentedProject } from '../ops/lib/fixtures';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

/** The directives of a Content-Security-Policy header, by name. */
function directives(header: string): Map<string, string[]> {
  return new Map(
    header
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((d) => d[0])
      .map(([name, ...values]) => [name, values]),
  );
}

describe('security headers', () => {
  it('answers with a content security policy that allows only the app itself', async () => {
    const res = await request(t.app).get('/api/auth/me');
    const csp = directives(res.headers['content-security-policy']);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('style-src')).toEqual(["'self'"]);
    expect(csp.get('worker-src')).toEqual(["'self'", 'blob:']);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    // No inline script or eval anywhere in the policy.
    expect(res.headers['content-security-policy']).not.toMatch(/unsafe-inline|unsafe-eval/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['referrer-policy']).toBe('same-origin');
    expect(res.headers['x-powered-by']).toBeUndefined();
    // Plain http locally: no HSTS and no upgrade, which would break the page.
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(csp.has('upgrade-insecure-requests')).toBe(false);
  });

  it('keeps the client link routes at no-referrer', async () => {
    const res = await request(t.app).get('/api/p/not-a-token');
    expect(res.status).toBe(404);
    expect(res.headers['referrer-policy']).toBe('no-referrer');
  });
});

describe('cross-site request forgery', () => {
  let agent: ReturnType<typeof request.agent>;
  beforeAll(async () => {
    ({ agent } = await signUpStudio(t.app, 'Origin Studio'));
  });
  const newClient = () => ({ name: 'Cass Brook', email: uniqueEmail('client') });

  it('refuses a cookie-carrying write from another origin with 403 and says why', async () => {
    const res = await agent.post('/api/clients').set('Origin', 'https://evil.example').send(newClient());
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site');
    expect(res.body.error.message).toMatch(/another site/);
    const list = await agent.get('/api/clients');
    expect(list.body.clients.map((c: { name: string }) => c.name)).not.toContain('Cass Brook');
  });

  it('refuses by Referer when the Origin is missing or "null"', async () => {
    expect((await agent.post('/api/clients').set('Referer', 'https://evil.example/page').send(newClient())).status).toBe(403);
    expect((await agent.post('/api/clients').set('Origin', 'null').send(newClient())).status).toBe(403);
    expect(
      (await agent.post('/api/clients').set('Origin', 'null').set('Referer', 'https://evil.example/').send(newClient())).status,
    ).toBe(403);
  });

  it('allows the configured public origin and the request’s own origin', async () => {
    expect((await agent.post('/api/clients').set('Origin', 'http://parlour.test').send(newClient())).status).toBe(201);
    expect((await agent.post('/api/clients').set('Referer', 'http://parlour.test/clients').send(newClient())).status).toBe(201);
    expect(
      (
        await agent
          .post('/api/clients')
          .set('Host', 'studio.local:8080')
          .set('Origin', 'http://studio.local:8080')
          .send(newClient())
      ).status,
    ).toBe(201);
    expect(
      (
        await agent
          .post('/api/clients')
          .set('Host', 'studio.local:8080')
          .set('Origin', 'http://studio.local:9090')
          .send(newClient())
      ).status,
    ).toBe(403);
  });

  it('leaves reads, cookie-less requests and the client link routes alone', async () => {
    expect((await agent.get('/api/clients').set('Origin', 'https://evil.example')).status).toBe(200);
    const signIn = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Origin', 'https://evil.example')
      .send({ email: 'nobody@test.parlour', password: 'wrong-password-here' });
    expect(signIn.status).toBe(401);
    const p = await presentedProject(agent);
    const choice = await agent
      .put(`/api/p/${p.token}/rooms/${p.roomId}/choice`)
      .set('Origin', 'null')
      .send({ optionId: p.optionIds[1], comment: '' });
    expect(choice.status).toBe(200);
  });
});

describe('rate limits in PostgreSQL', () => {
  it('stops invitations past the studio’s hourly limit with 429 and Retry-After', async () => {
    const { agent } = await signUpStudio(t.app, 'Busy Studio');
    for (let i = 0; i < INVITE_RATE.limit; i += 1) {
      const res = await agent.post('/api/studio/invites').send({ email: uniqueEmail('invitee'), role: 'designer' });
      expect(res.status).toBe(201);
    }
    const over = await agent.post('/api/studio/invites').send({ email: uniqueEmail('invitee'), role: 'designer' });
    expect(over.status).toBe(429);
    expect(over.body.error.message).toMatch(/a lot of invitations/);
    expect(Number(over.headers['retry-after'])).toBeGreaterThan(0);
    // Another studio has its own count.
    const other = await signUpStudio(t.app, 'Quiet Studio');
    expect((await other.agent.post('/api/studio/invites').send({ email: uniqueEmail('invitee'), role: 'viewer' })).status).toBe(
      201,
    );
  });

  it('weighs the previous window so a burst at the boundary cannot double the limit', async () => {
    const rule = { bucket: 'test-sliding', limit: 10, windowMs: 60_000 };
    const key = uniqueEmail('key');
    const start = Math.ceil(Date.now() / rule.windowMs) * rule.windowMs;
    // Ten hits at the end of one window…
    for (let i = 0; i < 10; i += 1) expect((await hitRateLimit(t.db, rule, key, new Date(start - 1000))).allowed).toBe(true);
    // …leave almost no room at the start of the next…
    expect((await hitRateLimit(t.db, rule, key, new Date(start + 1000))).allowed).toBe(false);
    // …and the full allowance once the old window has slid out.
    const later = await hitRateLimit(t.db, rule, key, new Date(start + rule.windowMs + 1000));
    expect(later.allowed).toBe(true);
  });

  it('asks a refused caller to come back exactly when the sliding window lets the next hit through', async () => {
    const rule = { bucket: 'test-retry', limit: 10, windowMs: 60_000 };
    const key = uniqueEmail('key');
    const start = Math.ceil(Date.now() / rule.windowMs) * rule.windowMs;
    for (let i = 0; i < 10; i += 1) await hitRateLimit(t.db, rule, key, new Date(start - 1000));
    // 1 s into the new window: 1 + 10 × (59/60) > 10. The next hit is the window's second, so it
    // fits once 2 + 10 × (1 − e) ≤ 10, at e = 0.2: 12 s into the window, 11 s from now.
    const refused = await hitRateLimit(t.db, rule, key, new Date(start + 1000));
    expect(refused.allowed).toBe(false);
    expect(refused.retryAfterS).toBe(11);
    expect((await hitRateLimit(t.db, rule, key, new Date(start + 12_000))).allowed).toBe(true);
  });

  it('over the limit within one window, the wait runs into the next window as the count slides out', async () => {
    const rule = { bucket: 'test-retry-next', limit: 4, windowMs: 60_000 };
    const key = uniqueEmail('key');
    const start = Math.ceil(Date.now() / rule.windowMs) * rule.windowMs;
    for (let i = 0; i < 4; i += 1) expect((await hitRateLimit(t.db, rule, key, new Date(start + 30_000))).allowed).toBe(true);
    // Five in this window: in the next, 1 + 5 × (1 − f) ≤ 4 once f = 0.4, 24 s in: 54 s from now.
    const refused = await hitRateLimit(t.db, rule, key, new Date(start + 30_000));
    expect(refused.retryAfterS).toBe(54);
    expect((await hitRateLimit(t.db, rule, key, new Date(start + rule.windowMs + 24_000))).allowed).toBe(true);
  });
});
