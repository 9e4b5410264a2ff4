// Migration 0013 (frozen once landed): mail nobody waits for (a choice notification, an invitation) is kept
// here from the moment it is queued until it is sent, with how it is going, so a project's page
// can show each such message as sending, sent or failing. The message's text is dropped once sent
// (in the local setup sent_mail keeps its copy for the Outbox); the row stays as the record.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('queued_mail')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('project_id', 'uuid', (c) => c.references('projects.id').onDelete('cascade'))
    // An invitation's mail goes with it: a cancelled invitation's unsent mail is never sent.
    .addColumn('invite_id', 'uuid', (c) => c.references('invites.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('recipient', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('text_body', 'text')
    .addColumn('html_body', 'text')
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('sending'))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('sent_at', 'timestamptz')
    .addCheckConstraint('queued_mail_kind_check', sql`kind in ('invitation', 'presentation', 'choice')`)
    .addCheckConstraint('queued_mail_state_check', sql`state in ('sending', 'sent', 'failing', 'failed')`)
    .execute();
  await db.schema
    .createIndex('queued_mail_project_idx')
    .on('queued_mail')
    .columns(['project_id', 'created_at desc'])
    .where(sql.ref('project_id'), 'is not', null)
    .execute();
  await db.schema
    .createIndex('queued_mail_invite_idx')
    .on('queued_mail')
    .column('invite_id')
    .where(sql.ref('invite_id'), 'is not', null)
    .execute();
  await sql`comment on table queued_mail is 'Mail sent through the job queue, and whether it has gone'`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('queued_mail').execute();
}
