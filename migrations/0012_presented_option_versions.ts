import { sql, type Kysely } from 'kysely';

// Frozen once landed: each option a presentation shows keeps the version it had when the link was
// made, so the client's page can tell an option changed since then. Links made before this keep
// today's versions (nothing reads as changed).

export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('presentation_options').addColumn('sent_version', 'integer').execute();
  await sql`update presentation_options po set sent_version = o.version from options o where o.id = po.option_id`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('presentation_options').dropColumn('sent_version').execute();
}
