// Migration 0007: creates sent_mail, one row per message Parlour sent with its studio, so the
// local Outbox shows each studio only its own mail.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: the mail Parlour sent, one row per message with the studio it was sent for,
// so the local Outbox can show each studio its own sent mail (and nothing of any other studio's).
// created_at keeps milliseconds only, so a page's last time can be handed back as the next page's
// start without losing the microseconds JavaScript's Date cannot hold.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('sent_mail')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('sender', 'text', (c) => c.notNull())
    .addColumn('recipient', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('text_body', 'text', (c) => c.notNull())
    .addColumn('html_body', 'text')
    .addColumn('created_at', sql`timestamptz(3)`, (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('sent_mail_kind_check', sql`kind in ('invitation', 'presentation', 'choice')`)
    .execute();
  await db.schema
    .createIndex('sent_mail_studio_idx')
    .on('sent_mail')
    .columns(['studio_id', 'created_at desc', 'id desc'])
    .execute();
  await sql`comment on table sent_mail is 'Mail the app sent, per studio: the local Outbox reads it'`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('sent_mail').execute();
}
