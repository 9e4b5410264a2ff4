// Migration 0011: drops presentation_requests, as a link's choice and view posts are now counted
// in rate_limit_counts.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: a link's choice and "looked at" posts are counted in rate_limit_counts
// (buckets 'presentation-choice' and 'presentation-view'), so the request log from 0004 has no
// reader or writer left.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('presentation_requests').ifExists().execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('presentation_requests')
    .addColumn('id', 'bigserial', (c) => c.primaryKey())
    .addColumn('presentation_id', 'uuid', (c) => c.notNull().references('presentations.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull().check(sql`kind in ('choice', 'view')`))
    .addColumn('at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema
    .createIndex('presentation_requests_window_idx')
    .on('presentation_requests')
    .columns(['presentation_id', 'kind', 'at'])
    .execute();
}
