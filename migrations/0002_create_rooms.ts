// Migration 0002: creates rooms (the shell as jsonb) and their options (pieces and finishes as
// jsonb), each with a version for optimistic concurrency.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: rooms (the shell as jsonb) and options (pieces and finishes as jsonb),
// each with a version for optimistic concurrency.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('rooms')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('project_id', 'uuid', (c) => c.notNull().references('projects.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('position', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('shell', 'jsonb', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('rooms_project_idx').on('rooms').columns(['project_id', 'position']).execute();

  await db.schema
    .createTable('options')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('room_id', 'uuid', (c) => c.notNull().references('rooms.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('position', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('doc', 'jsonb', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('options_room_idx').on('options').columns(['room_id', 'position']).execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('options').ifExists().execute();
  await db.schema.dropTable('rooms').ifExists().execute();
}
