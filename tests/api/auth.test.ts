import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { addMember, createTestApp, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('sign-up, sign-in and sign-out', () => {
  it('signs up a studio owner and keeps them signed in with an httpOnly SameSite cookie', async () => {
    const agent = request.agent(t.app);
    const email = uniqueEmail('signup');
    const res = await agent.post('/api/auth/sign-up').send({ studioName: 'Fern Studio', name: 'Ada', email, password: 'long-enough-pass' });
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
    const res = await request(t.app).post('/api/auth/sign-up').send({ studioName: 'X', name: 'Y', email: email.toUpperCase(), password: 'long-enough-pass' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.email).toBeTruthy();
  });

  it('answers invalid bodies with 400 and a message per field', async () => {
    const res = await request(t.app).post('/api/auth/sign-up').send({ studioName: '', name: 'A', email: 'not-an-email', password: 'short' });
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
    const unknown = await request(t.app).post('/api/auth/sign-in').send({ email: uniqueEmail('nobody'), password: 'not-the-password' });
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
    const right = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'correct-horse-battery' });
    expect(right.status).toBe(200);
  });

  it('locks sign-in for an e-mail after five wrong passwords, even with the right one', async () => {
    const { email } = await signUpStudio(t.app);
    for (let i = 0; i < 5; i += 1) {
      expect((await request(t.app).post('/api/auth/sign-in').send({ email, password: `wrong-${i}-password` })).status).toBe(401);
    }
    const locked = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'correct-horse-battery' });
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toMatch(/Try again in \d+ minute/);
  });

  it('sign-out revokes the session at once', async () => {
    const { agent } = await signUpStudio(t.app);
    const cookie = (await agent.get('/api/auth/me')).request.getHeader?.('cookie');
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    // Replaying the old cookie does not work either.
    if (typeof cookie === 'string') expect((await request(t.app).get('/api/auth/me').set('cookie', cookie)).status).toBe(401);
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
    expect((await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'V', password: 'correct-horse-battery' })).status).toBe(201);
    const again = await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'V', password: 'correct-horse-battery' });
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
