// Migration 0004: creates presentations, the rooms and options each shows, what the client looked
// at and chose, and the log of client requests counted for rate limits.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: presentations (a link for a client, known by its token's random id), the
// rooms and options each shows in order, what the client looked at and chose, and the client
// requests counted for rate limits (in the database, so every instance counts the same).
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('presentations')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('project_id', 'uuid', (c) => c.notNull().references('projects.id').onDelete('cascade'))
    .addColumn('created_by', 'uuid', (c) => c.references('members.id').onDelete('set null'))
    .addColumn('token_id', 'text', (c) => c.notNull().unique())
    .addColumn('message', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('show_prices', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('issued_at', 'timestamptz', (c) => c.notNull())
    .addColumn('token_expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('withdrawn_at', 'timestamptz')
    .addColumn('decided_at', 'timestamptz')
    .addColumn('sent_at', 'timestamptz')
    .addColumn('sent_to', 'text')
    .addColumn('first_opened_at', 'timestamptz')
    .addColumn('last_opened_at', 'timestamptz')
    .addColumn('open_count', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('presentations_expiry_check', sql`expires_at <= token_expires_at`)
    .execute();
  await db.schema.createIndex('presentations_project_idx').on('presentations').columns(['project_id', 'created_at']).execute();

  await db.schema
    .createTable('presentation_rooms')
    .addColumn('presentation_id', 'uuid', (c) => c.notNull().references('presentations.id').onDelete('cascade'))
    .addColumn('room_id', 'uuid', (c) => c.notNull().references('rooms.id').onDelete('cascade'))
    .addColumn('position', 'integer', (c) => c.notNull())
    .addPrimaryKeyConstraint('presentation_rooms_pk', ['presentation_id', 'room_id'])
    .execute();

  await db.schema
    .createTable('presentation_options')
    .addColumn('presentation_id', 'uuid', (c) => c.notNull())
    .addColumn('room_id', 'uuid', (c) => c.notNull())
    .addColumn('option_id', 'uuid', (c) => c.notNull().references('options.id').onDelete('cascade'))
    .addColumn('position', 'integer', (c) => c.notNull())
    .addColumn('view_count', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('first_viewed_at', 'timestamptz')
    .addColumn('last_viewed_at', 'timestamptz')
    .addPrimaryKeyConstraint('presentation_options_pk', ['presentation_id', 'option_id'])
    .addForeignKeyConstraint(
      'presentation_options_room_fk',
      ['presentation_id', 'room_id'],
      'presentation_rooms',
      ['presentation_id', 'room_id'],
      (c) => c.onDelete('cascade'),
    )
    .execute();

  // One choice per room of a presentation; changing it updates the row with a new time.
  await db.schema
    .createTable('choices')
    .addColumn('presentation_id', 'uuid', (c) => c.notNull())
    .addColumn('room_id', 'uuid', (c) => c.notNull())
    .addColumn('option_id', 'uuid', (c) => c.notNull())
    .addColumn('comment', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('chosen_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('choices_pk', ['presentation_id', 'room_id'])
    .addForeignKeyConstraint(
      'choices_room_fk',
      ['presentation_id', 'room_id'],
      'presentation_rooms',
      ['presentation_id', 'room_id'],
      (c) => c.onDelete('cascade'),
    )
    .addForeignKeyConstraint(
      'choices_option_fk',
      ['presentation_id', 'option_id'],
      'presentation_options',
      ['presentation_id', 'option_id'],
      (c) => c.onDelete('cascade'),
    )
    .execute();

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

export async function down(db: Kysely<unknown>): Promise<void> {
  for (const t of ['presentation_requests', 'choices', 'presentation_options', 'presentation_rooms', 'presentations']) {
    await db.schema.dropTable(t).ifExists().execute();
  }
}
