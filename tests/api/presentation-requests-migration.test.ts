// Tests migration 0011: presentation_requests is dropped, and down() makes it again as 0004 did.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql, type Kysely } from 'kysely';
import { down, up } from '../../migrations/0011_drop_presentation_requests';
import { createTestApp, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const ROLLBACK = new Error('rollback');

type Db = Kysely<unknown>;

const tableExists = async (db: Db) =>
  (
    await sql<{
      n: number;
    }>`select count(*)::int as n from pg_tables where schemaname = 'public' and tablename = 'presentation_requests'`.execute(db)
  ).rows[0].n === 1;

describe('migration 0011: the request log leaves, counted on rate_limit_counts instead', () => {
  it('drops presentation_requests; down() makes it again as 0004 did, columns, check and index', async () => {
    expect(await tableExists(t.db as unknown as Db)).toBe(false);
    // In a transaction rolled back at the end, so the shared database keeps its migrated shape.
    await t.db
      .transaction()
      .execute(async (trx) => {
        const db = trx as unknown as Db;
        await down(db);
        const columns = await sql<{ column_name: string; data_type: string; is_nullable: string }>`
          select column_name, data_type, is_nullable from information_schema.columns
          where table_schema = 'public' and table_name = 'presentation_requests' order by ordinal_position`.execute(db);
        expect(columns.rows).toEqual([
          { column_name: 'id', data_type: 'bigint', is_nullable: 'NO' },
          { column_name: 'presentation_id', data_type: 'uuid', is_nullable: 'NO' },
          { column_name: 'kind', data_type: 'text', is_nullable: 'NO' },
          { column_name: 'at', data_type: 'timestamp with time zone', is_nullable: 'NO' },
        ]);
        const checks = await sql<{ def: string }>`
          select pg_get_constraintdef(oid) as def from pg_constraint
          where conrelid = 'presentation_requests'::regclass and contype in ('c', 'f') order by contype`.execute(db);
        expect(checks.rows.map((r) => r.def)).toEqual([
          expect.stringMatching(/CHECK .*kind.*'choice'.*'view'/),
          expect.stringMatching(/FOREIGN KEY \(presentation_id\) REFERENCES presentations\(id\) ON DELETE CASCADE/),
        ]);
        const index = await sql<{ def: string }>`
          select indexdef as def from pg_indexes where indexname = 'presentation_requests_window_idx'`.execute(db);
        expect(index.rows[0]?.def).toMatch(/\(presentation_id, kind, at\)/);
        await up(db);
        expect(await tableExists(db)).toBe(false);
        throw ROLLBACK;
      })
      .catch((error: unknown) => {
        if (error !== ROLLBACK) throw error;
      });
  });
});
