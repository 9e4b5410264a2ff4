// All SQL for finishes and the files they own.
import type { Insertable, Selectable, Updateable } from 'kysely';
import type { Db, FinishFilesTable, FinishesTable } from '../../db/database';
import type { FinishListQuery } from '../../../shared/schemas/finish';
import { likePattern } from '../clients/clients.repository';

export type FinishRow = Selectable<FinishesTable>;
export type FinishFileRow = Selectable<FinishFilesTable>;
export type NewFinish = Insertable<FinishesTable>;
export type FinishChanges = Updateable<FinishesTable>;

const LIST_LIMIT = 500;

export async function listFinishRows(db: Db, studioId: string, query: FinishListQuery): Promise<FinishRow[]> {
  let qb = db.selectFrom('finishes').selectAll().where('studio_id', '=', studioId);
  if (query.q) {
    const p = likePattern(query.q);
    qb = qb.where((eb) => eb.or([eb('name', 'ilike', p), eb('supplier', 'ilike', p), eb('code', 'ilike', p)]));
  }
  if (query.category) qb = qb.where('category', '=', query.category);
  if (query.kind) qb = qb.where('kind', '=', query.kind);
  return qb.orderBy('created_at', 'desc').orderBy('name').orderBy('id').limit(LIST_LIMIT).execute();
}

export async function getFinishRow(db: Db, studioId: string, id: string): Promise<FinishRow | undefined> {
  return db.selectFrom('finishes').selectAll().where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
}

/** Unscoped: for the processing job, which runs for whichever studio queued it. */
/** The studio's finish rows among `ids` (each an id already). */
export async function getFinishRowsByIds(db: Db, studioId: string, ids: string[]): Promise<FinishRow[]> {
  if (ids.length === 0) return [];
  return db.selectFrom('finishes').selectAll().where('studio_id', '=', studioId).where('id', 'in', ids).execute();
}

export async function getFinishRowById(db: Db, id: string): Promise<FinishRow | undefined> {
  return db.selectFrom('finishes').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function insertFinishRows(db: Db, rows: NewFinish[]): Promise<FinishRow[]> {
  return db.insertInto('finishes').values(rows).returningAll().execute();
}

export async function updateFinishRow(
  db: Db,
  studioId: string,
  id: string,
  changes: FinishChanges,
): Promise<FinishRow | undefined> {
  return db
    .updateTable('finishes')
    .set({ ...changes, updated_at: new Date() })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .returningAll()
    .executeTakeFirst();
}

/** Saves a job's result only if nobody changed the crop (or deleted the finish) while it ran. */
export async function finishJobIfCurrent(db: Db, id: string, revision: number, changes: FinishChanges): Promise<boolean> {
  const row = await db
    .updateTable('finishes')
    .set({ ...changes, updated_at: new Date() })
    .where('id', '=', id)
    .where('revision', '=', revision)
    .where('status', '=', 'processing')
    .returning('id')
    .executeTakeFirst();
  return Boolean(row);
}

export async function deleteFinishRow(db: Db, studioId: string, id: string): Promise<FinishRow | undefined> {
  return db.deleteFrom('finishes').where('studio_id', '=', studioId).where('id', '=', id).returningAll().executeTakeFirst();
}

export async function filesOf(db: Db, finishIds: string[]): Promise<FinishFileRow[]> {
  if (finishIds.length === 0) return [];
  return db.selectFrom('finish_files').selectAll().where('finish_id', 'in', finishIds).execute();
}

export async function replaceFiles(db: Db, finishId: string, files: FinishFileRow[]): Promise<void> {
  await db.deleteFrom('finish_files').where('finish_id', '=', finishId).execute();
  if (files.length > 0) await db.insertInto('finish_files').values(files).execute();
}

/** Which of `keys` a finish still uses (as a file or as its original). */
export async function keysInUse(db: Db, keys: string[]): Promise<Set<string>> {
  if (keys.length === 0) return new Set();
  const [files, sources] = await Promise.all([
    db.selectFrom('finish_files').select('key').where('key', 'in', keys).execute(),
    db.selectFrom('finishes').select('source_key').where('source_key', 'in', keys).execute(),
  ]);
  return new Set([...files.map((f) => f.key), ...sources.map((s) => s.source_key as string)]);
}
