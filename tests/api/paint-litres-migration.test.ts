// Tests migration 0012 on stored data: a paint price per unit becomes one per litre, and per unit
// on a paint is refused afterwards.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql, type Kysely } from 'kysely';
import { down, up } from '../../migrations/0012_option_versions_and_paint_litres';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const ROLLBACK = new Error('rollback');

describe('migration 0012: paint prices per litre', () => {
  it('turns a stored paint price per unit into one per litre, and refuses per unit on a paint afterwards', async () => {
    const { agent } = await signUpStudio(t.app);
    const made = await agent
      .post('/api/finishes/paints')
      .send({ name: 'Old tin', colourHex: '#c0b090', price: 14.5, priceUnit: 'litre' });
    expect(made.status).toBe(201);
    const id = made.body.finish.id as string;
    const unitOf = async (db: Kysely<unknown>) =>
      (await sql<{ price_unit: string }>`select price_unit from finishes where id = ${id}`.execute(db)).rows[0].price_unit;
    const seen: string[] = [];
    let refused = false;
    // In a transaction rolled back at the end, so the shared test database keeps its schema.
    await t.db
      .transaction()
      .execute(async (trx) => {
        const db = trx as unknown as Kysely<unknown>;
        await down(db);
        seen.push(await unitOf(db));
        await up(db);
        seen.push(await unitOf(db));
        await sql`savepoint before_unit`.execute(db);
        refused = await sql`update finishes set price_unit = 'unit' where id = ${id}`
          .execute(db)
          .then(() => false)
          .catch(() => true);
        await sql`rollback to savepoint before_unit`.execute(db);
        throw ROLLBACK;
      })
      .catch((error: unknown) => {
        if (error !== ROLLBACK) throw error;
      });
    expect(seen).toEqual(['unit', 'litre']);
    expect(refused).toBe(true);
  });
});
