// A project's states and the one way into each: a link makes it presented, Mark as decided makes
// it decided, only Reopen takes it back; Archive from anywhere and Restore to where it was. While
// decided, every choice and the chosen options stand still.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { addMember, createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { presentedProject, type PresentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let owner: Agent;
let designer: Agent;
let viewer: Agent;

beforeAll(async () => {
  t = createTestApp();
  owner = (await signUpStudio(t.app, 'State Studio')).agent;
  designer = (await addMember(t, owner, 'designer')).agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
});
afterAll(() => t.close());

const choose = (p: PresentedProject, optionId: string, token = p.token) =>
  request(t.app).put(`/api/p/${token}/rooms/${p.roomId}/choice`).send({ optionId, comment: '' });
const stateOf = async (projectId: string) => (await designer.get(`/api/projects/${projectId}`)).body.project;
const patchState = (projectId: string, state: string) => designer.patch(`/api/projects/${projectId}`).send({ state });
const newPresentation = (p: PresentedProject) =>
  designer.post(`/api/projects/${p.projectId}/presentations`).send({ rooms: [{ roomId: p.roomId, optionIds: p.optionIds }] });

/** A presented project whose client chose the first option, marked as decided. */
async function decidedProject(): Promise<PresentedProject> {
  const p = await presentedProject(designer, 'Decided flat');
  expect((await choose(p, p.optionIds[0])).status).toBe(200);
  const decided = await designer.post(`/api/projects/${p.projectId}/decide`).send({ presentationId: p.presentationId });
  expect(decided.status, JSON.stringify(decided.body)).toBe(200);
  return p;
}

describe('decided stays decided until Reopen', () => {
  it('refuses a new presentation with 409, keeps every choice frozen, and Reopen records who and when', async () => {
    const p = await decidedProject();
    const refused = await newPresentation(p);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ code: 'decided', message: expect.stringMatching(/Reopen the project first/) });
    expect((await stateOf(p.projectId)).state).toBe('decided');
    expect((await designer.get(`/api/projects/${p.projectId}/presentations`)).body.presentations).toHaveLength(1);

    const late = await choose(p, p.optionIds[1]);
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('decided');
    expect((await request(t.app).get(`/api/p/${p.token}`)).body.presentation.rooms[0].choice.optionId).toBe(p.optionIds[0]);

    // Deciding again through another route changes nothing: only Reopen takes it back.
    const again = await designer.post(`/api/projects/${p.projectId}/decide`).send({ presentationId: p.presentationId });
    expect(again.status).toBe(200);
    expect(again.body.state).toBe('decided');

    expect((await viewer.post(`/api/projects/${p.projectId}/reopen`)).status).toBe(403);
    const before = Date.now();
    const reopened = await designer.post(`/api/projects/${p.projectId}/reopen`);
    expect(reopened.status).toBe(200);
    expect(reopened.body.project).toMatchObject({ state: 'presented', reopenedBy: 'Member designer', previousState: null });
    expect(Date.parse(reopened.body.project.reopenedAt)).toBeGreaterThanOrEqual(before - 1000);

    // On purpose, the old link may change its choice again, and new presentations are made.
    const link = await request(t.app).get(`/api/p/${p.token}`);
    expect(link.body.presentation.decided).toBe(false);
    expect((await choose(p, p.optionIds[1])).status).toBe(200);
    expect((await newPresentation(p)).status).toBe(201);
    expect((await stateOf(p.projectId)).state).toBe('presented');

    const twice = await designer.post(`/api/projects/${p.projectId}/reopen`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('not_decided');
  });

  it('a new presentation on a presented project leaves it presented; the first link makes a draft presented', async () => {
    const p = await presentedProject(designer, 'Presented flat');
    expect((await stateOf(p.projectId)).state).toBe('presented');
    expect((await newPresentation(p)).status).toBe(201);
    expect((await stateOf(p.projectId)).state).toBe('presented');
  });
});

describe('PATCH state: Archive from anywhere, Restore to the state before, nothing else', () => {
  it('refuses every other change with 409 naming the way', async () => {
    const draft = (await designer.post('/api/projects').send({ name: 'Draft flat', newClient: { name: 'Dee' } })).body.project;
    for (const [state, way] of [
      ['presented', /make a presentation/],
      ['decided', /Mark as decided/],
    ] as const) {
      const res = await patchState(draft.id, state);
      expect(res.status).toBe(409);
      expect(res.body.error).toMatchObject({
        code: 'state_change',
        message: expect.stringMatching(way),
        fields: { state: expect.any(String) },
      });
    }
    expect((await stateOf(draft.id)).state).toBe('draft');

    const p = await presentedProject(designer, 'Back to draft');
    const back = await patchState(p.projectId, 'draft');
    expect(back.status).toBe(409);
    expect(back.body.error.message).toMatch(/Archive it instead/);

    const d = await decidedProject();
    const undo = await patchState(d.projectId, 'presented');
    expect(undo.status).toBe(409);
    expect(undo.body.error.message).toMatch(/only by Reopen/);
    expect((await stateOf(d.projectId)).state).toBe('decided');
    // The same state again is no change at all.
    expect((await patchState(d.projectId, 'decided')).status).toBe(200);
  });

  it('Restore brings back the state the project had before it was archived, not draft', async () => {
    for (const make of [
      async () =>
        (await designer.post('/api/projects').send({ name: 'Draft to archive', newClient: { name: 'Dee' } })).body.project
          .id as string,
      async () => (await presentedProject(designer, 'Presented to archive')).projectId,
      async () => (await decidedProject()).projectId,
    ]) {
      const id = await make();
      const was = (await stateOf(id)).state;
      const archived = await patchState(id, 'archived');
      expect(archived.status).toBe(200);
      expect(archived.body.project).toMatchObject({ state: 'archived', previousState: was });
      if (was !== 'draft') {
        const wrong = await patchState(id, 'draft');
        expect(wrong.status).toBe(409);
        expect(wrong.body.error.message).toContain(`back to “${was}”`);
      }
      const restored = await patchState(id, was);
      expect(restored.status).toBe(200);
      expect(restored.body.project).toMatchObject({ state: was, previousState: null });
    }
  });

  it('an archived project cannot be reopened or presented', async () => {
    const d = await decidedProject();
    await patchState(d.projectId, 'archived');
    const reopen = await designer.post(`/api/projects/${d.projectId}/reopen`);
    expect(reopen.status).toBe(409);
    expect(reopen.body.error.code).toBe('archived');
    expect((await newPresentation(d)).body.error.code).toBe('archived');
  });
});

describe('while decided, the chosen option stands still', () => {
  it('refuses edits and deletion of the chosen option and changes to its room’s walls, and allows the rest', async () => {
    const p = await decidedProject();
    const room = (await designer.get(`/api/rooms/${p.roomId}`)).body;
    const [chosen, other] = room.options as { id: string; version: number; doc: { pieces: object[] } }[];
    expect(chosen.id).toBe(p.optionIds[0]);

    const edit = await designer.put(`/api/options/${chosen.id}`).send({ version: chosen.version, doc: { pieces: [] } });
    expect(edit.status).toBe(409);
    expect(edit.body.error).toEqual({
      code: 'decided',
      message: 'This option was chosen and the project is decided. Reopen the project or duplicate the option to change it.',
    });
    expect((await designer.put(`/api/options/${chosen.id}`).send({ version: chosen.version, name: 'Renamed' })).status).toBe(409);
    const del = await designer.delete(`/api/options/${chosen.id}`);
    expect(del.status).toBe(409);
    expect(del.body.error.code).toBe('decided');
    const walls = await designer
      .put(`/api/rooms/${p.roomId}`)
      .send({ version: room.room.version, shell: { ...room.room.shell, wallHeight: 2400 } });
    expect(walls.status).toBe(409);
    expect(walls.body.error.code).toBe('decided');
    const gone = await designer.delete(`/api/rooms/${p.roomId}`);
    expect(gone.status).toBe(409);
    expect(gone.body.error.code).toBe('decided');

    // Saving what is already there, a new room name, the other option and a duplicate are fine.
    const same = await designer.put(`/api/options/${chosen.id}`).send({ version: chosen.version, doc: chosen.doc });
    expect(same.status).toBe(200);
    expect(
      (
        await designer
          .put(`/api/rooms/${p.roomId}`)
          .send({ version: room.room.version, name: 'Front room', shell: room.room.shell })
      ).status,
    ).toBe(200);
    expect((await designer.put(`/api/options/${other.id}`).send({ version: other.version, doc: { pieces: [] } })).status).toBe(
      200,
    );
    const copy = await designer.post(`/api/rooms/${p.roomId}/options`).send({ name: 'Variation', fromOptionId: chosen.id });
    expect(copy.status).toBe(201);
    expect(
      (await designer.put(`/api/options/${copy.body.option.id}`).send({ version: copy.body.option.version, doc: { pieces: [] } }))
        .status,
    ).toBe(200);

    const after = (await designer.get(`/api/rooms/${p.roomId}`)).body.options.find((o: { id: string }) => o.id === chosen.id);
    expect(after.doc.pieces).toHaveLength(chosen.doc.pieces.length);

    expect((await designer.post(`/api/projects/${p.projectId}/reopen`)).status).toBe(200);
    expect((await designer.put(`/api/options/${chosen.id}`).send({ version: after.version, doc: { pieces: [] } })).status).toBe(
      200,
    );
  });
});
