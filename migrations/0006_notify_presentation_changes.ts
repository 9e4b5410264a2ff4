// Migration 0006: adds triggers that NOTIFY the app instances when a write may change what a
// client's link shows, so each can drop what it cached for that studio.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: every write that can change what a client's link shows tells the app
// instances, through PostgreSQL's NOTIFY on channel 'parlour_changes' with the studio's id, so
// each instance can drop what it cached for that studio's links. Notices go out at commit, and
// the same notice twice in one transaction is sent once.
const CHANNEL = 'parlour_changes';

// Tables whose rows carry studio_id (or are the studio), with the operations that matter.
const WATCHED: { table: string; column: string; events: string }[] = [
  { table: 'studios', column: 'id', events: 'update or delete' },
  { table: 'projects', column: 'studio_id', events: 'update or delete' },
  { table: 'rooms', column: 'studio_id', events: 'update or delete' },
  { table: 'options', column: 'studio_id', events: 'update or delete' },
  { table: 'finishes', column: 'studio_id', events: 'update or delete' },
  { table: 'finish_files', column: 'studio_id', events: 'insert or update or delete' },
  // Only what the link shows or whether it works; the opened counts change on every visit.
  {
    table: 'presentations',
    column: 'studio_id',
    events: 'update of withdrawn_at, expires_at, message, show_prices, decided_at, token_expires_at or delete',
  },
];

export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create function parlour_notify_studio_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify(${sql.lit(CHANNEL)}, (case when tg_op = 'DELETE' then to_jsonb(old) else to_jsonb(new) end) ->> tg_argv[0]);
      return null;
    end $$`.execute(db);
  await sql`
    create function parlour_notify_choice_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify(${sql.lit(CHANNEL)}, p.studio_id::text)
        from presentations p
        where p.id = (case when tg_op = 'DELETE' then old.presentation_id else new.presentation_id end);
      return null;
    end $$`.execute(db);
  for (const w of WATCHED) {
    await sql`create trigger ${sql.id(`${w.table}_notify_change`)} after ${sql.raw(w.events)} on ${sql.id(w.table)}
      for each row execute function parlour_notify_studio_change(${sql.lit(w.column)})`.execute(db);
  }
  await sql`create trigger choices_notify_change after insert or update or delete on choices
    for each row execute function parlour_notify_choice_change()`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop trigger choices_notify_change on choices`.execute(db);
  for (const w of WATCHED) await sql`drop trigger ${sql.id(`${w.table}_notify_change`)} on ${sql.id(w.table)}`.execute(db);
  await sql`drop function parlour_notify_choice_change()`.execute(db);
  await sql`drop function parlour_notify_studio_change()`.execute(db);
}
