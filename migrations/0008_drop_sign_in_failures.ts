// Migration 0008: drops sign_in_failures, as sign-in attempts are now counted in rate_limit_counts.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: sign-in attempts are counted in rate_limit_counts (bucket 'sign-in'), so the
// table of wrong passwords from 0001 has no reader or writer left.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('sign_in_failures').ifExists().execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('sign_in_failures')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('sign_in_failures_email_at_idx').on('sign_in_failures').columns(['email', 'at']).execute();
}
