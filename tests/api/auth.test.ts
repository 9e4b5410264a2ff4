// API tests for sign-up, sign-in and sign-out, members and roles, choosing a password, sign-in
// throttling under parallel attempts and the sign-up limit per client address.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { hashPassword, verifyPassword } from '../../server/services/auth/passwords';
import { addMember, createTestApp, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';

/** `parlour_session=…` from an answer's Set-Cookie, as a browser would send it back. */
function sessionCookie(res: request.Response): string {
  const header = res.headers['set-cookie'] as unknown as string[] | undefined;
  const cookie = header?.map((c) => c.split(';')[0]).find((c) => c.startsWith('parlour_session='));
  if (!cookie) throw new Error(`no session cookie in ${JSON.stringify(header)}`);
  return cookie;
}

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('sign-up, sign-in and sign-out', () => {
  it('signs up a studio owner and keeps them signed in with an httpOnly SameSite cookie', async () => {
    const agent = request.agent(t.app);
    const email = uniqueEmail('signup');
    const res = await agent
      .post('/api/auth/sign-up')
      .send({ studioName: 'Fern Studio', name: 'Ada', email, password: 'long-enough-pass' });
    expect(res.status).toBe(201);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/parlour_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.member).toMatchObject({ email, role: 'owner', name: 'Ada' });
    expect(me.body.studio.name).toBe('Fern Studio');
    expect(JSON.stringify(me.body)).not.toMatch(/password/i);
  });

  it('refuses a second account with the same e-mail, field named', async () => {
    const { email } = await signUpStudio(t.app);
    const res = await request(t.app)
      .post('/api/auth/sign-up')
      .send({ studioName: 'X', name: 'Y', email: email.toUpperCase(), password: 'long-enough-pass' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.email).toBeTruthy();
  });

  it('answers invalid bodies with 400 and a message per field', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-up')
      .send({ studioName: '', name: 'A', email: 'not-an-email', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password', 'studioName']);
    const bad = await request(t.app).post('/api/auth/sign-in').set('content-type', 'application/json').send('{"email":');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/JSON/);
  });

  it('rejects a wrong password with 401 and the same answer for an unknown e-mail', async () => {
    const { email } = await signUpStudio(t.app);
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    const unknown = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: 'not-the-password' });
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
    const right = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'correct-horse-battery' });
    expect(right.status).toBe(200);
  });

  it('locks sign-in for an e-mail after five wrong passwords, even with the right one', async () => {
    const { email } = await signUpStudio(t.app);
    for (let i = 0; i < 5; i += 1) {
      expect(
        (
          await request(t.app)
            .post('/api/auth/sign-in')
            .send({ email, password: `wrong-${i}-password` })
        ).status,
      ).toBe(401);
    }
    const locked = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'correct-horse-battery' });
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toMatch(/Try again in \d+ minute/);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('the right password clears the count of earlier attempts', async () => {
    const { email } = await signUpStudio(t.app);
    for (let round = 0; round < 3; round += 1) {
      for (let i = 0; i < 3; i += 1)
        expect(
          (
            await request(t.app)
              .post('/api/auth/sign-in')
              .send({ email, password: `wrong-${i}-password` })
          ).status,
        ).toBe(401);
      expect((await request(t.app).post('/api/auth/sign-in').send({ email, password: 'correct-horse-battery' })).status).toBe(
        200,
      );
    }
  });

  it('sign-out revokes the session at once, and the old cookie replayed does not work either', async () => {
    const agent = request.agent(t.app);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .send({ studioName: 'Exit Studio', name: 'Eve', email: uniqueEmail('exit'), password: 'correct-horse-battery' });
    expect(signUp.status).toBe(201);
    const cookie = sessionCookie(signUp);
    expect((await request(t.app).get('/api/auth/me').set('cookie', cookie)).status).toBe(200);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect((await request(t.app).get('/api/auth/me').set('cookie', cookie)).status).toBe(401);
  });

  it('a garbage session cookie is treated as signed out, never a crash', async () => {
    const res = await request(t.app).get('/api/auth/me').set('cookie', 'parlour_session=%E0%A4%A; other=1');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('signed_out');
  });
});

describe('members and roles', () => {
  it('invites a member by e-mail; the link signs them in with the invited role', async () => {
    const { agent: owner } = await signUpStudio(t.app, 'Invite Studio');
    const { agent: designer, email } = await addMember(t, owner, 'designer');
    const mail = t.mail.findLast((m) => m.to === email)!;
    expect(mail.subject).toMatch(/Invite Studio/);
    expect(mail.text).toMatch(/^.*http:\/\/parlour\.test\/invite\//m);
    const me = await designer.get('/api/auth/me');
    expect(me.body.member.role).toBe('designer');
    const members = await owner.get('/api/studio/members');
    expect(members.body.members.map((m: { email: string }) => m.email)).toContain(email);
  });

  it('an invitation link works once', async () => {
    const { agent: owner } = await signUpStudio(t.app);
    const email = uniqueEmail('once');
    await owner.post('/api/studio/invites').send({ email, role: 'viewer' });
    const token = t.mail.findLast((m) => m.to === email)!.text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1];
    expect((await request(t.app).get(`/api/invites/${token}`)).body.invite.role).toBe('viewer');
    expect(
      (await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'V', password: 'correct-horse-battery' })).status,
    ).toBe(201);
    const again = await request(t.app)
      .post(`/api/invites/${token}/accept`)
      .send({ name: 'V', password: 'correct-horse-battery' });
    expect(again.status).toBe(410);
    expect((await request(t.app).get('/api/invites/not-a-real-token-at-all-xx')).status).toBe(404);
  });

  it('a role change takes effect on the member’s very next request', async () => {
    const { agent: owner } = await signUpStudio(t.app);
    const { agent: designer, member } = await addMember(t, owner, 'designer');
    expect((await designer.post('/api/clients').send({ name: 'A client' })).status).toBe(201);
    expect((await owner.patch(`/api/studio/members/${member.id}`).send({ role: 'viewer' })).status).toBe(200);
    expect((await designer.post('/api/clients').send({ name: 'Another client' })).status).toBe(403);
  });

  it('the last owner cannot be demoted or removed', async () => {
    const { agent: owner, member } = await signUpStudio(t.app);
    expect((await owner.patch(`/api/studio/members/${member.id}`).send({ role: 'designer' })).status).toBe(409);
    expect((await owner.delete(`/api/studio/members/${member.id}`)).status).toBe(409);
  });

  it('removing a member ends their sessions', async () => {
    const { agent: owner } = await signUpStudio(t.app);
    const { agent: viewer, member } = await addMember(t, owner, 'viewer');
    expect((await viewer.get('/api/projects')).status).toBe(200);
    expect((await owner.delete(`/api/studio/members/${member.id}`)).status).toBe(204);
    expect((await viewer.get('/api/projects')).status).toBe(401);
  });
});

describe('choosing a password', () => {
  const signUpWith = (password: string, email = uniqueEmail('pw')) =>
    request(t.app).post('/api/auth/sign-up').send({ studioName: 'Rule Studio', name: 'Rae', email, password });

  it('refuses short, blank and common passwords at sign-up with a message a person understands, and makes nothing', async () => {
    const cases: [string, RegExp][] = [
      ['ten-chars!', /^Use at least 12 characters\./],
      [' '.repeat(10), /^Use at least 12 characters\./],
      [' '.repeat(12), /^A password cannot be only spaces\./],
      ['\t \n'.repeat(5), /^A password cannot be only spaces\./],
      // From the common-password list, whatever the case.
      ['Password1234', /^This is one of the most common passwords/],
      ['QWERTY123456', /^This is one of the most common passwords/],
      ['1qaz2wsx3edc', /^This is one of the most common passwords/],
    ];
    for (const [password, message] of cases) {
      const email = uniqueEmail('pw');
      const res = await signUpWith(password, email);
      expect(res.status, JSON.stringify(password)).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['password']);
      expect(res.body.error.fields.password).toMatch(message);
      expect(await t.db.selectFrom('members').select('id').where('email', '=', email).executeTakeFirst()).toBeUndefined();
    }
    expect((await signUpWith('maple-window')).status).toBe(201);
  });

  it('applies the same rule when an invitation is accepted', async () => {
    const { agent: owner } = await signUpStudio(t.app);
    const email = uniqueEmail('joiner');
    await owner.post('/api/studio/invites').send({ email, role: 'designer' });
    const token = t.mail.findLast((m) => m.to === email)!.text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1];
    const accept = (password: string) => request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'Jo', password });
    expect((await accept('short-pass')).body.error.fields.password).toMatch(/at least 12 characters/);
    expect((await accept('qwerty123456')).body.error.fields.password).toMatch(/most common passwords/);
    // The refusals used nothing up: the link still works.
    expect((await accept('sunflower-oak')).status).toBe(201);
  });

  it('still signs in with a password stored before the rule, of 10 characters', async () => {
    const email = uniqueEmail('older');
    const studio = await t.db.insertInto('studios').values({ name: 'Older Studio' }).returning('id').executeTakeFirstOrThrow();
    await t.db
      .insertInto('members')
      .values({ studio_id: studio.id, email, name: 'Old Timer', role: 'owner', password_hash: await hashPassword('tenchars!!') })
      .execute();
    const res = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'tenchars!!' });
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/parlour_session=/);
  });
});

describe('sign-in throttling under parallel attempts', () => {
  // Every password check goes through this counter; wrong ones can be held at a gate.
  let checks = 0;
  let gate: Promise<void> = Promise.resolve();
  let throttled: TestApp;
  beforeAll(() => {
    throttled = createTestApp({
      verifyPassword: async (password, stored) => {
        checks += 1;
        if (password !== 'correct-horse-battery') await gate;
        return verifyPassword(password, stored);
      },
    });
  });
  afterAll(() => throttled.close());
  const attempt = (email: string, password: string) => request(throttled.app).post('/api/auth/sign-in').send({ email, password });

  it('lets at most five of 30 simultaneous wrong passwords reach the password check', async () => {
    const { email } = await signUpStudio(throttled.app);
    checks = 0;
    const answers = await Promise.all(Array.from({ length: 30 }, (_, i) => attempt(email, `wrong-${i}-password`)));
    const statuses = answers.map((r) => r.status);
    expect(checks).toBe(5);
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(25);
    expect((await attempt(email, 'correct-horse-battery')).status).toBe(429);
    expect(checks).toBe(5);
  });

  it('refuses the right password sent in the middle of a burst of wrong ones', async () => {
    const { email } = await signUpStudio(throttled.app);
    checks = 0;
    let open!: () => void;
    gate = new Promise((resolve) => {
      open = resolve;
    });
    // Eleven wrong passwords at once; the five let through are held inside the password check…
    const burst = Promise.all(Array.from({ length: 11 }, (_, i) => attempt(email, `wrong-${i}-password`)));
    await vi.waitFor(() => expect(checks).toBe(5));
    // …so the burst is still going when the right password arrives.
    const right = await attempt(email, 'correct-horse-battery');
    open();
    const statuses = (await burst).map((r) => r.status);
    expect(right.status).toBe(429);
    expect(right.body.error.message).toMatch(/Too many attempts to sign in\. Try again in \d+ minutes?\./);
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(6);
    expect(checks).toBe(5);
  });
});

describe('sign-up limit per client address', () => {
  // The configured default (SIGN_UP_LIMIT_PER_HOUR = 5), not the raised figure of the other test apps.
  let limited: TestApp;
  beforeAll(() => {
    limited = createTestApp({ env: { SIGN_UP_LIMIT_PER_HOUR: undefined } });
  });
  afterAll(() => limited.close());
  // Addresses from the documentation ranges (RFC 5737, RFC 3849), made unique per run: the
  // counter lives in the shared test database.
  const run = (process.pid % 250) + 1;
  const signUpFrom = (address: string, email = uniqueEmail('limit')) =>
    request(limited.app)
      .post('/api/auth/sign-up')
      .set('X-Forwarded-For', address)
      .send({ studioName: 'Many Studios', name: 'Mo', email, password: 'correct-horse-battery' });

  it('makes five studios an hour from one address, then answers 429 with Retry-After and makes nothing', async () => {
    const address = `198.51.100.${run}`;
    for (let i = 0; i < 5; i += 1) expect((await signUpFrom(address)).status).toBe(201);
    const email = uniqueEmail('sixth');
    const refused = await signUpFrom(address, email);
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(
      /Too many new studios were made from this address\. Try again in \d+ (minutes?|hours)\./,
    );
    const retryAfter = Number(refused.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(2 * 3600);
    expect(await limited.db.selectFrom('members').select('id').where('email', '=', email).executeTakeFirst()).toBeUndefined();
    // Another address has its own count.
    expect((await signUpFrom(`203.0.113.${run}`)).status).toBe(201);
  });

  it('counts an IPv6 /64 as one address', async () => {
    const net = `2001:db8:${run.toString(16)}:1`;
    for (let i = 0; i < 5; i += 1) expect((await signUpFrom(`${net}::${i + 1}`)).status).toBe(201);
    expect((await signUpFrom(`${net}::ffff`)).status).toBe(429);
    expect((await signUpFrom(`2001:db8:${run.toString(16)}:2::1`)).status).toBe(201);
  });
});
