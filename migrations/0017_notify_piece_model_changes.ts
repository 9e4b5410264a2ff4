// Migration 0017 (frozen once landed): a piece model that becomes ready, is turned, rescaled or
// deleted changes what a client's link shows, so its writes tell the app instances like the other
// watched tables do (migration 0006's function, with the studio's id on 'parlour_changes').
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`create trigger piece_models_notify_change after update or delete on piece_models
    for each row execute function parlour_notify_studio_change('studio_id')`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop trigger piece_models_notify_change on piece_models`.execute(db);
}
