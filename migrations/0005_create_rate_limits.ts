// Migration 0005: creates rate_limit_counts, the per-rule request counters kept in the database
// so every app instance counts the same requests.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: counters for rate limits, one row per rule, key and fixed window, in the
// database so that every app instance counts the same requests.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('rate_limit_counts')
    .addColumn('bucket', 'text', (c) => c.notNull())
    .addColumn('key', 'text', (c) => c.notNull())
    .addColumn('window_start', 'timestamptz', (c) => c.notNull())
    .addColumn('count', 'integer', (c) => c.notNull().defaultTo(1))
    .addPrimaryKeyConstraint('rate_limit_counts_pk', ['bucket', 'key', 'window_start'])
    .execute();
  await db.schema.createIndex('rate_limit_counts_window_idx').on('rate_limit_counts').column('window_start').execute();
  await sql`comment on table rate_limit_counts is 'Requests per rule, key and window, counted for rate limits'`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('rate_limit_counts').execute();
}
