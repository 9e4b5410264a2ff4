// Database reads and writes for rooms and their options: list, fetch, add, save by version, reorder
// and delete, plus the presentations and choices that show a room or option.
import { sql } from 'kysely';
import type { Db } from '../../db/database';
import { roomShellSchema } from '../../../shared/schemas/room';
import { optionDocSchema, withoutNonWebLinks } from '../../../shared/schemas/option';
import type { OptionRecord, RoomRecord } from '../../../shared/schemas/room-api';

type RoomRow = {
  id: string;
  project_id: string;
  name: string;
  position: number;
  shell: unknown;
  version: number;
  updated_at: Date;
};
type OptionRow = {
  id: string;
  room_id: string;
  name: string;
  note: string;
  position: number;
  doc: unknown;
  version: number;
  updated_at: Date;
};

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
  doc: optionDocSchema.parse(withoutNonWebLinks(r.doc)),
  version: r.version,
  updatedAt: r.updated_at.toISOString(),
});

const json = (value: unknown) => sql<unknown>`${JSON.stringify(value)}::jsonb`;

export async function listRooms(db: Db, studioId: string, projectId: string) {
  return (
    db
      .selectFrom('rooms')
      .select([...ROOM_COLUMNS])
      .select((eb) =>
        eb
          .selectFrom('options')
          .whereRef('options.room_id', '=', 'rooms.id')
          .select(eb.fn.countAll<number>().as('n'))
          .as('option_count'),
      )
      // A piece moved or an option renamed is a change to the room as the designer sees it.
      .select((eb) =>
        eb
          .selectFrom('options')
          .whereRef('options.room_id', '=', 'rooms.id')
          .select((sub) => sub.fn.max('options.updated_at').as('t'))
          .as('options_updated_at'),
      )
      .where('studio_id', '=', studioId)
      .where('project_id', '=', projectId)
      .orderBy('position')
      .orderBy('created_at')
      .execute()
  );
}

/**
 * How many rooms a project holds, with the project's row locked until the transaction ends, so
 * parallel creations count one after the other and a cap cannot be passed by racing it.
 */
export async function countRoomsLocked(trx: Db, projectId: string): Promise<number> {
  await trx.selectFrom('projects').select('id').where('id', '=', projectId).forUpdate().execute();
  const r = await trx
    .selectFrom('rooms')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('project_id', '=', projectId)
    .executeTakeFirstOrThrow();
  return Number(r.n);
}

/** How many options a room holds, with the room's row locked as in countRoomsLocked. */
export async function countOptionsLocked(trx: Db, roomId: string): Promise<number> {
  await trx.selectFrom('rooms').select('id').where('id', '=', roomId).forUpdate().execute();
  const r = await trx
    .selectFrom('options')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('room_id', '=', roomId)
    .executeTakeFirstOrThrow();
  return Number(r.n);
}

export async function getRoom(db: Db, studioId: string, id: string): Promise<RoomRecord | undefined> {
  const r = await db
    .selectFrom('rooms')
    .select([...ROOM_COLUMNS])
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .executeTakeFirst();
  return r && toRoom(r);
}

/** Tries at the next free position before giving up; each retry sees the rooms committed meanwhile. */
const ROOM_POSITION_ATTEMPTS = 25;

/** Thrown by insertRoom when parallel requests took every position it tried. */
export class RoomPositionsTaken extends Error {
  constructor() {
    super(`No free room position after ${ROOM_POSITION_ATTEMPTS} attempts.`);
  }
}

/**
 * Adds the room after the project's last. Positions are unique (migration 0009): when a parallel
 * request took the same one, the insert waits for it, does nothing, and is tried again at the
 * next position, inside the same transaction (ON CONFLICT does not abort it).
 */
export async function insertRoom(
  db: Db,
  v: { studioId: string; projectId: string; name: string; shell: unknown },
): Promise<RoomRecord> {
  for (let attempt = 0; attempt < ROOM_POSITION_ATTEMPTS; attempt += 1) {
    const next = await db
      .selectFrom('rooms')
      .select((eb) => eb.fn.coalesce(eb.fn.max('position'), sql<number>`-1`).as('max'))
      .where('project_id', '=', v.projectId)
      .executeTakeFirstOrThrow();
    const r = await db
      .insertInto('rooms')
      .values({
        studio_id: v.studioId,
        project_id: v.projectId,
        name: v.name,
        shell: json(v.shell),
        position: Number(next.max) + 1,
      })
      .onConflict((oc) => oc.columns(['project_id', 'position']).doNothing())
      .returning([...ROOM_COLUMNS])
      .executeTakeFirst();
    if (r) return toRoom(r);
  }
  throw new RoomPositionsTaken();
}

/** Saves when `version` is still current; returns undefined when someone saved first. */
export async function updateRoomIfVersion(
  db: Db,
  studioId: string,
  id: string,
  version: number,
  patch: { name?: string; shell?: unknown },
) {
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

/** The room's options in order, each saying whether the decided project stands on it. */
export async function listOptions(db: Db, studioId: string, roomId: string): Promise<OptionRecord[]> {
  const decided = new Set(await decidedChoices(db, studioId, { roomId }));
  const rows = await db
    .selectFrom('options')
    .select([...OPTION_COLUMNS])
    .where('studio_id', '=', studioId)
    .where('room_id', '=', roomId)
    .orderBy('position')
    .orderBy('created_at')
    .execute();
  return rows.map((r) => ({ ...toOption(r), decided: decided.has(r.id) }));
}

export async function getOption(db: Db, studioId: string, id: string): Promise<OptionRecord | undefined> {
  const r = await db
    .selectFrom('options')
    .select([...OPTION_COLUMNS])
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .executeTakeFirst();
  return r && toOption(r);
}

export async function insertOption(
  db: Db,
  v: { studioId: string; roomId: string; name: string; note: string; doc: unknown },
): Promise<OptionRecord> {
  const next = await db
    .selectFrom('options')
    .select((eb) => eb.fn.coalesce(eb.fn.max('position'), sql<number>`-1`).as('max'))
    .where('room_id', '=', v.roomId)
    .executeTakeFirstOrThrow();
  const r = await db
    .insertInto('options')
    .values({
      studio_id: v.studioId,
      room_id: v.roomId,
      name: v.name,
      note: v.note,
      doc: json(v.doc),
      position: Number(next.max) + 1,
    })
    .returning([...OPTION_COLUMNS])
    .executeTakeFirstOrThrow();
  return toOption(r);
}

export async function updateOptionIfVersion(
  db: Db,
  studioId: string,
  id: string,
  version: number,
  patch: { name?: string; note?: string; doc?: unknown },
) {
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

/** Room or option: what a presentation's rows point at. */
export type Shown = { roomId: string } | { optionId: string };

/**
 * The options of this room (or this option) the client chose in the presentation that decided
 * the project, while the project is decided: they stand as decided until it is reopened.
 */
export async function decidedChoices(db: Db, studioId: string, of: Shown): Promise<string[]> {
  const rows = await db
    .selectFrom('choices as c')
    .innerJoin('presentations as p', 'p.id', 'c.presentation_id')
    .innerJoin('projects as pr', 'pr.id', 'p.project_id')
    .select('c.option_id')
    .where('p.studio_id', '=', studioId)
    .where('pr.state', '=', 'decided')
    .where('p.decided_at', '=', (eb) =>
      eb
        .selectFrom('presentations as q')
        .select((q) => q.fn.max('q.decided_at').as('at'))
        .whereRef('q.project_id', '=', 'p.project_id'),
    )
    .where('roomId' in of ? 'c.room_id' : 'c.option_id', '=', 'roomId' in of ? of.roomId : of.optionId)
    .execute();
  return rows.map((r) => r.option_id);
}

/** Presentations that show this room (or option), newest first, and whether a client chose it there. */
export async function presentationsShowing(db: Db, studioId: string, of: Shown) {
  const shown =
    'roomId' in of
      ? db.selectFrom('presentation_rooms').select('presentation_id').where('room_id', '=', of.roomId)
      : db.selectFrom('presentation_options').select('presentation_id').where('option_id', '=', of.optionId);
  const chosen = 'roomId' in of ? sql<boolean>`c.room_id = ${of.roomId}` : sql<boolean>`c.option_id = ${of.optionId}`;
  return db
    .selectFrom('presentations as p')
    .select(['p.id', 'p.created_at', 'p.sent_to', 'p.withdrawn_at'])
    .select(sql<boolean>`exists (select 1 from choices c where c.presentation_id = p.id and ${chosen})`.as('chosen'))
    .where('p.studio_id', '=', studioId)
    .where('p.id', 'in', shown)
    .orderBy('p.created_at', 'desc')
    .execute();
}
