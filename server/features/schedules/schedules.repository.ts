// SQL the take-off, schedules and comparison need beyond the rooms' own: the finishes an option
// names, and the client's latest choice per room.
import type { Db } from '../../db/database';
import { toFinishes } from '../finishes/finishes.service';
import type { Finish } from '../../../shared/schemas/finish';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The studio's finishes among `ids`; ids that are not finish ids at all (typed by hand in a plan file) are skipped. */
export async function finishesByIds(db: Db, studioId: string, ids: Iterable<string>): Promise<Finish[]> {
  const wanted = [...new Set(ids)].filter((id) => UUID.test(id));
  if (wanted.length === 0) return [];
  const rows = await db.selectFrom('finishes').selectAll().where('studio_id', '=', studioId).where('id', 'in', wanted).execute();
  return toFinishes(db, rows);
}

/**
 * The option each room's client chose most recently, over the project's presentations that were
 * not withdrawn (a withdrawn link's choices no longer stand).
 */
export async function latestChoices(db: Db, studioId: string, projectId: string): Promise<Map<string, string>> {
  const rows = await db
    .selectFrom('choices')
    .innerJoin('presentations', 'presentations.id', 'choices.presentation_id')
    .select(['choices.room_id', 'choices.option_id'])
    .where('presentations.studio_id', '=', studioId)
    .where('presentations.project_id', '=', projectId)
    .where('presentations.withdrawn_at', 'is', null)
    .orderBy('choices.chosen_at', 'asc')
    .execute();
  // Oldest first, so the latest choice of a room is the one left in the map.
  return new Map(rows.map((r) => [r.room_id, r.option_id]));
}
