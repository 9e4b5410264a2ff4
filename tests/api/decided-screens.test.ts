// What the screens of a decided project read: which options of a room the decision stands on (the
// editor opens them read-only), and which shown options were saved since their link was made (the
// client's page marks them as changed).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { presentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let owner: Agent;

beforeAll(async () => {
  t = createTestApp();
  owner = (await signUpStudio(t.app, 'Decided Screens Studio')).agent;
});
afterAll(() => t.close());

const optionsOf = async (roomId: string) =>
  (await owner.get(`/api/rooms/${roomId}`)).body.options as { id: string; version: number; decided: boolean }[];

describe('the room answer says which options the decision stands on', () => {
  it('marks the chosen option while decided, and none before deciding or after Reopen', async () => {
    const p = await presentedProject(owner, 'Frozen flat');
    expect((await optionsOf(p.roomId)).map((o) => o.decided)).toEqual([false, false]);

    const chose = await request(t.app).put(`/api/p/${p.token}/rooms/${p.roomId}/choice`).send({ optionId: p.optionIds[1] });
    expect(chose.status).toBe(200);
    expect((await optionsOf(p.roomId)).map((o) => o.decided)).toEqual([false, false]);

    expect((await owner.post(`/api/projects/${p.projectId}/decide`).send({ presentationId: p.presentationId })).status).toBe(200);
    const decided = await optionsOf(p.roomId);
    expect(decided.find((o) => o.id === p.optionIds[1])?.decided).toBe(true);
    expect(decided.find((o) => o.id === p.optionIds[0])?.decided).toBe(false);

    expect((await owner.post(`/api/projects/${p.projectId}/reopen`)).status).toBe(200);
    expect((await optionsOf(p.roomId)).map((o) => o.decided)).toEqual([false, false]);
  });
});

describe('an option saved since its link was made', () => {
  it('reads as changed to the designer and carries both versions to the client', async () => {
    const p = await presentedProject(owner, 'Changed flat');
    const first = await request(t.app).get(`/api/p/${p.token}`);
    const shown = first.body.presentation.rooms[0].options as { id: string; version: number; sentVersion: number }[];
    for (const o of shown) expect(o.sentVersion).toBe(o.version);

    const [, second] = await optionsOf(p.roomId);
    const saved = await owner.put(`/api/options/${second.id}`).send({ note: 'Now with a darker rug.', version: second.version });
    expect(saved.status).toBe(200);

    // The link's kept answer is dropped by the database's change notice, which may take a moment on
    // a loaded machine: open until the save shows (or the wait runs out and the checks below fail).
    type Shown = { id: string; version: number; sentVersion: number };
    const shownNow = async () => (await request(t.app).get(`/api/p/${p.token}`)).body.presentation.rooms[0].options as Shown[];
    let [a, b] = await shownNow();
    for (const until = Date.now() + 5000; b.version === b.sentVersion && Date.now() < until; [a, b] = await shownNow())
      await new Promise((r) => setTimeout(r, 25));
    expect(a.version).toBe(a.sentVersion);
    expect(b.id).toBe(second.id);
    expect(b.version).toBe(b.sentVersion + 1);

    const summary = (await owner.get(`/api/projects/${p.projectId}/presentations`)).body.presentations[0];
    expect(summary.rooms[0].options.map((o: { changedSinceSent: boolean }) => o.changedSinceSent)).toEqual([false, true]);
  });
});
