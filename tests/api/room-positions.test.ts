// Rooms of a project keep distinct positions even when they are added at the same moment: the
// database holds them unique, and a request that lost the race takes the next one.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const SQUARE = {
  outline: [
    [0, 0],
    [3000, 0],
    [3000, 3000],
    [0, 3000],
  ],
};
const PARALLEL = 12;

describe('room positions', () => {
  it('rooms created in parallel get distinct positions, in one sequence', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = (await agent.post('/api/projects').send({ name: 'Busy flat', newClient: { name: 'Pat' } })).body.project
      .id as string;
    const plan = { format: 'parlour-plan', version: 1, room: { name: 'Imported', ...SQUARE }, option: { name: 'A', pieces: [] } };
    const answers = await Promise.all(
      Array.from({ length: PARALLEL }, (_, i) =>
        i % 3 === 2
          ? agent.post(`/api/projects/${projectId}/rooms/import`).send(plan)
          : agent.post(`/api/projects/${projectId}/rooms`).send({ name: `Room ${i}`, shell: SQUARE }),
      ),
    );
    expect(answers.map((a) => a.status)).toEqual(Array(PARALLEL).fill(201));
    const positions = answers.map((a) => a.body.room.position as number).sort((a, b) => a - b);
    expect(positions).toEqual(Array.from({ length: PARALLEL }, (_, i) => i));
    const listed = (await agent.get(`/api/projects/${projectId}/rooms`)).body.rooms.map((r: { position: number }) => r.position);
    expect(listed).toEqual(positions);
  });

  it('the database refuses a second room at a position already taken', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = (await agent.post('/api/projects').send({ name: 'Strict flat', newClient: { name: 'Sam' } })).body.project
      .id as string;
    const first = (await agent.post(`/api/projects/${projectId}/rooms`).send({ name: 'Hall', shell: SQUARE })).body.room;
    const row = await t.db
      .selectFrom('rooms')
      .select(['studio_id', 'shell'])
      .where('id', '=', first.id)
      .executeTakeFirstOrThrow();
    await expect(
      t.db
        .insertInto('rooms')
        .values({
          studio_id: row.studio_id,
          project_id: projectId,
          name: 'Twin',
          position: first.position,
          shell: JSON.stringify(row.shell),
        })
        .execute(),
    ).rejects.toMatchObject({ code: '23505', constraint: 'rooms_project_position_key' });
  });
});
