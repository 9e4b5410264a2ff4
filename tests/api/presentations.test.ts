// Presentations end to end through the API: what the designer makes and sees, what the client's
// link shows (and never shows), every kind of bad token, choices, limits and the project's state.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { SignJWT } from 'jose';
import { sql } from 'kysely';
import { decodeKey, loadConfig } from '../../server/config';
import { PRESENTATION_AUDIENCE, PRESENTATION_ISSUER, PRESENTATION_TYP } from '../../server/services/tokens/presentation-token';
import type { ClientPresentation, PresentationSummary } from '../../shared/schemas/presentation';
import { CHOICE_RATE, VIEW_RATE } from '../../server/features/presentations/client.service';
import type { RateRule } from '../../server/services/rate-limit/rate-limit';
import { TEST_PRESENTATION_KEY, addMember, createTestApp, signUpStudio, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;
const KEY = new Uint8Array(Buffer.from(TEST_PRESENTATION_KEY, 'hex'));
const SQUARE = {
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3500],
    [0, 3500],
  ],
};

let t: TestApp;
let owner: Agent;
let designer: Agent;
let designerEmail: string;
let viewer: Agent;

interface Flat {
  projectId: string;
  rooms: { id: string; options: { id: string; version: number }[] }[];
  finishId: string;
}

beforeAll(async () => {
  t = createTestApp();
  const a = await signUpStudio(t.app, 'Marrow & Finch');
  owner = a.agent;
  const d = await addMember(t, owner, 'designer');
  designer = d.agent;
  designerEmail = d.email;
  viewer = (await addMember(t, owner, 'viewer')).agent;
});
afterAll(() => t.close());

const piece = (id: string, extra: object = {}) => ({
  id,
  name: `Piece ${id}`,
  x: 1500,
  y: 1500,
  width: 900,
  depth: 600,
  height: 800,
  status: 'new',
  price: 640,
  supplierUrl: 'https://supplier.example/item',
  ...extra,
});

/** A project with two rooms of three options each; every option has priced pieces, one with a finish, one in the holding area. */
async function makeFlat(agent: Agent, clientEmail: string | null = 'client@example.com'): Promise<Flat> {
  const project = await agent
    .post('/api/projects')
    .send({ name: 'Larkspur flat', newClient: { name: 'Ada and Rui Penhale', email: clientEmail ?? '' } });
  const projectId = project.body.project.id as string;
  const paint = await agent.post('/api/finishes/paints').send({ name: 'Moss velvet', colourHex: '#5a6b4a' });
  const finishId = paint.body.finish.id as string;
  const rooms: Flat['rooms'] = [];
  for (const name of ['Sitting room', 'Bedroom']) {
    const room = await agent.post(`/api/projects/${projectId}/rooms`).send({ name, shell: SQUARE });
    const options = [room.body.options[0]];
    for (const optionName of ['Linen', 'Walnut']) {
      options.push((await agent.post(`/api/rooms/${room.body.room.id}/options`).send({ name: optionName })).body.option);
    }
    const saved = [];
    for (const [i, o] of options.entries()) {
      const doc = { pieces: [piece(`p${i}`, { finishId }), piece(`q${i}`), piece(`held${i}`, { placed: false })] };
      const res = await agent.put(`/api/options/${o.id}`).send({ doc, version: o.version, note: `Note ${i}` });
      expect(res.status).toBe(200);
      saved.push({ id: res.body.option.id, version: res.body.option.version });
    }
    rooms.push({ id: room.body.room.id, options: saved });
  }
  return { projectId, rooms, finishId };
}

async function present(agent: Agent, flat: Flat, extra: object = {}): Promise<PresentationSummary> {
  const res = await agent.post(`/api/projects/${flat.projectId}/presentations`).send({
    // Room 1: its third option first, then its first; room 2: its second only.
    rooms: [
      { roomId: flat.rooms[0].id, optionIds: [flat.rooms[0].options[2].id, flat.rooms[0].options[0].id] },
      { roomId: flat.rooms[1].id, optionIds: [flat.rooms[1].options[1].id] },
    ],
    message: 'Here are the two rooms. Take your time.',
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.presentation;
}

const tokenOf = (p: PresentationSummary) => p.link!.split('/p/')[1];
const openLink = (token: string) => request(t.app).get(`/api/p/${token}`);
const choose = (token: string, roomId: string, optionId: string, comment = '') =>
  request(t.app).put(`/api/p/${token}/rooms/${roomId}/choice`).send({ optionId, comment });
/** A link's posts counted under `rule`, over every window still kept. */
async function linkCount(rule: RateRule, presentationId: string): Promise<number> {
  const r = await t.db
    .selectFrom('rate_limit_counts')
    .select((eb) => eb.fn.sum<string>('count').as('n'))
    .where('bucket', '=', rule.bucket)
    .where('key', '=', presentationId)
    .executeTakeFirstOrThrow();
  return Number(r.n);
}
const b64 = (v: object) => Buffer.from(JSON.stringify(v)).toString('base64url');

async function tokenIdOf(p: PresentationSummary): Promise<string> {
  return (await t.db.selectFrom('presentations').select('token_id').where('id', '=', p.id).executeTakeFirstOrThrow()).token_id;
}

/** A token signed with the right key, with any header and claims a test wants. */
function craft(
  claims: { jti: string; aud?: string; iss?: string; exp?: number; iat?: number },
  typ = PRESENTATION_TYP,
  key = KEY,
) {
  const now = Math.floor(Date.now() / 1000);
  return new SignJWT({})
    .setProtectedHeader({ alg: 'HS256', typ })
    .setJti(claims.jti)
    .setAudience(claims.aud ?? PRESENTATION_AUDIENCE)
    .setIssuer(claims.iss ?? PRESENTATION_ISSUER)
    .setIssuedAt(claims.iat ?? now - 60)
    .setExpirationTime(claims.exp ?? now + 3600)
    .sign(key);
}

/** A refusal: the status, one plain message, and nothing of the presentation. */
function expectRefused(res: request.Response, status: number) {
  expect(res.status).toBe(status);
  expect(Object.keys(res.body)).toEqual(['error']);
  expect(res.body.error.message).toMatch(/link/i);
  expect(JSON.stringify(res.body)).not.toMatch(/Larkspur|Marrow|Sitting|Penhale|jwt|signature|audience|expired at|alg/i);
}

describe('designer makes and sends a presentation', () => {
  it('creates one with rooms and options in order, e-mails the client, and the project is presented', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    expect(p).toMatchObject({
      state: 'active',
      showPrices: false,
      openCount: 0,
      firstOpenedAt: null,
      createdBy: 'Member designer',
      complete: false,
    });
    expect(p.rooms.map((r) => r.roomId)).toEqual([flat.rooms[0].id, flat.rooms[1].id]);
    expect(p.rooms[0].options.map((o) => o.label)).toEqual(['Option A · Walnut', 'Option B']);
    // The default expiry is 30 days.
    expect(new Date(p.expiresAt).getTime() - new Date(p.createdAt).getTime()).toBeGreaterThan(29.9 * 86_400_000);
    expect(new Date(p.expiresAt).getTime() - new Date(p.createdAt).getTime()).toBeLessThan(30.1 * 86_400_000);
    expect((await designer.get(`/api/projects/${flat.projectId}`)).body.project.state).toBe('presented');

    const sent = await designer.post(`/api/presentations/${p.id}/send`).send({});
    expect(sent.status).toBe(200);
    expect(sent.body.presentation).toMatchObject({ sentTo: 'client@example.com' });
    const mail = t.mail.findLast((m) => m.to === 'client@example.com')!;
    expect(mail.subject).toBe('Marrow & Finch: your options for Larkspur flat');
    expect(mail.text).toContain(p.link);
    expect(mail.text).toContain('Here are the two rooms. Take your time.');
    // The designer's message is the greeting: nothing is put above it.
    expect(mail.text.startsWith('Here are the two rooms.')).toBe(true);
    expect(mail.html).toContain('Marrow &amp; Finch');
  });

  it('refuses rooms of another project and options of another room, naming the field', async () => {
    const flat = await makeFlat(designer);
    const other = await makeFlat(designer);
    const wrongRoom = await designer
      .post(`/api/projects/${flat.projectId}/presentations`)
      .send({ rooms: [{ roomId: other.rooms[0].id, optionIds: [other.rooms[0].options[0].id] }] });
    expect(wrongRoom.status).toBe(400);
    expect(wrongRoom.body.error.fields).toEqual({ 'rooms[0].roomId': 'Not a room of this project.' });
    const wrongOption = await designer
      .post(`/api/projects/${flat.projectId}/presentations`)
      .send({ rooms: [{ roomId: flat.rooms[0].id, optionIds: [flat.rooms[1].options[0].id] }] });
    expect(wrongOption.status).toBe(400);
    expect(wrongOption.body.error.fields).toEqual({ 'rooms[0].optionIds': 'Pick options of this room only.' });
    const twice = await designer.post(`/api/projects/${flat.projectId}/presentations`).send({
      rooms: [{ roomId: flat.rooms[0].id, optionIds: [flat.rooms[0].options[0].id, flat.rooms[0].options[0].id] }],
      expiresInDays: 0,
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.fields).toMatchObject({
      'rooms[0].optionIds': 'Each option once.',
      expiresInDays: 'At least 1 day.',
    });
    // Nothing was made by the refused requests.
    expect((await designer.get(`/api/projects/${flat.projectId}/presentations`)).body.presentations).toEqual([]);
    expect((await designer.get(`/api/projects/${flat.projectId}`)).body.project.state).toBe('draft');
  });

  it('sending without a client e-mail asks for one', async () => {
    const flat = await makeFlat(designer, null);
    const p = await present(designer, flat);
    const res = await designer.post(`/api/presentations/${p.id}/send`).send({});
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ to: 'Enter the client’s e-mail.' });
    expect((await designer.post(`/api/presentations/${p.id}/send`).send({ to: 'someone@example.com' })).status).toBe(200);
  });

  it('viewers see presentations and choices but not the link, and cannot create, send or withdraw', async () => {
    const flat = await makeFlat(owner);
    const p = await present(owner, flat);
    const list = await viewer.get(`/api/projects/${flat.projectId}/presentations`);
    expect(list.status).toBe(200);
    expect(list.body.presentations[0]).toMatchObject({ id: p.id, link: null });
    expect(
      (
        await viewer
          .post(`/api/projects/${flat.projectId}/presentations`)
          .send({ rooms: [{ roomId: flat.rooms[0].id, optionIds: [flat.rooms[0].options[0].id] }] })
      ).status,
    ).toBe(403);
    expect((await viewer.post(`/api/presentations/${p.id}/withdraw`)).status).toBe(403);
    expect((await viewer.post(`/api/presentations/${p.id}/send`).send({})).status).toBe(403);
    expect((await openLink(tokenOf(p))).status).toBe(200);
  });
});

describe('what the client link shows', () => {
  let flat: Flat;
  let p: PresentationSummary;
  let body: ClientPresentation;
  let raw: string;

  beforeAll(async () => {
    flat = await makeFlat(designer);
    p = await present(designer, flat);
    const res = await openLink(tokenOf(p));
    expect(res.status).toBe(200);
    body = res.body.presentation;
    raw = JSON.stringify(res.body);
  });

  it('shows the studio name, project and message, and only the chosen rooms and options in order', () => {
    expect(body).toMatchObject({
      studioName: 'Marrow & Finch',
      projectName: 'Larkspur flat',
      message: 'Here are the two rooms. Take your time.',
      showPrices: false,
      decided: false,
    });
    expect(body.rooms.map((r) => r.name)).toEqual(['Sitting room', 'Bedroom']);
    expect(body.rooms[0].options.map((o) => [o.id, o.label, o.note])).toEqual([
      [flat.rooms[0].options[2].id, 'Option A · Walnut', 'Note 2'],
      [flat.rooms[0].options[0].id, 'Option B', 'Note 0'],
    ]);
    expect(body.rooms[1].options.map((o) => o.id)).toEqual([flat.rooms[1].options[1].id]);
    expect(body.rooms[0].shell.outline).toEqual(SQUARE.outline);
  });

  it('never carries unselected options, hidden prices, supplier links, finish ids or other records’ ids', async () => {
    for (const hidden of [flat.rooms[0].options[1].id, flat.rooms[1].options[0].id, flat.rooms[1].options[2].id])
      expect(raw).not.toContain(hidden);
    expect(raw).not.toContain('price');
    expect(raw).not.toContain('supplier');
    expect(raw).not.toContain('finishId');
    expect(raw).not.toContain(flat.finishId);
    expect(raw).not.toContain(flat.projectId);
    expect(raw).not.toContain(p.id);
    const { studio_id } = await t.db
      .selectFrom('presentations')
      .select('studio_id')
      .where('id', '=', p.id)
      .executeTakeFirstOrThrow();
    expect(raw).not.toContain(studio_id);
    expect(raw).not.toContain(designerEmail);
    expect(raw).not.toContain('client@example.com');
    // Holding-area pieces are the designer's, not part of the proposal.
    expect(body.rooms[0].options[0].pieces.map((x) => x.id)).toEqual(['p2', 'q2']);
    expect(body.rooms[0].options[0].pieces[0].finish).toEqual({ name: 'Moss velvet', colourHex: '#5a6b4a' });
    expect(body.rooms[0].options[0].pieces[1].finish).toBeNull();
  });

  it('shows prices when the designer chose to, and still no supplier links', async () => {
    const priced = await present(designer, flat, { showPrices: true });
    const res = await openLink(tokenOf(priced));
    expect(res.body.presentation.rooms[0].options[0].pieces[0].price).toBe(640);
    expect(JSON.stringify(res.body)).not.toContain('supplier');
  });

  it('records when it was opened, and which options were looked at, but not the studio’s own visits', async () => {
    const token = tokenOf(p);
    await openLink(token);
    const viewed = await request(t.app).post(`/api/p/${token}/views`).send({ optionId: flat.rooms[0].options[0].id });
    expect(viewed.status).toBe(204);
    expect((await request(t.app).post(`/api/p/${token}/views`).send({ optionId: flat.rooms[0].options[1].id })).status).toBe(404);
    expect((await request(t.app).post(`/api/p/${token}/views`).send({ optionId: 'not-an-id' })).status).toBe(400);
    // The designer checking the link from a signed-in browser.
    await designer.get(`/api/p/${token}`);
    await designer.post(`/api/p/${token}/views`).send({ optionId: flat.rooms[0].options[0].id });

    const [summary] = (await designer.get(`/api/projects/${flat.projectId}/presentations`)).body.presentations.filter(
      (x: PresentationSummary) => x.id === p.id,
    );
    expect(summary.openCount).toBe(2);
    expect(summary.firstOpenedAt).not.toBeNull();
    expect(new Date(summary.lastOpenedAt).getTime()).toBeGreaterThanOrEqual(new Date(summary.firstOpenedAt).getTime());
    expect(summary.rooms[0].options.map((o: { viewCount: number }) => o.viewCount)).toEqual([0, 1]);
    expect(summary.rooms[0].options[1].lastViewedAt).not.toBeNull();
  });
});

describe('bad tokens are refused with a plain message', () => {
  let flat: Flat;
  let p: PresentationSummary;
  let jti: string;

  beforeAll(async () => {
    flat = await makeFlat(designer);
    p = await present(designer, flat);
    jti = await tokenIdOf(p);
  });

  it('the link itself works, and a token crafted with the right key and claims works too', async () => {
    expect((await openLink(tokenOf(p))).status).toBe(200);
    expect((await openLink(await craft({ jti }))).status).toBe(200);
  });

  it('a tampered signature or payload', async () => {
    const [h, payload, sig] = tokenOf(p).split('.');
    const flipped = sig.slice(0, 10) + (sig[10] === 'A' ? 'B' : 'A') + sig.slice(11);
    expectRefused(await openLink(`${h}.${payload}.${flipped}`), 404);
    const claims = JSON.parse(Buffer.from(payload, 'base64url').toString());
    expectRefused(await openLink(`${h}.${b64({ ...claims, exp: claims.exp + 86_400 * 400 })}.${sig}`), 404);
  });

  it('a signature spelled another way that decodes to the same bytes', async () => {
    const [h, payload, sig] = tokenOf(p).split('.');
    // 32 bytes take 43 base64url characters; the last one carries 4 bits and 2 unused ones, so
    // flipping its lowest bit gives a different text for the same signature (RFC 4648 §3.5).
    const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
    const twin = sig.slice(0, -1) + ALPHABET[ALPHABET.indexOf(sig.at(-1)!) ^ 1];
    expect(Buffer.from(twin, 'base64url').equals(Buffer.from(sig, 'base64url'))).toBe(true);
    expectRefused(await openLink(`${h}.${payload}.${twin}`), 404);
    expectRefused(await choose(`${h}.${payload}.${twin}`, flat.rooms[0].id, flat.rooms[0].options[2].id), 404);
    expect((await openLink(tokenOf(p))).status).toBe(200);
  });

  it('signed with another key', async () => {
    expectRefused(await openLink(await craft({ jti }, PRESENTATION_TYP, new Uint8Array(32).fill(7))), 404);
  });

  it('expired', async () => {
    const past = Math.floor(Date.now() / 1000) - 60;
    expectRefused(await openLink(await craft({ jti, iat: past - 3600, exp: past })), 410);
  });

  it('for another audience, another issuer or another type', async () => {
    expectRefused(await openLink(await craft({ jti, aud: 'parlour:invite' })), 404);
    expectRefused(await openLink(await craft({ jti, iss: 'someone-else' })), 404);
    expectRefused(await openLink(await craft({ jti }, 'JWT')), 404);
  });

  it('alg "none", written by hand', async () => {
    const now = Math.floor(Date.now() / 1000);
    const claims = { jti, aud: PRESENTATION_AUDIENCE, iss: PRESENTATION_ISSUER, iat: now, exp: now + 3600 };
    expectRefused(await openLink(`${b64({ alg: 'none', typ: PRESENTATION_TYP })}.${b64(claims)}.`), 404);
    expectRefused(await openLink(`${b64({ alg: 'none', typ: PRESENTATION_TYP })}.${b64(claims)}`), 404);
    // And a none token cannot post a choice either.
    expectRefused(
      await choose(
        `${b64({ alg: 'none', typ: PRESENTATION_TYP })}.${b64(claims)}.`,
        flat.rooms[0].id,
        flat.rooms[0].options[0].id,
      ),
      404,
    );
  });

  it('an unknown id, rubbish, or something far too long', async () => {
    expectRefused(await openLink(await craft({ jti: 'never-issued' })), 404);
    expectRefused(await openLink('not-a-token'), 404);
    expectRefused(await openLink('a.b.c'), 404);
    expectRefused(await openLink(`${'x'.repeat(3000)}.y.z`), 404);
    expectRefused(await request(t.app).post('/api/p/rubbish/views').send({ optionId: flat.rooms[0].options[0].id }), 404);
  });

  it('a withdrawn link stops working at once, for reading and for choosing', async () => {
    const q = await present(designer, flat);
    const token = tokenOf(q);
    expect((await openLink(token)).status).toBe(200);
    const withdrawn = await designer.post(`/api/presentations/${q.id}/withdraw`);
    expect(withdrawn.body.presentation.state).toBe('withdrawn');
    expectRefused(await openLink(token), 410);
    expectRefused(await choose(token, flat.rooms[0].id, flat.rooms[0].options[2].id), 410);
    expectRefused(await request(t.app).post(`/api/p/${token}/views`).send({ optionId: flat.rooms[0].options[2].id }), 410);
    expect((await designer.post(`/api/presentations/${q.id}/send`).send({})).status).toBe(409);
    expect((await designer.post(`/api/presentations/${q.id}/extend`).send({ days: 10 })).status).toBe(409);
  });

  it('past its stored expiry the link stops; extending opens the same link again', async () => {
    const q = await present(designer, flat, { expiresInDays: 3 });
    const token = tokenOf(q);
    await t.db
      .updateTable('presentations')
      .set({ expires_at: new Date(Date.now() - 1000) })
      .where('id', '=', q.id)
      .execute();
    expectRefused(await openLink(token), 410);
    const list = (await designer.get(`/api/projects/${flat.projectId}/presentations`)).body
      .presentations as PresentationSummary[];
    expect(list.find((x) => x.id === q.id)!.state).toBe('expired');
    const extended = await designer.post(`/api/presentations/${q.id}/extend`).send({ days: 14 });
    expect(extended.status).toBe(200);
    expect(extended.body.presentation.state).toBe('active');
    expect(extended.body.presentation.link).toBe(q.link);
    expect((await openLink(token)).status).toBe(200);
    expect((await designer.post(`/api/presentations/${q.id}/extend`).send({ days: 400 })).body.error.fields).toEqual({
      days: 'At most 90 days at a time.',
    });
  });
});

describe('one studio’s link never reaches another’s records', () => {
  it('a link of studio B cannot choose for studio A’s rooms, and B cannot manage A’s presentations', async () => {
    const flatA = await makeFlat(designer);
    const pA = await present(designer, flatA);
    const b = await signUpStudio(t.app, 'Other Studio');
    const flatB = await makeFlat(b.agent);
    const pB = await present(b.agent, flatB);
    const tokenB = tokenOf(pB);
    expect((await choose(tokenB, flatA.rooms[0].id, flatA.rooms[0].options[2].id)).status).toBe(404);
    expect((await choose(tokenB, flatB.rooms[0].id, flatA.rooms[0].options[2].id)).status).toBe(404);
    expect((await request(t.app).post(`/api/p/${tokenB}/views`).send({ optionId: flatA.rooms[0].options[2].id })).status).toBe(
      404,
    );
    const bOpens = JSON.stringify((await openLink(tokenB)).body);
    expect(bOpens).not.toContain('Marrow');
    expect(bOpens).not.toContain(flatA.rooms[0].id);
    expect((await b.agent.post(`/api/presentations/${pA.id}/withdraw`)).status).toBe(404);
    expect((await b.agent.get(`/api/projects/${flatA.projectId}/presentations`)).status).toBe(404);
    expect((await b.agent.post(`/api/projects/${flatB.projectId}/decide`).send({ presentationId: pA.id })).status).toBe(404);
    expect((await openLink(tokenOf(pA))).status).toBe(200);
  });
});

describe('choices', () => {
  it('a choice notifies the presentation’s creator; the same choice again changes nothing; a new comment updates it', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    const token = tokenOf(p);
    const room = flat.rooms[0];
    const before = t.mail.length;
    const first = await choose(token, room.id, room.options[0].id, 'Love the linen.');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ changed: true, choice: { optionId: room.options[0].id, comment: 'Love the linen.' } });
    await t.settled();
    const notice = t.mail.slice(before);
    expect(notice.map((m) => m.to)).toEqual([designerEmail]);
    expect(notice[0].subject).toBe('Ada and Rui Penhale chose Option B for Sitting room (Larkspur flat)');
    expect(notice[0].text).toContain('Ada and Rui Penhale chose Option B for Sitting room in Larkspur flat.');
    expect(notice[0].text).toContain('Love the linen.');
    expect(notice[0].text).toContain(`/projects/${flat.projectId}`);

    const again = await choose(token, room.id, room.options[0].id, 'Love the linen.');
    expect(again.body).toEqual({ changed: false, choice: first.body.choice });
    await t.settled();
    expect(t.mail.length).toBe(before + 1);

    await new Promise((r) => setTimeout(r, 5));
    const changed = await choose(token, room.id, room.options[2].id, 'Actually the walnut.');
    expect(changed.body.changed).toBe(true);
    expect(new Date(changed.body.choice.chosenAt).getTime()).toBeGreaterThan(new Date(first.body.choice.chosenAt).getTime());
    await t.settled();
    expect(t.mail.length).toBe(before + 2);

    const summary = (await viewer.get(`/api/projects/${flat.projectId}/presentations`)).body
      .presentations[0] as PresentationSummary;
    expect(summary.rooms[0].choice).toMatchObject({ optionId: room.options[2].id, comment: 'Actually the walnut.' });
    expect((await openLink(token)).body.presentation.rooms[0].choice.optionId).toBe(room.options[2].id);
  });

  it('refuses an option the presentation does not show, and a bad body with the field named', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    expect((await choose(tokenOf(p), flat.rooms[0].id, flat.rooms[0].options[1].id)).status).toBe(404);
    expect((await choose(tokenOf(p), flat.rooms[1].id, flat.rooms[0].options[0].id)).status).toBe(404);
    const long = await choose(tokenOf(p), flat.rooms[0].id, flat.rooms[0].options[0].id, 'x'.repeat(1001));
    expect(long.status).toBe(400);
    expect(long.body.error.fields.comment).toMatch(/under 1000/);
    expect(
      (
        await request(t.app)
          .put(`/api/p/${tokenOf(p)}/rooms/${flat.rooms[0].id}/choice`)
          .set('content-type', 'application/json')
          .send('{"optionId":')
      ).status,
    ).toBe(400);
  });

  it('limits “looked at” posts per link, with the same answer', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    const token = tokenOf(p);
    const optionId = flat.rooms[0].options[0].id;
    expect((await request(t.app).post(`/api/p/${token}/views`).send({ optionId })).status).toBe(204);
    // 299 more in this window, as a long evening of looking would make.
    await t.db
      .updateTable('rate_limit_counts')
      .set({ count: 300 })
      .where('bucket', '=', VIEW_RATE.bucket)
      .where('key', '=', p.id)
      .execute();
    const refused = await request(t.app).post(`/api/p/${token}/views`).send({ optionId });
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBe('600');
    expect(refused.body.error.message).toMatch(/wait a few minutes/);
    expect(await linkCount(VIEW_RATE, p.id)).toBe(300);
    const [summary] = (await designer.get(`/api/projects/${flat.projectId}/presentations`)).body.presentations.filter(
      (x: PresentationSummary) => x.id === p.id,
    );
    // The refused look is not recorded either.
    expect(summary.rooms[0].options.find((o: { optionId: string }) => o.optionId === optionId).viewCount).toBe(1);
  });

  it('is rate-limited per link, counted in the database', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    const token = tokenOf(p);
    const room = flat.rooms[0];
    for (let i = 0; i < 20; i += 1) {
      const res = await choose(token, room.id, room.options[i % 2 === 0 ? 0 : 2].id);
      expect(res.status).toBe(200);
    }
    const refused = await choose(token, room.id, room.options[0].id);
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBe('600');
    expect(refused.body.error.message).toMatch(/wait a few minutes/);
    // The refused post is not counted: its transaction rolled back.
    expect(await linkCount(CHOICE_RATE, p.id)).toBe(20);
    // Another link of the same project has a count of its own.
    const q = await present(designer, flat);
    expect((await choose(tokenOf(q), room.id, room.options[0].id)).status).toBe(200);
    // Once the window has passed, the link may choose again.
    await t.db
      .updateTable('rate_limit_counts')
      .set((eb) => ({ window_start: sql<Date>`${eb.ref('window_start')} - interval '20 minutes'` }))
      .where('bucket', '=', CHOICE_RATE.bucket)
      .where('key', '=', p.id)
      .execute();
    expect((await choose(token, room.id, room.options[2].id)).status).toBe(200);
  });

  it('“Mark as decided” needs a choice in every room; then the client can no longer change it', async () => {
    const flat = await makeFlat(designer);
    const p = await present(designer, flat);
    const token = tokenOf(p);
    await choose(token, flat.rooms[0].id, flat.rooms[0].options[0].id);
    const early = await designer.post(`/api/projects/${flat.projectId}/decide`).send({ presentationId: p.id });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/Every room/);
    await choose(token, flat.rooms[1].id, flat.rooms[1].options[1].id, 'Yes please');
    const list = (await designer.get(`/api/projects/${flat.projectId}/presentations`)).body
      .presentations as PresentationSummary[];
    expect(list[0].complete).toBe(true);
    expect((await viewer.post(`/api/projects/${flat.projectId}/decide`).send({ presentationId: p.id })).status).toBe(403);
    const decided = await designer.post(`/api/projects/${flat.projectId}/decide`).send({ presentationId: p.id });
    expect(decided.status).toBe(200);
    expect(decided.body.presentation.decidedAt).not.toBeNull();
    expect((await designer.get(`/api/projects/${flat.projectId}`)).body.project.state).toBe('decided');

    const opened = await openLink(token);
    expect(opened.body.presentation.decided).toBe(true);
    const late = await choose(token, flat.rooms[0].id, flat.rooms[0].options[2].id);
    expect(late.status).toBe(409);
    expect((await openLink(token)).body.presentation.rooms[0].choice.optionId).toBe(flat.rooms[0].options[0].id);
  });

  it('tells the studio’s owners when the creator has left', async () => {
    const flat = await makeFlat(owner);
    const leaving = await addMember(t, owner, 'designer');
    const p = await present(leaving.agent, flat);
    await owner.delete(`/api/studio/members/${leaving.member.id}`);
    const before = t.mail.length;
    await choose(tokenOf(p), flat.rooms[0].id, flat.rooms[0].options[2].id);
    await t.settled();
    const to = t.mail.slice(before).map((m) => m.to);
    expect(to).toHaveLength(1);
    expect(to[0]).toMatch(/^owner-/);
  });
});

describe('the signing key', () => {
  it('is generated once into DATA_DIR/presentation-key, readable by its owner only, and read back after', () => {
    const dataDir = mkdtempSync(join(tmpdir(), 'parlour-key-'));
    try {
      const env = { DATABASE_URL: 'postgres://unused', DATA_DIR: dataDir };
      const first = loadConfig(env);
      const file = join(dataDir, 'presentation-key');
      expect(statSync(file).mode & 0o777).toBe(0o600);
      expect(first.presentationKey.length).toBe(32);
      expect(readFileSync(file, 'utf8').trim()).toMatch(/^[0-9a-f]{64}$/);
      expect(Buffer.from(loadConfig(env).presentationKey).equals(Buffer.from(first.presentationKey))).toBe(true);
    } finally {
      rmSync(dataDir, { recursive: true, force: true });
    }
  });

  it('accepts hex or base64 of at least 256 bits and refuses a shorter one', () => {
    expect(decodeKey('ab'.repeat(32), 'K').length).toBe(32);
    expect(decodeKey(Buffer.alloc(48, 3).toString('base64'), 'K').length).toBe(48);
    expect(() => decodeKey('ab'.repeat(16), 'K')).toThrow(/at least 256 bits/);
    expect(() => loadConfig({ DATABASE_URL: 'postgres://unused', PRESENTATION_KEY: 'short' })).toThrow(
      /PRESENTATION_KEY: needs at least 256 bits/,
    );
    expect(() => decodeKey('not base64 at all!', 'K')).toThrow(/hex or base64/);
  });
});
