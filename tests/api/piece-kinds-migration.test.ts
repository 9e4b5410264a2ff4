// Tests migration 0010 on stored options: catalogue ids, older demo values and names map to kinds,
// known kinds stay, and the rest become plain-block.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql, type Kysely } from 'kysely';
import { up } from '../../migrations/0010_piece_kinds';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const ROLLBACK = new Error('rollback');

describe('migration 0010: piece kinds', () => {
  it('maps catalogue ids, the older demo values and names to kinds, keeps known kinds, and leaves the rest plain-block', async () => {
    const { agent } = await signUpStudio(t.app);
    const projectId = (await agent.post('/api/projects').send({ name: 'Kinds', newClient: { name: 'C' } })).body.project
      .id as string;
    const room = await agent.post(`/api/projects/${projectId}/rooms`).send({
      name: 'Room',
      shell: {
        outline: [
          [0, 0],
          [4000, 0],
          [4000, 3000],
          [0, 3000],
        ],
      },
    });
    const optionId = room.body.options[0].id as string;
    const stored: [string | undefined, string, string][] = [
      ['sofa-3-seat', 'Three-seat sofa', 'sofa'],
      ['sofa-corner', 'Corner sofa', 'corner-sofa'],
      ['dining-table-4', 'Dining table with 4 chairs', 'dining-set'],
      ['bed-us-queen', 'Queen bed', 'bed'],
      ['bed-uk-super-king', 'Super king bed', 'bed'],
      ['tv-unit', 'TV unit', 'media-unit'],
      ['bedside-table', 'Bedside table', 'bedside-table'],
      ['wall-cabinet', 'Wall cabinet', 'wall-cabinet'],
      ['rug', 'Rug', 'rug'],
      ['custom-box', 'Box', 'plain-block'],
      ['sofa-3', 'Three-seat sofa', 'sofa'],
      ['bed-double', 'Double bed', 'bed'],
      [undefined, 'Tall bookcase', 'bookcase'],
      [undefined, 'Floating shelf', 'wall-shelf'],
      [undefined, 'Second armchair', 'armchair'],
      [undefined, 'Low media unit', 'media-unit'],
      [undefined, 'Bedside table', 'bedside-table'],
      [undefined, 'Fig tree in a pot', 'plant'],
      [undefined, 'Piano', 'plain-block'],
      ['hammock', 'Hammock', 'plain-block'],
      ['open-shelving', 'Anything', 'open-shelving'],
    ];
    const pieces = stored.map(([kind, name], i) => ({
      id: `p${i}`,
      name,
      x: 500,
      y: 500,
      width: 400,
      depth: 400,
      height: 400,
      rotation: 0,
      elevation: 0,
      status: 'new',
      placed: true,
      ...(kind === undefined ? {} : { kind }),
    }));
    const doc = { pieces, finishes: { floor: null, ceiling: null, walls: null, wallOverrides: {} } };
    let after: { pieces: { id: string; kind: string; name: string }[] } | undefined;
    // In a transaction rolled back at the end, so other files' options in the shared database stay untouched.
    await t.db
      .transaction()
      .execute(async (trx) => {
        await sql`update options set doc = ${JSON.stringify(doc)}::jsonb where id = ${optionId}`.execute(trx);
        await up(trx as unknown as Kysely<unknown>);
        const row = await sql<{ doc: typeof after }>`select doc from options where id = ${optionId}`.execute(trx);
        after = row.rows[0].doc;
        throw ROLLBACK;
      })
      .catch((error: unknown) => {
        if (error !== ROLLBACK) throw error;
      });
    expect(after!.pieces.map((p) => [p.name, p.kind])).toEqual(stored.map(([, name, kind]) => [name, kind]));
    expect(after!.pieces.map((p) => p.id)).toEqual(pieces.map((p) => p.id));
    // What the app reads afterwards is the migrated doc parsed by the one schema.
    const reread = await agent.get(`/api/rooms/${room.body.room.id}`);
    expect(reread.status).toBe(200);
  });
});
