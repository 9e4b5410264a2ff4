// All SQL of presentations: the link's row, what it shows, and what the client looked at and chose.
import { sql, type Selectable } from 'kysely';
import type { Db, PresentationsTable } from '../../db/database';

export type PresentationRow = Selectable<PresentationsTable>;

export async function insertPresentation(
  db: Db,
  v: {
    studioId: string;
    projectId: string;
    createdBy: string;
    tokenId: string;
    message: string;
    showPrices: boolean;
    issuedAt: Date;
    tokenExpiresAt: Date;
    expiresAt: Date;
  },
): Promise<PresentationRow> {
  return db
    .insertInto('presentations')
    .values({
      studio_id: v.studioId,
      project_id: v.projectId,
      created_by: v.createdBy,
      token_id: v.tokenId,
      message: v.message,
      show_prices: v.showPrices,
      issued_at: v.issuedAt,
      token_expires_at: v.tokenExpiresAt,
      expires_at: v.expiresAt,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

/** The rooms and options a presentation shows, each list in the order given, with each option's version now. */
export async function insertShownRooms(
  db: Db,
  presentationId: string,
  rooms: { roomId: string; optionIds: string[] }[],
): Promise<void> {
  await db
    .insertInto('presentation_rooms')
    .values(rooms.map((r, position) => ({ presentation_id: presentationId, room_id: r.roomId, position })))
    .execute();
  await db
    .insertInto('presentation_options')
    .values(
      rooms.flatMap((r) =>
        r.optionIds.map((optionId, position) => ({
          presentation_id: presentationId,
          room_id: r.roomId,
          option_id: optionId,
          position,
          sent_version: sql<number>`(select version from options where id = ${optionId})`,
        })),
      ),
    )
    .execute();
}

export async function listPresentations(db: Db, studioId: string, projectId: string): Promise<PresentationRow[]> {
  return db
    .selectFrom('presentations')
    .selectAll()
    .where('studio_id', '=', studioId)
    .where('project_id', '=', projectId)
    .orderBy('created_at', 'desc')
    .execute();
}

/** `forUpdate` holds its row until the transaction ends (take it before the project's, as a choice does). */
export async function getPresentation(
  db: Db,
  studioId: string,
  id: string,
  opts: { forUpdate?: boolean } = {},
): Promise<PresentationRow | undefined> {
  const q = db.selectFrom('presentations').selectAll().where('studio_id', '=', studioId).where('id', '=', id);
  return (opts.forUpdate ? q.forUpdate() : q).executeTakeFirst();
}

/** The presentation a verified token names; `forUpdate` holds its row until the transaction ends. */
export async function findByTokenId(
  db: Db,
  tokenId: string,
  opts: { forUpdate?: boolean } = {},
): Promise<PresentationRow | undefined> {
  const q = db.selectFrom('presentations').selectAll().where('token_id', '=', tokenId);
  return (opts.forUpdate ? q.forUpdate() : q).executeTakeFirst();
}

/** Rooms and options shown by these presentations, in presentation order, with their documents. */
export async function listShownOptions(db: Db, presentationIds: string[]) {
  if (presentationIds.length === 0) return [];
  return db
    .selectFrom('presentation_options as po')
    .innerJoin('presentation_rooms as pr', (j) =>
      j.onRef('pr.presentation_id', '=', 'po.presentation_id').onRef('pr.room_id', '=', 'po.room_id'),
    )
    .innerJoin('rooms', 'rooms.id', 'po.room_id')
    .innerJoin('options', 'options.id', 'po.option_id')
    .select([
      'po.presentation_id',
      'po.room_id',
      'po.option_id',
      'po.position as option_position',
      'po.view_count',
      'po.last_viewed_at',
      'pr.position as room_position',
      'rooms.name as room_name',
      'rooms.shell',
      'options.name as option_name',
      'options.note',
      'options.doc',
      'options.version as option_version',
      'po.sent_version',
    ])
    .where('po.presentation_id', 'in', presentationIds)
    .orderBy('pr.position')
    .orderBy('po.position')
    .execute();
}

export async function listChoices(db: Db, presentationIds: string[]) {
  if (presentationIds.length === 0) return [];
  return db
    .selectFrom('choices')
    .select(['presentation_id', 'room_id', 'option_id', 'comment', 'chosen_at'])
    .where('presentation_id', 'in', presentationIds)
    .execute();
}

export async function getChoice(db: Db, presentationId: string, roomId: string) {
  return db
    .selectFrom('choices')
    .select(['option_id', 'comment', 'chosen_at'])
    .where('presentation_id', '=', presentationId)
    .where('room_id', '=', roomId)
    .executeTakeFirst();
}

export async function saveChoice(
  db: Db,
  v: { presentationId: string; roomId: string; optionId: string; comment: string; at: Date },
): Promise<void> {
  await db
    .insertInto('choices')
    .values({ presentation_id: v.presentationId, room_id: v.roomId, option_id: v.optionId, comment: v.comment, chosen_at: v.at })
    .onConflict((oc) =>
      oc.columns(['presentation_id', 'room_id']).doUpdateSet({ option_id: v.optionId, comment: v.comment, chosen_at: v.at }),
    )
    .execute();
}

/** Whether the presentation shows this option (in this room, when one is named). */
export async function isShownOption(db: Db, presentationId: string, optionId: string, roomId?: string): Promise<boolean> {
  let q = db
    .selectFrom('presentation_options')
    .select('option_id')
    .where('presentation_id', '=', presentationId)
    .where('option_id', '=', optionId);
  if (roomId) q = q.where('room_id', '=', roomId);
  return Boolean(await q.executeTakeFirst());
}

/** Adds `count` visits between `first` and `last` to the link's opened record. */
export async function recordOpens(db: Db, id: string, v: { count: number; first: Date; last: Date }): Promise<void> {
  await db
    .updateTable('presentations')
    .set({
      first_opened_at: sql<Date>`coalesce(first_opened_at, ${v.first})`,
      // greatest() passes over a null, so the first visit sets it.
      last_opened_at: sql<Date>`greatest(last_opened_at, ${v.last})`,
      open_count: sql<number>`open_count + ${v.count}`,
    })
    .where('id', '=', id)
    .execute();
}

/** Counts a look at one shown option; false when the option is not part of the presentation. */
export async function recordViewed(db: Db, presentationId: string, optionId: string, at: Date): Promise<boolean> {
  const r = await db
    .updateTable('presentation_options')
    .set((eb) => ({
      first_viewed_at: eb.fn.coalesce('first_viewed_at', sql<Date>`${at}`),
      last_viewed_at: at,
      view_count: sql`view_count + 1`,
    }))
    .where('presentation_id', '=', presentationId)
    .where('option_id', '=', optionId)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}

export async function updatePresentation(
  db: Db,
  id: string,
  patch: Partial<Pick<PresentationRow, 'withdrawn_at' | 'expires_at' | 'sent_at' | 'sent_to' | 'decided_at'>>,
): Promise<PresentationRow> {
  return db.updateTable('presentations').set(patch).where('id', '=', id).returningAll().executeTakeFirstOrThrow();
}

/** Names and paint colours of the studio's finishes with these ids (others are left out). */
export async function finishLabels(db: Db, studioId: string, ids: string[]) {
  if (ids.length === 0) return [];
  return db
    .selectFrom('finishes')
    .select(['id', 'name', 'colour_hex'])
    .where('studio_id', '=', studioId)
    .where('id', 'in', ids)
    .execute();
}

/** The studio's finish rows with these ids (others are left out), for what the shown options wear. */
export async function finishRows(db: Db, studioId: string, ids: string[]) {
  if (ids.length === 0) return [];
  return db.selectFrom('finishes').selectAll().where('studio_id', '=', studioId).where('id', 'in', ids).execute();
}

/** The project's name and state, and its client's name and e-mail. */
export async function projectForPresentation(db: Db, studioId: string, projectId: string) {
  return db
    .selectFrom('projects')
    .innerJoin('clients', 'clients.id', 'projects.client_id')
    .select(['projects.id', 'projects.name', 'projects.state', 'clients.name as client_name', 'clients.email as client_email'])
    .where('projects.studio_id', '=', studioId)
    .where('projects.id', '=', projectId)
    .executeTakeFirst();
}

/** Rooms of the project with these ids, and the ids of each one's options. */
export async function roomsWithOptions(db: Db, studioId: string, projectId: string, roomIds: string[]) {
  if (roomIds.length === 0) return [];
  return db
    .selectFrom('rooms')
    .leftJoin('options', 'options.room_id', 'rooms.id')
    .select(['rooms.id as room_id', 'options.id as option_id'])
    .where('rooms.studio_id', '=', studioId)
    .where('rooms.project_id', '=', projectId)
    .where('rooms.id', 'in', roomIds)
    .execute();
}

/** When the project's latest Mark as decided was made, if ever. */
export async function latestDecision(db: Db, projectId: string): Promise<Date | undefined> {
  const r = await db
    .selectFrom('presentations')
    .select((eb) => eb.fn.max('decided_at').as('at'))
    .where('project_id', '=', projectId)
    .executeTakeFirst();
  return r?.at ?? undefined;
}

export async function setProjectState(db: Db, projectId: string, state: 'presented' | 'decided'): Promise<void> {
  await db.updateTable('projects').set({ state, updated_at: new Date() }).where('id', '=', projectId).execute();
}

/** Who hears of a choice: the presentation's creator while still a member, else the studio's owners. */
export async function notifyAddresses(db: Db, studioId: string, createdBy: string | null): Promise<string[]> {
  if (createdBy) {
    const creator = await db
      .selectFrom('members')
      .select('email')
      .where('studio_id', '=', studioId)
      .where('id', '=', createdBy)
      .executeTakeFirst();
    if (creator) return [creator.email];
  }
  const owners = await db
    .selectFrom('members')
    .select('email')
    .where('studio_id', '=', studioId)
    .where('role', '=', 'owner')
    .execute();
  return owners.map((o) => o.email);
}
