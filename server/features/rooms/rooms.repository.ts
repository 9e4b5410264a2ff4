import { sql } from 'kysely';
import type { Db } from '../../db/database';
import { roomShellSchema } from '../../../shared/schemas/room';
import { optionDocSchema } from '../../../shared/schemas/option';
import type { OptionRecord, RoomRecord } from '../../../shared/schemas/room-api';

type RoomRow = { id: string; project_id: string; name: string; position: number; shell: unknown; version: number; updated_at: Date };
type OptionRow = { id: string; room_id: string; name: string; note: string; position: number; doc: unknown; version: number; updated_at: Date };

const ROOM_COLUMNS = ['id', 'project_id', 'name', 'position', 'shell', 'version', 'updated_at'] as const;
const OPTION_COLUMNS = ['id', 'room_id', 'name', 'note', 'position', 'doc', 'version', 'updated_at'] as const;

// Stored documents are parsed on the way out too, so defaults added later reach old rows.
export const toRoom = (r: RoomRow): RoomRecord => ({
  id: r.id,
  projectId: r.project_id,
  name: r.name,
  position: r.position,
  shell: roomShellSchema.parse(r.shell),
  version: r.version,
  updatedAt: r.updated_at.toISOString(),
});

export const toOption = (r: OptionRow): OptionRecord => ({
  id: r.id,
  roomId: r.room_id,
  name: r.name,
  note: r.note,
  position: r.position,
  doc: optionDocSchema.parse(r.doc),
  version: r.version,
  updatedAt: r.updated_at.toISOString(),
});

const json = (value: unknown) => sql<unknown>`${JSON.stringify(value)}::jsonb`;

export async function listRooms(db: Db, studioId: string, projectId: string) {
  return db
    .selectFrom('rooms')
    .select([...ROOM_COLUMNS])
    .select((eb) => eb.selectFrom('options').whereRef('options.room_id', '=', 'rooms.id').select(eb.fn.countAll<number>().as('n')).as('option_count'))
    // A piece moved or an option renamed is a change to the room as the designer sees it.
    .select((eb) => eb.selectFrom('options').whereRef('options.room_id', '=', 'rooms.id').select((sub) => sub.fn.max('options.updated_at').as('t')).as('options_updated_at'))
    .where('studio_id', '=', studioId)
    .where('project_id', '=', projectId)
    .orderBy('position')
    .orderBy('created_at')
    .execute();
}

export async function getRoom(db: Db, studioId: string, id: string): Promise<RoomRecord | undefined> {
  const r = await db.selectFrom('rooms').select([...ROOM_COLUMNS]).where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
  return r && toRoom(r);
}

export async function insertRoom(db: Db, v: { studioId: string; projectId: string; name: string; shell: unknown }): Promise<RoomRecord> {
  const next = await db
    .selectFrom('rooms')
    .select((eb) => eb.fn.coalesce(eb.fn.max('position'), sql<number>`-1`).as('max'))
    .where('project_id', '=', v.projectId)
    .executeTakeFirstOrThrow();
  const r = await db
    .insertInto('rooms')
    .values({ studio_id: v.studioId, project_id: v.projectId, name: v.name, shell: json(v.shell), position: Number(next.max) + 1 })
    .returning([...ROOM_COLUMNS])
    .executeTakeFirstOrThrow();
  return toRoom(r);
}

/** Saves when `version` is still current; returns undefined when someone saved first. */
export async function updateRoomIfVersion(db: Db, studioId: string, id: string, version: number, patch: { name?: string; shell?: unknown }) {
  const r = await db
    .updateTable('rooms')
    .set({
      ...(patch.name !== undefined ? { name: patch.name } : {}),
      ...(patch.shell !== undefined ? { shell: json(patch.shell) } : {}),
      version: sql`version + 1`,
      updated_at: new Date(),
    })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .where('version', '=', version)
    .returning([...ROOM_COLUMNS])
    .executeTakeFirst();
  return r && toRoom(r);
}

export async function deleteRoom(db: Db, studioId: string, id: string): Promise<boolean> {
  const r = await db.deleteFrom('rooms').where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
  return Number(r.numDeletedRows) > 0;
}

export async function listOptions(db: Db, studioId: string, roomId: string): Promise<OptionRecord[]> {
  const rows = await db
    .selectFrom('options')
    .select([...OPTION_COLUMNS])
    .where('studio_id', '=', studioId)
    .where('room_id', '=', roomId)
    .orderBy('position')
    .orderBy('created_at')
    .execute();
  return rows.map(toOption);
}

export async function getOption(db: Db, studioId: string, id: string): Promise<OptionRecord | undefined> {
  const r = await db.selectFrom('options').select([...OPTION_COLUMNS]).where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
  return r && toOption(r);
}

export async function insertOption(db: Db, v: { studioId: string; roomId: string; name: string; note: string; doc: unknown }): Promise<OptionRecord> {
  const next = await db
    .selectFrom('options')
    .select((eb) => eb.fn.coalesce(eb.fn.max('position'), sql<number>`-1`).as('max'))
    .where('room_id', '=', v.roomId)
    .executeTakeFirstOrThrow();
  const r = await db
    .insertInto('options')
    .values({ studio_id: v.studioId, room_id: v.roomId, name: v.name, note: v.note, doc: json(v.doc), position: Number(next.max) + 1 })
    .returning([...OPTION_COLUMNS])
    .executeTakeFirstOrThrow();
  return toOption(r);
}

export async function updateOptionIfVersion(db: Db, studioId: string, id: string, version: number, patch: { name?: string; note?: string; doc?: unknown }) {
  const r = await db
    .updateTable('options')
    .set({
      ...(patch.name !== undefined ? { name: patch.name } : {}),
      ...(patch.note !== undefined ? { note: patch.note } : {}),
      ...(patch.doc !== undefined ? { doc: json(patch.doc) } : {}),
      version: sql`version + 1`,
      updated_at: new Date(),
    })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .where('version', '=', version)
    .returning([...OPTION_COLUMNS])
    .executeTakeFirst();
  return r && toOption(r);
}

export async function setOptionPositions(db: Db, roomId: string, ids: string[]): Promise<void> {
  for (const [position, id] of ids.entries()) {
    await db.updateTable('options').set({ position }).where('room_id', '=', roomId).where('id', '=', id).execute();
  }
}

export async function deleteOption(db: Db, id: string): Promise<void> {
  await db.deleteFrom('options').where('id', '=', id).execute();
}
