// Mail Parlour sends from its own address to people outside a studio: presentation mails per
// studio per day (fewer on a studio's first day), and mails per recipient across every studio,
// presentations and invitations together. Counted in PostgreSQL; a refusal sends and counts nothing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import {
  NEW_STUDIO_PRESENTATION_MAIL_LIMIT,
  PRESENTATION_MAIL_RATE,
  RECIPIENT_MAIL_RATE,
  recipientKey,
} from '../../server/services/rate-limit/mail-limits';
import { createTestApp, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';
import { presentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;
let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

async function studio(name: string, ageDays = 0) {
  const { agent } = await signUpStudio(t.app, name);
  const studioId = (await agent.get('/api/auth/me')).body.studio.id as string;
  if (ageDays)
    await t.db
      .updateTable('studios')
      .set({ created_at: new Date(Date.now() - ageDays * 86_400_000) })
      .where('id', '=', studioId)
      .execute();
  const { presentationId } = await presentedProject(agent);
  return { agent, studioId, presentationId };
}

const send = (s: { agent: Agent; presentationId: string }, to: string) =>
  s.agent.post(`/api/presentations/${s.presentationId}/send`).send({ to });
const invite = (agent: Agent, email: string) => agent.post('/api/studio/invites').send({ email, role: 'designer' });

function expectTooMany(res: request.Response, message: RegExp) {
  expect(res.status).toBe(429);
  expect(res.body.error.code).toBe('too_many');
  expect(res.body.error.message).toMatch(message);
  const retryAfter = Number(res.headers['retry-after']);
  expect(retryAfter).toBeGreaterThan(0);
  expect(retryAfter).toBeLessThanOrEqual(2 * 86_400);
}

async function counted(bucket: string, key: string): Promise<number> {
  const rows = await t.db
    .selectFrom('rate_limit_counts')
    .select('count')
    .where('bucket', '=', bucket)
    .where('key', '=', key)
    .execute();
  return rows.reduce((n, r) => n + r.count, 0);
}

describe('presentation mails per studio', () => {
  it('a studio younger than a day sends 10 a day, then 429 and no mail', async () => {
    expect(NEW_STUDIO_PRESENTATION_MAIL_LIMIT).toBe(10);
    const s = await studio('Fresh Studio');
    for (let i = 0; i < 10; i += 1) expect((await send(s, uniqueEmail('stranger'))).status).toBe(200);
    const to = uniqueEmail('stranger');
    expectTooMany(
      await send(s, to),
      /Your studio has sent 10 presentation e-mails today, the limit for its first day\. Try again in .+, or copy the link/,
    );
    expect(t.mail.some((m) => m.to === to)).toBe(false);
    // The presentation keeps its last real send.
    const row = await t.db
      .selectFrom('presentations')
      .select('sent_to')
      .where('id', '=', s.presentationId)
      .executeTakeFirstOrThrow();
    expect(row.sent_to).not.toBe(to);
  });

  it('an established studio sends 50 a day, then 429; another studio has its own count', async () => {
    expect(PRESENTATION_MAIL_RATE.limit).toBe(50);
    const s = await studio('Settled Studio', 3);
    for (let i = 0; i < 50; i += 1) expect((await send(s, uniqueEmail('client'))).status).toBe(200);
    expectTooMany(await send(s, uniqueEmail('client')), /Your studio has sent 50 presentation e-mails today\. Try again in/);
    const other = await studio('Neighbour Studio', 3);
    expect((await send(other, uniqueEmail('client'))).status).toBe(200);
  });
});

describe('mails to one address from every studio together', () => {
  it('three a day, presentations and invitations alike, whatever the case or +tag; the fourth is refused and counts nothing', async () => {
    expect(RECIPIENT_MAIL_RATE.limit).toBe(3);
    const address = uniqueEmail('target');
    const [local, domain] = address.split('@');
    const a = await studio('First Sender');
    const b = await studio('Second Sender');
    const c = await studio('Third Sender');
    expect((await send(a, address)).status).toBe(200);
    expect((await invite(b.agent, address.toUpperCase())).status).toBe(201);
    expect((await send(c, `${local}+offer@${domain}`)).status).toBe(200);
    await t.settled();
    expect(t.mail.filter((m) => recipientKey(m.to) === address)).toHaveLength(3);

    const before = await counted(PRESENTATION_MAIL_RATE.bucket, a.studioId);
    expectTooMany(
      await send(a, address),
      new RegExp(
        `${address.replace(/[.+]/g, '\\$&')} has already been sent 3 e-mails from Parlour today\\. Try again in .+, or copy the link`,
      ),
    );
    // Refused for its recipient, so the studio's own allowance is untouched.
    expect(await counted(PRESENTATION_MAIL_RATE.bucket, a.studioId)).toBe(before);
    const invited = await invite(c.agent, address);
    expectTooMany(invited, /has already been sent 3 e-mails from Parlour today\. Try again in [^,]+\.$/);
    await t.settled();
    expect(t.mail.filter((m) => recipientKey(m.to) === address)).toHaveLength(3);
    // Nothing half-made: the refused invitation is not in the studio's list.
    const open = await c.agent.get('/api/studio/invites');
    expect(open.body.invites.map((i: { email: string }) => i.email)).not.toContain(address);
    // Another address is unaffected.
    expect((await send(a, uniqueEmail('other'))).status).toBe(200);
  });

  it('counts an address by its mailbox', () => {
    expect(recipientKey(' Ida.Quill+Flat@Example.com ')).toBe('ida.quill@example.com');
    expect(recipientKey('+only@example.com')).toBe('+only@example.com');
    expect(recipientKey('plain@example.com')).toBe('plain@example.com');
  });
});
