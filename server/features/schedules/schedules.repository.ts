// SQL the take-off, schedules and comparison need beyond the rooms' and finishes' own: the
// client's latest choice per room.
import type { Db } from '../../db/database';

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
