// Invitation links are single-use and expire: a second acceptance (one after the other, or both at
// once) and an expired link are refused, and neither leaves a member behind.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import request from 'supertest';
import { sql } from 'kysely';
import { createDb } from '../../server/db/database';
import { createTestApp, inviteToken, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

/** Invites a fresh address into a fresh studio and returns the link's token from the mail. */
async function invite(role: 'designer' | 'viewer' = 'designer') {
  const { agent } = await signUpStudio(t.app, 'Single Use Studio');
  const email = uniqueEmail('invited');
  expect((await agent.post('/api/studio/invites').send({ email, role })).status).toBe(201);
  const token = await inviteToken(t, email);
  return { owner: agent, email, token };
}

const accept = (token: string, name = 'Rhea Joiner') =>
  request(t.app).post(`/api/invites/${token}/accept`).send({ name, password: 'correct-horse-battery' });
const membersWith = (email: string) =>
  t.db.selectFrom('members').select(['id', 'name', 'role']).where('email', '=', email).execute();

describe('invitation links', () => {
  it('work once: accepting again is refused and signs nobody in', async () => {
    const { email, token } = await invite();
    expect((await accept(token)).status).toBe(201);
    const again = await accept(token, 'Someone Else');
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invite_used');
    expect(String(again.headers['set-cookie'] ?? '')).not.toMatch(/parlour_session=[^;]/);
    expect((await request(t.app).get(`/api/invites/${token}`)).status).toBe(410);
    expect(await membersWith(email)).toEqual([expect.objectContaining({ name: 'Rhea Joiner', role: 'designer' })]);
  });

  it('work once even when several acceptances arrive at the same moment', async () => {
    const { email, token } = await invite();
    // Another connection holds the invitation's row while three acceptances arrive, so all three
    // are in flight together when it lets go: the race happens every run, not by luck.
    const side = createDb(inject('databaseUrl'), 2);
    try {
      const answers = await side.transaction().execute(async (trx) => {
        await trx.selectFrom('invites').select('id').where('email', '=', email).forUpdate().execute();
        const inFlight = Promise.all(['First Hand', 'Second Hand', 'Third Hand'].map((name) => accept(token, name)));
        await expect
          .poll(
            async () => {
              const r = await sql<{
                n: string;
              }>`select count(*) as n from pg_stat_activity where datname = current_database() and wait_event_type = 'Lock'`.execute(
                side,
              );
              return Number(r.rows[0].n);
            },
            { timeout: 10_000, interval: 20 },
          )
          .toBeGreaterThanOrEqual(3);
        return { inFlight };
      });
      const statuses = (await answers.inFlight).map((a) => a.status).sort();
      expect(statuses).toEqual([201, 410, 410]);
    } finally {
      await side.destroy();
    }
    expect(await membersWith(email)).toHaveLength(1);
  });

  it('expire: an old link is refused, to look at and to accept, and makes no member', async () => {
    const { owner, email, token } = await invite('viewer');
    await t.db
      .updateTable('invites')
      .set({ expires_at: new Date(Date.now() - 1000) })
      .where('email', '=', email)
      .execute();
    const looked = await request(t.app).get(`/api/invites/${token}`);
    expect(looked.status).toBe(410);
    expect(looked.body.error.code).toBe('invite_expired');
    const res = await accept(token);
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/);
    expect(await membersWith(email)).toEqual([]);
    // No longer listed as open on the Studio page either.
    expect((await owner.get('/api/studio/invites')).body.invites.map((i: { email: string }) => i.email)).not.toContain(email);
  });

  it('expire fourteen days after they are sent', async () => {
    const { email } = await invite();
    const row = await t.db
      .selectFrom('invites')
      .select(['created_at', 'expires_at'])
      .where('email', '=', email)
      .executeTakeFirstOrThrow();
    const days = (row.expires_at.getTime() - row.created_at.getTime()) / 86_400_000;
    expect(days).toBeGreaterThan(13.99);
    expect(days).toBeLessThan(14.01);
  });
});
