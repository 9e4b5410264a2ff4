// API tests for rooms and options: create and list, saves with versions and conflicts, refused
// shells, options added, duplicated, reordered, saved and deleted, and the README's example plan
// file imported and exported.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const RECT = {
  wallHeight: 2600,
  outline: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
};
const designExample = JSON.parse(readFileSync(resolve(import.meta.dirname, '../../assets/plans/living-room.json'), 'utf8'));

async function projectOf(agent: Awaited<ReturnType<typeof signUpStudio>>['agent']) {
  return (await agent.post('/api/projects').send({ name: 'Rooms project', newClient: { name: 'C' } })).body.project.id as string;
}

describe('rooms', () => {
  it('creates a room with a first, empty option and lists it with its floor area', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const res = await agent.post(`/api/projects/${projectId}/rooms`).send({ name: 'Living room', shell: RECT });
    expect(res.status).toBe(201);
    expect(res.body.room).toMatchObject({ name: 'Living room', version: 1, shell: { wallThickness: 100, openings: [] } });
    expect(res.body.options).toEqual([
      expect.objectContaining({ position: 0, doc: { pieces: [], finishes: expect.any(Object), seen: [] } }),
    ]);
    const list = await agent.get(`/api/projects/${projectId}/rooms`);
    // 4.2 m × 3.6 m = 15.12 m² (the README's plan-file example).
    expect(list.body.rooms).toEqual([expect.objectContaining({ name: 'Living room', optionCount: 1, floorAreaM2: 15.12 })]);
    // The project's own answer counts its rooms; the list above is the one place that lists them.
    const page = await agent.get(`/api/projects/${projectId}`);
    expect(Object.keys(page.body).sort()).toEqual(['client', 'mail', 'project']);
    expect(page.body.project.roomCount).toBe(1);
  });

  it('a room’s "changed" time counts edits to its options too', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const created = await agent.post(`/api/projects/${projectId}/rooms`).send({ name: 'Den', shell: RECT });
    const before = (await agent.get(`/api/projects/${projectId}/rooms`)).body.rooms[0].updatedAt as string;
    await new Promise((r) => setTimeout(r, 20));
    const option = created.body.options[0];
    const pieces = [
      {
        id: 'p1',
        name: 'Chair',
        x: 1000,
        y: 1000,
        width: 800,
        depth: 800,
        height: 800,
        rotation: 0,
        elevation: 0,
        status: 'new',
        price: null,
        placed: true,
      },
    ];
    const saved = await agent.put(`/api/options/${option.id}`).send({ version: option.version, doc: { ...option.doc, pieces } });
    expect(saved.status).toBe(200);
    const after = (await agent.get(`/api/projects/${projectId}/rooms`)).body.rooms[0].updatedAt as string;
    expect(Date.parse(after)).toBeGreaterThan(Date.parse(before));
    expect(after).toBe(saved.body.option.updatedAt);
  });

  it('refuses shells that cannot be drawn, naming the field', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const bow = await agent.post(`/api/projects/${projectId}/rooms`).send({
      name: 'Bow',
      shell: {
        outline: [
          [0, 0],
          [1000, 1000],
          [1000, 0],
          [0, 1000],
        ],
      },
    });
    expect(bow.status).toBe(400);
    expect(Object.keys(bow.body.error.fields)[0]).toMatch(/^shell\.outline/);
    const wide = await agent.post(`/api/projects/${projectId}/rooms`).send({
      name: 'Wide door',
      shell: {
        ...RECT,
        openings: [{ id: 'd1', type: 'door', wall: 1, offset: 100, width: 4000, height: 2040, hinge: 'start', swing: 'in' }],
      },
    });
    expect(wide.status).toBe(400);
    expect(Object.keys(wide.body.error.fields)).toContain('shell.openings[0].width');
    expect((await agent.get(`/api/projects/${projectId}/rooms`)).body.rooms).toHaveLength(0);
  });

  it('a stale save answers 409 with the current room and changes nothing', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const room = (await agent.post(`/api/projects/${projectId}/rooms`).send({ name: 'Study', shell: RECT })).body.room;
    const first = await agent.put(`/api/rooms/${room.id}`).send({ version: 1, shell: { ...RECT, wallHeight: 2700 } });
    expect(first.status).toBe(200);
    expect(first.body.room.version).toBe(2);
    const stale = await agent.put(`/api/rooms/${room.id}`).send({ version: 1, shell: { ...RECT, wallHeight: 2400 } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.current).toMatchObject({ version: 2, shell: { wallHeight: 2700 } });
    expect((await agent.get(`/api/rooms/${room.id}`)).body.room.shell.wallHeight).toBe(2700);
  });

  it('options: add, duplicate with pieces, rename, reorder, save with versions, delete but never the last', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const created = (await agent.post(`/api/projects/${projectId}/rooms`).send({ name: 'Bedroom', shell: RECT })).body;
    const a = created.options[0];
    const sofa = {
      id: 'sofa',
      name: 'Sofa',
      x: 2100,
      y: 3100,
      width: 2100,
      depth: 900,
      height: 850,
      rotation: 180,
      status: 'new',
    };
    const saved = await agent.put(`/api/options/${a.id}`).send({ version: 1, name: 'Calm', doc: { pieces: [sofa] } });
    expect(saved.status).toBe(200);
    expect(saved.body.option.doc.pieces[0]).toMatchObject({ id: 'sofa', elevation: 0, placed: true });
    const bad = await agent.put(`/api/options/${a.id}`).send({ version: 2, doc: { pieces: [{ ...sofa, width: 0 }] } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['doc.pieces[0].width']).toBeTruthy();

    const dup = await agent.post(`/api/rooms/${created.room.id}/options`).send({ name: 'Bold', fromOptionId: a.id });
    expect(dup.status).toBe(201);
    expect(dup.body.option).toMatchObject({
      position: 1,
      name: 'Bold',
      doc: { pieces: [expect.objectContaining({ id: 'sofa' })] },
    });
    const reordered = await agent
      .put(`/api/rooms/${created.room.id}/option-order`)
      .send({ optionIds: [dup.body.option.id, a.id] });
    expect(reordered.body.options.map((o: { name: string }) => o.name)).toEqual(['Bold', 'Calm']);
    expect((await agent.put(`/api/rooms/${created.room.id}/option-order`).send({ optionIds: [a.id] })).status).toBe(400);

    expect((await agent.delete(`/api/options/${dup.body.option.id}`)).status).toBe(204);
    const last = await agent.delete(`/api/options/${a.id}`);
    expect(last.status).toBe(409);
    const after = await agent.get(`/api/rooms/${created.room.id}`);
    expect(after.body.options).toEqual([expect.objectContaining({ name: 'Calm', position: 0 })]);
  });

  it("imports the README's example plan file and exports it back unchanged", async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const res = await agent.post(`/api/projects/${projectId}/rooms/import`).send(designExample);
    expect(res.status).toBe(201);
    expect(res.body.room.name).toBe(designExample.room.name);
    expect(res.body.options[0].doc.pieces).toHaveLength(designExample.option.pieces.length);
    const exported = await agent.get(`/api/rooms/${res.body.room.id}/plan-file`);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-disposition']).toMatch(/attachment; filename=".+\.plan\.json"/);
    const plan = JSON.parse(exported.text);
    expect(plan.format).toBe('parlour-plan');
    expect(plan.room.outline).toEqual(designExample.room.outline);
    expect(plan.room.openings).toEqual(designExample.room.openings);
    expect(plan.option.pieces[0]).toMatchObject(designExample.option.pieces[0]);
  });

  it('refuses a broken plan file with the field path, creating nothing', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = await projectOf(agent);
    const broken = structuredClone(designExample);
    broken.room.openings[1].width = 9000;
    const res = await agent.post(`/api/projects/${projectId}/rooms/import`).send(broken);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_plan_file');
    expect(res.body.error.message).toMatch(/room\.openings\[1\]\.width/);
    const wrongKind = await agent.post(`/api/projects/${projectId}/rooms/import`).send({ format: 'something-else' });
    expect(wrongKind.status).toBe(400);
    expect((await agent.get(`/api/projects/${projectId}/rooms`)).body.rooms).toHaveLength(0);
  });
});
