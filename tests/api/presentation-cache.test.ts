// The client's presentation data is served from a ready answer per link; these prove the answer
// never outlives what it shows: withdrawal stops the link at once, edits and choices show on the
// next open, and visits are still all counted.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createHash } from 'node:crypto';
import type { ClientPresentation, PresentationSummary } from '../../shared/schemas/presentation';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { presentedProject, type PresentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;
/** How long a database change notice may take to arrive on a loaded test machine. */
const NOTICE_WAIT_MS = 2000;

let t: TestApp;
let owner: Agent;
beforeAll(async () => {
  t = createTestApp();
  owner = (await signUpStudio(t.app, 'Cache Studio')).agent;
});
afterAll(() => t.close());

const open = async (token: string) => request(t.app).get(`/api/p/${token}`);

/** Opens the link until `check` holds or the wait runs out; returns the last answer. */
async function openUntil(token: string, check: (p: ClientPresentation) => boolean): Promise<ClientPresentation> {
  const until = Date.now() + NOTICE_WAIT_MS;
  for (;;) {
    const res = await open(token);
    expect(res.status).toBe(200);
    const p = res.body.presentation as ClientPresentation;
    if (check(p) || Date.now() > until) return p;
    await new Promise((r) => setTimeout(r, 20));
  }
}

describe('the client link cache', () => {
  let p: PresentedProject;
  beforeAll(async () => {
    p = await presentedProject(owner, 'Cached flat');
  });

  it('answers the same data again from the ready answer', async () => {
    const first = await open(p.token);
    const again = await open(p.token);
    expect(first.status).toBe(200);
    expect(again.text).toBe(first.text);
    expect(again.headers['cache-control']).toBe('no-store');
    expect(again.headers['content-type']).toMatch(/^application\/json/);
  });

  it('shows a designer’s edit on the next open', async () => {
    await open(p.token);
    const { options } = (await owner.get(`/api/rooms/${p.roomId}`)).body as {
      options: { id: string; version: number; doc: { pieces: { name: string }[] } }[];
    };
    const o = options.find((x) => x.id === p.optionIds[0])!;
    const doc = { ...o.doc, pieces: o.doc.pieces.map((piece, i) => (i === 0 ? { ...piece, name: 'Reading chair' } : piece)) };
    expect((await owner.put(`/api/options/${o.id}`).send({ doc, version: o.version })).status).toBe(200);
    const seen = await openUntil(p.token, (x) => x.rooms[0].options[0].pieces.some((piece) => piece.name === 'Reading chair'));
    expect(seen.rooms[0].options[0].pieces.map((piece) => piece.name)).toContain('Reading chair');
  });

  it('shows the client’s own choice straight away', async () => {
    await open(p.token);
    const chose = await request(t.app)
      .put(`/api/p/${p.token}/rooms/${p.roomId}/choice`)
      .send({ optionId: p.optionIds[1], comment: 'This one' });
    expect(chose.status).toBe(200);
    const after = (await open(p.token)).body.presentation as ClientPresentation;
    expect(after.rooms[0].choice?.optionId).toBe(p.optionIds[1]);
  });

  it('counts every visit, served ready or not', async () => {
    const before = (await owner.get(`/api/projects/${p.projectId}/presentations`)).body.presentations.find(
      (x: PresentationSummary) => x.id === p.presentationId,
    ).openCount as number;
    for (let i = 0; i < 5; i += 1) expect((await open(p.token)).status).toBe(200);
    const after = (await owner.get(`/api/projects/${p.projectId}/presentations`)).body.presentations.find(
      (x: PresentationSummary) => x.id === p.presentationId,
    ) as PresentationSummary;
    expect(after.openCount).toBe(before + 5);
  });

  it('stops a withdrawn link on the very next request', async () => {
    const q = await presentedProject(owner, 'Withdrawn flat');
    for (let i = 0; i < 3; i += 1) expect((await open(q.token)).status).toBe(200);
    expect((await owner.post(`/api/presentations/${q.presentationId}/withdraw`)).status).toBe(200);
    const res = await open(q.token);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('link_withdrawn');
    expect(res.text).not.toContain('Withdrawn flat');
  });

  it('sends the ready bytes with their ETag and the same headers as any answer', async () => {
    const q = await presentedProject(owner, 'Ready bytes flat');
    const first = await open(q.token);
    const again = await open(q.token);
    expect(again.text).toBe(first.text);
    expect(again.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(Number(again.headers['content-length'])).toBe(Buffer.byteLength(first.text));
    // The ETag Express computes for the same text: W/"<length in hex>-<sha1, base64, 27 characters>".
    const hash = createHash('sha1').update(first.text).digest('base64').substring(0, 27);
    expect(again.headers.etag).toBe(`W/"${Buffer.byteLength(first.text).toString(16)}-${hash}"`);
    expect(first.headers.etag).toBe(again.headers.etag);
    // Helmet's headers, the API's no-store and the link's no-referrer are all still sent.
    expect(again.headers['content-security-policy']).toContain("default-src 'self'");
    expect(again.headers['x-content-type-options']).toBe('nosniff');
    expect(again.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(again.headers['cache-control']).toBe('no-store');
    expect(again.headers['referrer-policy']).toBe('no-referrer');
    expect(again.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(again.headers['x-powered-by']).toBeUndefined();
  });

  it('answers a ready link ahead of the middleware with exactly the headers the full route gives', async () => {
    const q = await presentedProject(owner, 'Same headers flat');
    // The first open builds the answer through the whole stack; the second is the ready one.
    const full = await open(q.token);
    const ready = await open(q.token);
    // A conditional request always takes the full route: it answers 200 here (another ETag) the full way.
    const conditional = await request(t.app).get(`/api/p/${q.token}`).set('If-None-Match', 'W/"not-this-one"');
    const comparable = (h: Record<string, string>) => {
      const { date: _date, 'x-request-id': _id, ...rest } = h;
      return rest;
    };
    expect(comparable(ready.headers)).toEqual(comparable(full.headers));
    expect(comparable(ready.headers)).toEqual(comparable(conditional.headers));
    expect(ready.headers['x-request-id']).not.toBe(full.headers['x-request-id']);
    // A caller's plain request id is echoed on the ready answer too.
    const traced = await request(t.app).get(`/api/p/${q.token}`).set('x-request-id', 'lb-1234.abc');
    expect(traced.headers['x-request-id']).toBe('lb-1234.abc');
    // The browser's revalidation gets its 304 from the full route.
    const revalidated = await request(t.app).get(`/api/p/${q.token}`).set('If-None-Match', ready.headers.etag);
    expect(revalidated.status).toBe(304);
  });

  it('gives an edited answer new bytes and a new ETag once the change is noticed', async () => {
    const q = await presentedProject(owner, 'Renamed flat');
    const before = await open(q.token);
    expect(before.status).toBe(200);
    expect((await owner.patch(`/api/projects/${q.projectId}`).send({ name: 'Renamed flat, second floor' })).status).toBe(200);
    const seen = await openUntil(q.token, (x) => x.projectName === 'Renamed flat, second floor');
    expect(seen.projectName).toBe('Renamed flat, second floor');
    const after = await open(q.token);
    expect(after.text).toContain('Renamed flat, second floor');
    expect(after.headers.etag).not.toBe(before.headers.etag);
  });

  it('stops an expired link at once, even with its answer ready', async () => {
    const q = await presentedProject(owner, 'Expiring flat');
    expect((await open(q.token)).status).toBe(200);
    expect((await open(q.token)).status).toBe(200);
    await t.db
      .updateTable('presentations')
      .set({ expires_at: new Date(Date.now() - 1000) })
      .where('id', '=', q.presentationId)
      .execute();
    const until = Date.now() + NOTICE_WAIT_MS;
    let status = 200;
    while (status === 200 && Date.now() < until) status = (await open(q.token)).status;
    expect(status).toBe(410);
  });

  it('stops a link withdrawn by a write that bypasses the routes, once the database says so', async () => {
    const q = await presentedProject(owner, 'Quietly withdrawn');
    expect((await open(q.token)).status).toBe(200);
    await t.db.updateTable('presentations').set({ withdrawn_at: new Date() }).where('id', '=', q.presentationId).execute();
    const until = Date.now() + NOTICE_WAIT_MS;
    let status = 200;
    while (status === 200 && Date.now() < until) status = (await open(q.token)).status;
    expect(status).toBe(410);
  });
});
