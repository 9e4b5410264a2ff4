import type { Db } from '../db/database';

/** Rooms and options of the demo flat. */
export async function seedDemoRooms(_db: Db, _studioId: string, _projectId: string): Promise<void> {
  // Filled once the room schemas land (geometry core).
}
