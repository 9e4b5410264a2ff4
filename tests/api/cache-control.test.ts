// Private answers are never kept by a browser or a proxy: every signed-in API answer (data, links,
// plan files, mail, refusals) says Cache-Control: no-store; stored files stay private and cached.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { addMember, createTestApp, signUpStudio, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;
const SQUARE = {
  outline: [
    [0, 0],
    [3000, 0],
    [3000, 3000],
    [0, 3000],
  ],
};

let t: TestApp;
let owner: Agent;
let viewer: Agent;
const ids = { client: '', project: '', room: '', option: '', mail: '', file: '' };

beforeAll(async () => {
  t = createTestApp({ env: { OUTBOX_DIR: '/nonexistent/outbox' } });
  const a = await signUpStudio(t.app, 'Larch Studio');
  owner = a.agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
  const project = await owner
    .post('/api/projects')
    .send({ name: 'Tarn cottage', newClient: { name: 'Cas Hollin', email: 'cas@example.com' } });
  const room = await owner.post(`/api/projects/${project.body.project.id}/rooms`).send({ name: 'Snug', shell: SQUARE });
  await owner
    .post(`/api/projects/${project.body.project.id}/presentations`)
    .send({ rooms: [{ roomId: room.body.room.id, optionIds: [room.body.options[0].id] }] });
  const paint = await owner.post('/api/finishes/paints').send({ name: 'Slate', colourHex: '#556070' });
  // A stored file's row (the files route answers a matching ETag without reading the bytes).
  const { studio_id: studioId } = await t.db
    .selectFrom('finishes')
    .select('studio_id')
    .where('id', '=', paint.body.finish.id)
    .executeTakeFirstOrThrow();
  ids.file = `${randomUUID().replaceAll('-', '').repeat(2)}.webp`;
  await t.db
    .insertInto('finish_files')
    .values({
      finish_id: paint.body.finish.id,
      studio_id: studioId,
      purpose: 'swatch',
      key: `derived/${ids.file}`,
      width_px: 1,
      height_px: 1,
      bytes: 1,
    })
    .execute();
  ids.client = project.body.project.client.id;
  ids.project = project.body.project.id;
  ids.room = room.body.room.id;
  ids.option = room.body.options[0].id;
  ids.mail = (await owner.get('/api/outbox')).body.messages[0].id;
});
afterAll(() => t.close());

describe('Cache-Control on signed-in answers', () => {
  const routes = (): [string, string][] => [
    ['me', '/api/auth/me'],
    ['members', '/api/studio/members'],
    ['invitations', '/api/studio/invites'],
    ['clients', '/api/clients'],
    ['a client', `/api/clients/${ids.client}`],
    ['projects', '/api/projects'],
    ['a project', `/api/projects/${ids.project}`],
    ['presentations with their links', `/api/projects/${ids.project}/presentations`],
    ['a room', `/api/rooms/${ids.room}`],
    ['a plan file', `/api/rooms/${ids.room}/plan-file`],
    ['a schedule', `/api/options/${ids.option}/schedule`],
    ['the schedule as CSV', `/api/options/${ids.option}/schedule.csv`],
    ['finishes', '/api/finishes'],
    ['the outbox', '/api/outbox'],
    ['a sent e-mail', `/api/outbox/${ids.mail}`],
    ['a record of another studio', `/api/projects/${randomUUID()}`],
    ['no such route', '/api/nothing-here'],
  ];

  it('says no-store on every answer the owner gets', async () => {
    const seen: Record<string, unknown> = {};
    for (const [name, path] of routes()) {
      const res = await owner.get(path);
      seen[name] = `${res.status} ${res.headers['cache-control']}`;
    }
    const expected = Object.fromEntries(routes().map(([name]) => [name, expect.stringMatching(/^\d{3} (private, )?no-store$/)]));
    expect(seen).toEqual(expected);
    // The lookups answered what they should, so the header is not just on refusals.
    expect(seen['me']).toMatch(/^200/);
    expect(seen['a plan file']).toMatch(/^200/);
    expect(seen['a sent e-mail']).toMatch(/^200/);
    expect(seen['a record of another studio']).toMatch(/^404/);
  });

  it('says no-store on a viewer’s refused write and on a saved one', async () => {
    const refused = await viewer.post('/api/clients').send({ name: 'Not allowed' });
    expect(refused.status).toBe(403);
    expect(refused.headers['cache-control']).toBe('no-store');
    const saved = await owner.patch(`/api/clients/${ids.client}`).send({ name: 'Cas and Bo Hollin' });
    expect(saved.status).toBe(200);
    expect(saved.headers['cache-control']).toBe('no-store');
  });

  it('keeps stored files private and cacheable, never public', async () => {
    const etag = `"${ids.file.replace('.webp', '')}"`;
    const res = await owner.get(`/api/files/${ids.file}`).set('If-None-Match', etag);
    expect(res.status).toBe(304);
    expect(res.headers['cache-control']).toBe('private, max-age=31536000, immutable');
  });
});
