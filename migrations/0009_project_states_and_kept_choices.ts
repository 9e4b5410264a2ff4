// Migration 0009: projects keep their state before archiving and who reopened them, a project's
// rooms get unique positions, and the database refuses deleting a room or option a choice points at.
import { sql, type Kysely } from 'kysely';

// Frozen once landed:
// - projects remember the state they had before they were archived (Restore goes back to it) and
//   who reopened a decided project, and when;
// - a project's rooms have unique positions (parallel creation used to give equal ones);
// - a client's choice is never deleted as a side effect: deleting a room or option that a choice
//   points at is refused by the database. Choices still go with their presentation (and so with
//   its project or studio) through a foreign key of their own; the checks on the shown rooms and
//   options are NO ACTION, which PostgreSQL runs at the end of the statement, after that cascade.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .alterTable('projects')
    .addColumn('previous_state', 'text', (c) => c.check(sql`previous_state in ('draft', 'presented', 'decided')`))
    .addColumn('reopened_by', 'uuid', (c) => c.references('members.id').onDelete('set null'))
    .addColumn('reopened_at', 'timestamptz')
    .execute();
  // Projects archived before this knew no previous state: read it from their presentations.
  await sql`
    update projects p set previous_state = case
      when exists (select 1 from presentations x where x.project_id = p.id and x.decided_at is not null) then 'decided'
      when exists (select 1 from presentations x where x.project_id = p.id) then 'presented'
      else 'draft' end
    where p.state = 'archived'`.execute(db);

  // Equal positions made by parallel creation are spread out first, keeping their order.
  await sql`
    update rooms r set position = n.position
    from (select id, (row_number() over (partition by project_id order by position, created_at, id) - 1)::int as position from rooms) n
    where n.id = r.id and r.position <> n.position`.execute(db);
  await db.schema.alterTable('rooms').addUniqueConstraint('rooms_project_position_key', ['project_id', 'position']).execute();

  await db.schema.alterTable('choices').dropConstraint('choices_room_fk').execute();
  await db.schema.alterTable('choices').dropConstraint('choices_option_fk').execute();
  await db.schema
    .alterTable('choices')
    .addForeignKeyConstraint('choices_presentation_fk', ['presentation_id'], 'presentations', ['id'], (c) =>
      c.onDelete('cascade'),
    )
    .execute();
  await db.schema
    .alterTable('choices')
    .addForeignKeyConstraint(
      'choices_room_fk',
      ['presentation_id', 'room_id'],
      'presentation_rooms',
      ['presentation_id', 'room_id'],
      (c) => c.onDelete('no action'),
    )
    .execute();
  await db.schema
    .alterTable('choices')
    .addForeignKeyConstraint(
      'choices_option_fk',
      ['presentation_id', 'option_id'],
      'presentation_options',
      ['presentation_id', 'option_id'],
      (c) => c.onDelete('no action'),
    )
    .execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('choices').dropConstraint('choices_option_fk').execute();
  await db.schema.alterTable('choices').dropConstraint('choices_room_fk').execute();
  await db.schema.alterTable('choices').dropConstraint('choices_presentation_fk').execute();
  await db.schema
    .alterTable('choices')
    .addForeignKeyConstraint(
      'choices_room_fk',
      ['presentation_id', 'room_id'],
      'presentation_rooms',
      ['presentation_id', 'room_id'],
      (c) => c.onDelete('cascade'),
    )
    .execute();
  await db.schema
    .alterTable('choices')
    .addForeignKeyConstraint(
      'choices_option_fk',
      ['presentation_id', 'option_id'],
      'presentation_options',
      ['presentation_id', 'option_id'],
      (c) => c.onDelete('cascade'),
    )
    .execute();
  await db.schema.alterTable('rooms').dropConstraint('rooms_project_position_key').execute();
  await db.schema
    .alterTable('projects')
    .dropColumn('reopened_at')
    .dropColumn('reopened_by')
    .dropColumn('previous_state')
    .execute();
}
