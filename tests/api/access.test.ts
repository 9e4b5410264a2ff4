// Walks the whole route table: every route × role × studio. A route added without a row here
// fails the first test, so no route ships without its access being tried.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { allRoutes } from '../../server/app';
import type { Role } from '../../shared/schemas/studio';
import { addMember, createTestApp, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;
interface Fixture {
  clientId: string;
  projectId: string;
  roomId: string;
  optionId: string;
  memberId: string;
  inviteId: string;
  finishId: string;
  modelId: string;
  fileName: string;
  presentationId: string;
  sentMailId: string;
}
interface Case {
  /** Path parameters naming studio A's own records. */
  params?: (f: Fixture) => Record<string, string>;
  /** A valid body, so a cross-studio call fails on scope, not on validation. */
  body?: () => object;
  /** The call ends the caller's session, so it runs with a session of its own. */
  ownSession?: boolean;
}

// One row per non-public route. Rows with params are tried from another studio too (expect 404).
const CASES: Record<string, Case> = {
  'post /api/auth/sign-out': { ownSession: true },
  'get /api/auth/me': {},
  'patch /api/studio/settings': { body: () => ({ locale: 'en-GB' }) },
  'get /api/studio/members': {},
  'patch /api/studio/members/:id': { params: (f) => ({ id: f.memberId }), body: () => ({ role: 'viewer' }) },
  'delete /api/studio/members/:id': { params: (f) => ({ id: f.memberId }) },
  'get /api/studio/invites': {},
  'post /api/studio/invites': { body: () => ({ email: uniqueEmail('table'), role: 'viewer' }) },
  'delete /api/studio/invites/:id': { params: (f) => ({ id: f.inviteId }) },
  'get /api/clients': {},
  'post /api/clients': { body: () => ({ name: 'Table client' }) },
  'get /api/clients/:id': { params: (f) => ({ id: f.clientId }) },
  'patch /api/clients/:id': { params: (f) => ({ id: f.clientId }), body: () => ({ name: 'Renamed' }) },
  'get /api/projects': {},
  'post /api/projects': { body: () => ({ name: 'Table project', newClient: { name: 'New one' } }) },
  'get /api/projects/:id': { params: (f) => ({ id: f.projectId }) },
  'patch /api/projects/:id': { params: (f) => ({ id: f.projectId }), body: () => ({ name: 'Renamed project' }) },
  'get /api/projects/:projectId/rooms': { params: (f) => ({ projectId: f.projectId }) },
  'post /api/projects/:projectId/rooms': {
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ name: 'Den', shell: SQUARE }),
  },
  'post /api/projects/:projectId/rooms/import': { params: (f) => ({ projectId: f.projectId }), body: () => PLAN },
  'get /api/rooms/:id': { params: (f) => ({ id: f.roomId }) },
  'put /api/rooms/:id': { params: (f) => ({ id: f.roomId }), body: () => ({ name: 'Taken', version: 1 }) },
  'delete /api/rooms/:id': { params: (f) => ({ id: f.roomId }) },
  'get /api/rooms/:id/plan-file': { params: (f) => ({ id: f.roomId }) },
  'post /api/rooms/:id/options': { params: (f) => ({ id: f.roomId }), body: () => ({ name: 'Sneaky' }) },
  'put /api/rooms/:id/option-order': { params: (f) => ({ id: f.roomId }), body: () => ({ optionIds: [randomUUID()] }) },
  'put /api/options/:id': { params: (f) => ({ id: f.optionId }), body: () => ({ name: 'Taken', version: 1 }) },
  'delete /api/options/:id': { params: (f) => ({ id: f.optionId }) },
  'get /api/finishes': {},
  'get /api/finishes/:id': { params: (f) => ({ id: f.finishId }) },
  'post /api/finishes/paints': { body: () => ({ name: 'Table paint', colourHex: '#a0b1c2', sheen: 'matt' }) },
  'post /api/finishes/photos': {},
  'patch /api/finishes/:id': { params: (f) => ({ id: f.finishId }), body: () => ({ name: 'Taken' }) },
  'delete /api/finishes/:id': { params: (f) => ({ id: f.finishId }) },
  'get /api/piece-models': {},
  'get /api/piece-models/:id': { params: (f) => ({ id: f.modelId }) },
  'post /api/piece-models': {},
  'patch /api/piece-models/:id': { params: (f) => ({ id: f.modelId }), body: () => ({ name: 'Taken' }) },
  'put /api/piece-models/:id/thumbnail': { params: (f) => ({ id: f.modelId }) },
  'delete /api/piece-models/:id': { params: (f) => ({ id: f.modelId }) },
  'get /api/files/:name': { params: (f) => ({ name: f.fileName }) },
  'get /api/projects/:projectId/presentations': { params: (f) => ({ projectId: f.projectId }) },
  'post /api/projects/:projectId/presentations': {
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ rooms: [{ roomId: randomUUID(), optionIds: [randomUUID()] }] }),
  },
  'post /api/presentations/:id/send': { params: (f) => ({ id: f.presentationId }), body: () => ({}) },
  'post /api/presentations/:id/withdraw': { params: (f) => ({ id: f.presentationId }) },
  'post /api/presentations/:id/extend': { params: (f) => ({ id: f.presentationId }), body: () => ({ days: 5 }) },
  'post /api/projects/:projectId/decide': {
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ presentationId: randomUUID() }),
  },
  'post /api/projects/:projectId/reopen': { params: (f) => ({ projectId: f.projectId }) },
  'get /api/projects/:projectId/takeoff': { params: (f) => ({ projectId: f.projectId }) },
  'get /api/projects/:projectId/compare': { params: (f) => ({ projectId: f.projectId }) },
  'get /api/options/:id/schedule': { params: (f) => ({ id: f.optionId }) },
  'get /api/options/:id/schedule.csv': { params: (f) => ({ id: f.optionId }) },
  'get /api/outbox': {},
  'get /api/outbox/:id': { params: (f) => ({ id: f.sentMailId }) },
};

const SQUARE = {
  outline: [
    [0, 0],
    [3000, 0],
    [3000, 3000],
    [0, 3000],
  ],
};
const PLAN = { format: 'parlour-plan', version: 1, room: { name: 'Imported', ...SQUARE }, option: { name: 'A', pieces: [] } };

const fill = (path: string, params: Record<string, string>) =>
  path.replace(/:(\w+)/g, (_m, k: string) => params[k] ?? randomUUID());
const call = (agent: Agent | ReturnType<typeof request>, method: string, path: string, body?: object) => {
  const r = (agent as unknown as Record<string, (p: string) => request.Test>)[method](path);
  return body ? r.send(body) : r;
};

let t: TestApp;
let agents: Record<Role, Agent>;
let other: Agent;
let fixture: Fixture;

beforeAll(async () => {
  // With the local setup's Outbox, so its routes answer rather than being absent.
  t = createTestApp({ env: { OUTBOX_DIR: '/nonexistent/outbox' } });
  const a = await signUpStudio(t.app, 'Studio A');
  const designer = await addMember(t, a.agent, 'designer');
  const viewer = await addMember(t, a.agent, 'viewer');
  agents = { owner: a.agent, designer: designer.agent, viewer: viewer.agent };
  other = (await signUpStudio(t.app, 'Studio B')).agent;
  const project = await a.agent.post('/api/projects').send({ name: 'A project', newClient: { name: 'A client' } });
  const target = await addMember(t, a.agent, 'viewer');
  const invite = await a.agent.post('/api/studio/invites').send({ email: uniqueEmail('pending'), role: 'designer' });
  const room = await a.agent.post(`/api/projects/${project.body.project.id}/rooms`).send({ name: 'Kitchen', shell: SQUARE });
  const paint = await a.agent.post('/api/finishes/paints').send({ name: 'Fixture paint', colourHex: '#cccccc' });
  // A file row of studio A's (no bytes needed: the files route asks whose it is before reading it).
  const fileName = `${randomUUID().replaceAll('-', '').repeat(2)}.webp`;
  const { studio_id: studioId } = await t.db
    .selectFrom('finishes')
    .select('studio_id')
    .where('id', '=', paint.body.finish.id)
    .executeTakeFirstOrThrow();
  await t.db
    .insertInto('finish_files')
    .values({
      finish_id: paint.body.finish.id,
      studio_id: studioId,
      purpose: 'swatch',
      key: `derived/${fileName}`,
      width_px: 1,
      height_px: 1,
      bytes: 1,
    })
    .execute();
  // A model row of studio A's, still processing (the access checks never reach its file).
  const model = await t.db
    .insertInto('piece_models')
    .values({ studio_id: studioId, name: 'Fixture chair', file_name: 'chair.glb', source_bytes: 1 })
    .returning('id')
    .executeTakeFirstOrThrow();
  const presentation = await a.agent
    .post(`/api/projects/${project.body.project.id}/presentations`)
    .send({ rooms: [{ roomId: room.body.room.id, optionIds: [room.body.options[0].id] }] });
  fixture = {
    clientId: project.body.project.client.id,
    projectId: project.body.project.id,
    roomId: room.body.room.id,
    optionId: room.body.options[0].id,
    memberId: target.member.id,
    inviteId: invite.body.invite.id,
    finishId: paint.body.finish.id,
    modelId: model.id,
    fileName,
    presentationId: presentation.body.presentation.id,
    sentMailId: (await t.db.selectFrom('sent_mail').select('id').where('studio_id', '=', studioId).executeTakeFirstOrThrow()).id,
  };
});
afterAll(() => t.close());

const guarded = allRoutes().filter((r) => r.access !== 'public');

describe('route table', () => {
  it('has a row for every guarded route and no stale rows', () => {
    const keys = guarded.map((r) => `${r.method} ${r.path}`).sort();
    expect(Object.keys(CASES).sort()).toEqual(keys);
  });

  it.each(guarded.map((r) => [`${r.method} ${r.path}`, r] as const))('%s refuses a signed-out caller with 401', async (_k, r) => {
    const res = await call(request(t.app), r.method, fill(r.path, {}), CASES[`${r.method} ${r.path}`]?.body?.());
    expect(res.status).toBe(401);
  });

  const roleRows = guarded.flatMap((r) =>
    (['owner', 'designer', 'viewer'] as Role[]).map((role) => [`${r.method} ${r.path}`, role, r] as const),
  );
  it.each(roleRows)('%s as %s: allowed roles pass the guard, others get 403', async (key, role, r) => {
    // Random ids: nothing of the fixture is changed, so rows stay independent of order.
    const agent = CASES[key].ownSession
      ? role === 'owner'
        ? (await signUpStudio(t.app)).agent
        : (await addMember(t, agents.owner, role)).agent
      : agents[role];
    const res = await call(agent, r.method, fill(r.path, {}), CASES[key]?.body?.());
    const allowed = r.access === 'signed-in' || r.access.includes(role);
    if (allowed) expect([401, 403]).not.toContain(res.status);
    else expect(res.status).toBe(403);
  });

  const scoped = guarded.filter((r) => r.path.includes(':'));
  it.each(scoped.map((r) => [`${r.method} ${r.path}`, r] as const))(
    '%s with studio A’s id answers 404 to studio B',
    async (key, r) => {
      const c = CASES[key];
      const res = await call(other, r.method, fill(r.path, c.params!(fixture)), c.body?.());
      expect(res.status).toBe(404);
    },
  );

  it('studio A still sees its own records after all of the above', async () => {
    expect((await agents.viewer.get(`/api/projects/${fixture.projectId}`)).status).toBe(200);
    expect((await agents.viewer.get(`/api/clients/${fixture.clientId}`)).body.client.name).toBe('A client');
    const room = await agents.viewer.get(`/api/rooms/${fixture.roomId}`);
    expect(room.body.room).toMatchObject({ name: 'Kitchen', version: 1 });
    expect(room.body.options).toHaveLength(1);
  });
});
