// All SQL for piece models: the library's rows, the studio's storage used, and which rooms and
// options wear a model.
import { sql, type Insertable, type Selectable, type Updateable } from 'kysely';
import type { Db, PieceModelsTable } from '../../db/database';

export type PieceModelRow = Selectable<PieceModelsTable>;
export type NewPieceModel = Insertable<PieceModelsTable>;
export type PieceModelChanges = Updateable<PieceModelsTable>;

const LIST_LIMIT = 500;

export async function listModelRows(db: Db, studioId: string): Promise<PieceModelRow[]> {
  return db
    .selectFrom('piece_models')
    .selectAll()
    .where('studio_id', '=', studioId)
    .orderBy('created_at', 'desc')
    .orderBy('name')
    .orderBy('id')
    .limit(LIST_LIMIT)
    .execute();
}

export async function getModelRow(db: Db, studioId: string, id: string): Promise<PieceModelRow | undefined> {
  return db.selectFrom('piece_models').selectAll().where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
}

/** Unscoped: for the processing job, which runs for whichever studio queued it. */
export async function getModelRowById(db: Db, id: string): Promise<PieceModelRow | undefined> {
  return db.selectFrom('piece_models').selectAll().where('id', '=', id).executeTakeFirst();
}

/** The studio's ready models among `ids` (each an id already). */
export async function readyModelRowsByIds(db: Db, studioId: string, ids: string[]): Promise<PieceModelRow[]> {
  if (ids.length === 0) return [];
  return db
    .selectFrom('piece_models')
    .selectAll()
    .where('studio_id', '=', studioId)
    .where('id', 'in', ids)
    .where('status', '=', 'ready')
    .execute();
}

export async function insertModelRow(db: Db, row: NewPieceModel): Promise<PieceModelRow> {
  return db.insertInto('piece_models').values(row).returningAll().executeTakeFirstOrThrow();
}

export async function updateModelRow(
  db: Db,
  studioId: string,
  id: string,
  changes: PieceModelChanges,
): Promise<PieceModelRow | undefined> {
  return db
    .updateTable('piece_models')
    .set({ ...changes, updated_at: new Date() })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .returningAll()
    .executeTakeFirst();
}

/** Saves a processing result only while the model is still processing (it may have been deleted meanwhile). */
export async function finishModelJob(db: Db, id: string, changes: PieceModelChanges): Promise<PieceModelRow | undefined> {
  return db
    .updateTable('piece_models')
    .set({ ...changes, updated_at: new Date() })
    .where('id', '=', id)
    .where('status', '=', 'processing')
    .returningAll()
    .executeTakeFirst();
}

export async function deleteModelRow(db: Db, studioId: string, id: string): Promise<PieceModelRow | undefined> {
  return db.deleteFrom('piece_models').where('studio_id', '=', studioId).where('id', '=', id).returningAll().executeTakeFirst();
}

/** Bytes the studio's models take in storage: originals still kept, normalised files and thumbnails. */
export async function studioModelBytes(db: Db, studioId: string): Promise<number> {
  const row = await db
    .selectFrom('piece_models')
    .select(
      sql<string>`coalesce(sum(case when source_key is null then 0 else source_bytes end + coalesce(model_bytes, 0) + coalesce(thumbnail_bytes, 0)), 0)`.as(
        'bytes',
      ),
    )
    .where('studio_id', '=', studioId)
    .executeTakeFirstOrThrow();
  return Number(row.bytes);
}

/** Serialises uploads of one studio, so two at once cannot both pass the quota. */
export async function lockStudioModels(db: Db, studioId: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtext('piece_models'), hashtext(${studioId}))`.execute(db);
}

export interface WornBy {
  projectName: string;
  roomName: string;
  optionName: string;
  /** The option's place in its room (0 is Option A). */
  optionPosition: number;
}

/** The rooms and options of the studio's live (not archived) projects whose pieces wear the model. */
export async function optionsWearingModel(db: Db, studioId: string, modelId: string): Promise<WornBy[]> {
  return db
    .selectFrom('options as o')
    .innerJoin('rooms as r', 'r.id', 'o.room_id')
    .innerJoin('projects as p', 'p.id', 'r.project_id')
    .select(['p.name as projectName', 'r.name as roomName', 'o.name as optionName', 'o.position as optionPosition'])
    .where('o.studio_id', '=', studioId)
    .where('p.state', '<>', 'archived')
    .where(sql<boolean>`o.doc -> 'pieces' @> ${JSON.stringify([{ modelId }])}::jsonb`)
    .orderBy('p.name')
    .orderBy('r.position')
    .orderBy('o.position')
    .limit(50)
    .execute();
}

/** Whether `key` is the normalised file or thumbnail of one of the studio's models. */
export async function isFileOfStudioModels(db: Db, studioId: string, key: string): Promise<boolean> {
  const row = await db
    .selectFrom('piece_models')
    .select('id')
    .where('studio_id', '=', studioId)
    .where((eb) => eb.or([eb('model_key', '=', key), eb('thumbnail_key', '=', key)]))
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}

/** Whether `key` is the normalised file of one of these models of the studio. */
export async function isModelFileOf(db: Db, studioId: string, modelIds: readonly string[], key: string): Promise<boolean> {
  if (modelIds.length === 0) return false;
  const row = await db
    .selectFrom('piece_models')
    .select('id')
    .where('studio_id', '=', studioId)
    .where('id', 'in', [...modelIds])
    .where('model_key', '=', key)
    .where('status', '=', 'ready')
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}

/** Whether any model still uses `key` (content-hashed files may be shared by two uploads of one file). */
export async function modelKeyInUse(db: Db, key: string): Promise<boolean> {
  const row = await db
    .selectFrom('piece_models')
    .select('id')
    .where((eb) => eb.or([eb('model_key', '=', key), eb('thumbnail_key', '=', key), eb('source_key', '=', key)]))
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}
