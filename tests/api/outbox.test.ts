// The Outbox as each studio's own sent-mail folder: recorded per studio by the app, read only by
// signed-in members (invitations by owners only, client links not by viewers), one page at a time.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import type { OutboxPage, OutboxSummary } from '../../shared/schemas/outbox';
import { addMember, createTestApp, mailTo, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;
const SQUARE = {
  outline: [
    [0, 0],
    [3000, 0],
    [3000, 3000],
    [0, 3000],
  ],
};
// The Outbox is on when the stand-in's folder is configured; the app never reads that folder.
const LOCAL = { OUTBOX_DIR: '/nonexistent/outbox' };

let t: TestApp;
let owner: Agent;
let designer: Agent;
let viewer: Agent;
let studioId: string;
let inviteeEmail: string;
let clientEmail: string;
let stranger: Agent;

/** A project with one room, a presentation made and e-mailed to the client, and the client's choice. */
async function presentAndChoose(agent: Agent, to: string) {
  const project = await agent.post('/api/projects').send({ name: 'Sorrel house', newClient: { name: 'Ines Marr', email: to } });
  const room = await agent.post(`/api/projects/${project.body.project.id}/rooms`).send({ name: 'Hall', shell: SQUARE });
  const optionId = room.body.options[0].id as string;
  const made = await agent
    .post(`/api/projects/${project.body.project.id}/presentations`)
    .send({ rooms: [{ roomId: room.body.room.id, optionIds: [optionId] }] });
  expect((await agent.post(`/api/presentations/${made.body.presentation.id}/send`).send({})).status).toBe(200);
  const token = new URL(made.body.presentation.link as string).pathname.split('/').pop()!;
  expect((await request(t.app).put(`/api/p/${token}/rooms/${room.body.room.id}/choice`).send({ optionId })).status).toBe(200);
  // The designer's notice goes through the job queue.
  await t.settled();
  return made.body.presentation.link as string;
}

const list = async (agent: Agent, query = '') => {
  const res = await agent.get(`/api/outbox${query}`);
  expect(res.status).toBe(200);
  return res.body as OutboxPage;
};
const kindsOf = (page: OutboxPage) => [...new Set(page.messages.map((m) => m.kind))].sort();

beforeAll(async () => {
  t = createTestApp({ env: LOCAL });
  const a = await signUpStudio(t.app, 'Quill & Moss');
  owner = a.agent;
  designer = (await addMember(t, owner, 'designer')).agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
  ({ studio_id: studioId } = await t.db
    .selectFrom('members')
    .select('studio_id')
    .where('email', '=', a.email)
    .executeTakeFirstOrThrow());
  inviteeEmail = uniqueEmail('invitee');
  expect((await owner.post('/api/studio/invites').send({ email: inviteeEmail, role: 'designer' })).status).toBe(201);
  clientEmail = uniqueEmail('client');
  await presentAndChoose(owner, clientEmail);
  // Another studio's mail, which studio A must never see.
  const b = await signUpStudio(t.app, 'Other Rooms');
  stranger = b.agent;
  await b.agent.post('/api/studio/invites').send({ email: uniqueEmail('their-invitee'), role: 'owner' });
  await presentAndChoose(b.agent, uniqueEmail('their-client'));
});
afterAll(() => t.close());

describe('the Outbox', () => {
  it('answers 401 signed out, for the list and for a message', async () => {
    const row = await t.db.selectFrom('sent_mail').select('id').where('studio_id', '=', studioId).executeTakeFirstOrThrow();
    const listed = await request(t.app).get('/api/outbox');
    expect(listed.status).toBe(401);
    expect(listed.body.messages).toBeUndefined();
    const one = await request(t.app).get(`/api/outbox/${row.id}`);
    expect(one.status).toBe(401);
    expect(JSON.stringify(one.body)).not.toMatch(/invite|\/p\//);
  });

  it('records every message the app sends with its studio and kind', async () => {
    const rows = await t.db.selectFrom('sent_mail').selectAll().where('studio_id', '=', studioId).execute();
    const byKind = (k: string) => rows.filter((r) => r.kind === k);
    // Two member invitations in the set-up, then the pending one.
    expect(byKind('invitation').map((r) => r.recipient)).toContain(inviteeEmail);
    expect(byKind('invitation')).toHaveLength(3);
    expect(byKind('presentation').map((r) => r.recipient)).toEqual([clientEmail]);
    expect(byKind('choice')).toHaveLength(1);
    // The record holds what was sent, word for word.
    const sent = await mailTo(t, inviteeEmail);
    expect(byKind('invitation').find((r) => r.recipient === inviteeEmail)).toMatchObject({
      subject: sent.subject,
      text_body: sent.text,
      html_body: sent.html,
    });
  });

  it('shows an owner every kind of their studio’s mail, and nothing of another studio’s', async () => {
    const page = await list(owner);
    expect(kindsOf(page)).toEqual(['choice', 'invitation', 'presentation']);
    expect(page.messages.map((m) => m.to)).toContain(inviteeEmail);
    expect(page.messages.some((m) => /their-/.test(m.to))).toBe(false);
    const theirs = await list(stranger);
    expect(theirs.messages.some((m) => m.to === inviteeEmail || m.to === clientEmail)).toBe(false);
    // A message of studio A asked for by studio B's owner: as if it did not exist.
    const invitation = page.messages.find((m) => m.to === inviteeEmail)!;
    expect((await stranger.get(`/api/outbox/${invitation.id}`)).status).toBe(404);
    const opened = await owner.get(`/api/outbox/${invitation.id}`);
    expect(opened.status).toBe(200);
    expect(opened.body.message.text).toMatch(/http:\/\/parlour\.test\/invite\/[\w-]+/);
  });

  it('keeps invitations from designers and viewers, and client links from viewers', async () => {
    const all = (await list(owner)).messages;
    const idOf = (kind: string) => all.find((m) => m.kind === kind)!.id;
    expect(kindsOf(await list(designer))).toEqual(['choice', 'presentation']);
    expect(kindsOf(await list(viewer))).toEqual(['choice']);
    expect((await designer.get(`/api/outbox/${idOf('invitation')}`)).status).toBe(404);
    expect((await designer.get(`/api/outbox/${idOf('presentation')}`)).status).toBe(200);
    expect((await viewer.get(`/api/outbox/${idOf('invitation')}`)).status).toBe(404);
    expect((await viewer.get(`/api/outbox/${idOf('presentation')}`)).status).toBe(404);
    const choice = await viewer.get(`/api/outbox/${idOf('choice')}`);
    expect(choice.status).toBe(200);
    expect(choice.body.message.text).not.toMatch(/\/p\/|\/invite\//);
  });

  it('pages through many messages newest first, none twice or left out, ties broken by id', async () => {
    const paged = await signUpStudio(t.app, 'Paged');
    const { studio_id: pagedId } = await t.db
      .selectFrom('members')
      .select('studio_id')
      .where('email', '=', paged.email)
      .executeTakeFirstOrThrow();
    // 45 messages, five at each of nine instants: pages must not split ties wrongly.
    const base = Date.now() - 3_600_000;
    const rows = Array.from({ length: 45 }, (_, i) => ({
      studio_id: pagedId,
      kind: 'choice' as const,
      sender: 'Parlour <no-reply@parlour.local>',
      recipient: `n${i}@example.com`,
      subject: `Message ${i}`,
      text_body: `Body ${i}`,
      html_body: null,
      created_at: new Date(base + Math.floor(i / 5) * 1000),
    }));
    await t.db.insertInto('sent_mail').values(rows).execute();
    const seen: OutboxSummary[] = [];
    const sizes: number[] = [];
    let next: string | null = '';
    while (next !== null) {
      const page: OutboxPage = await list(paged.agent, next ? `?before=${next}` : '');
      sizes.push(page.messages.length);
      seen.push(...page.messages);
      next = page.next;
    }
    expect(sizes).toEqual([20, 20, 5]);
    expect(new Set(seen.map((m) => m.id)).size).toBe(45);
    const order = seen.map((m) => [m.sentAt, m.id].join(' '));
    expect(order).toEqual([...order].sort().reverse());
    expect(seen[0].subject).toMatch(/^Message 4[0-4]$/);
    expect(seen[0].preview).toMatch(/^Body 4[0-4]$/);
    // A smaller page size on request.
    const small = await list(paged.agent, '?limit=7');
    expect(small.messages).toHaveLength(7);
    expect(small.next).not.toBeNull();
  });

  it('refuses a page that is not one, naming the field', async () => {
    const bad = await owner.get('/api/outbox?before=yesterday');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.before).toMatch(/Not a page/);
    const big = await owner.get('/api/outbox?limit=5000');
    expect(big.status).toBe(400);
    expect(big.body.error.fields.limit).toMatch(/at most 50/);
    expect((await owner.get('/api/outbox/not-an-id')).status).toBe(400);
    expect((await owner.get(`/api/outbox/${randomUUID()}`)).status).toBe(404);
  });
});

describe('mail that was not sent', () => {
  it('keeps the invitation and shows its mail as failing while the mail server refuses it; nothing is listed as sent', async () => {
    const refused = createTestApp({ env: LOCAL, refuseMail: (m) => m.to.startsWith('bounce-') });
    try {
      const studio = await signUpStudio(refused.app, 'Bounce Studio');
      const email = uniqueEmail('bounce');
      const res = await studio.agent.post('/api/studio/invites').send({ email, role: 'designer' });
      // Invitations go through the job queue: the designer's answer does not wait for the mail server.
      expect(res.status).toBe(201);
      expect(res.body.invite.mailState).toBe('sending');
      await refused.settled();
      const [listed] = (await studio.agent.get('/api/studio/invites')).body.invites;
      expect(listed).toMatchObject({ email, mailState: 'failing' });
      const queued = await refused.db
        .selectFrom('queued_mail')
        .selectAll()
        .where('recipient', '=', email)
        .executeTakeFirstOrThrow();
      expect(queued).toMatchObject({ kind: 'invitation', state: 'failing', attempts: 1, invite_id: listed.id });
      expect(queued.last_error).toMatch(/550 mailbox unavailable/);
      expect(await refused.db.selectFrom('sent_mail').select('id').where('recipient', '=', email).execute()).toEqual([]);
      // Cancelling the invitation takes its unsent mail with it: it is never sent later.
      expect((await studio.agent.delete(`/api/studio/invites/${listed.id}`)).status).toBe(204);
      expect(await refused.db.selectFrom('queued_mail').select('id').where('recipient', '=', email).execute()).toEqual([]);
    } finally {
      await refused.close();
    }
  });
});

describe('with a real mail service', () => {
  it('has no Outbox and records nothing', async () => {
    const real = createTestApp();
    try {
      const studio = await signUpStudio(real.app, 'Real Mail Studio');
      expect((await studio.agent.get('/api/auth/me')).body.outbox).toBe(false);
      const email = uniqueEmail('real');
      expect((await studio.agent.post('/api/studio/invites').send({ email, role: 'viewer' })).status).toBe(201);
      await real.settled();
      expect(real.mail.some((m) => m.to === email)).toBe(true);
      expect(await real.db.selectFrom('sent_mail').select('id').where('recipient', '=', email).execute()).toEqual([]);
      const res = await studio.agent.get('/api/outbox');
      expect(res.status).toBe(404);
      expect((await request(real.app).get('/api/outbox')).status).toBe(401);
    } finally {
      await real.close();
    }
  });
});
