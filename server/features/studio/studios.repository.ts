// All SQL of the studios table: making one at sign-up and reading its name and age.
import type { Db } from '../../db/database';

export async function insertStudio(db: Db, name: string): Promise<{ id: string }> {
  return db.insertInto('studios').values({ name }).returning(['id']).executeTakeFirstOrThrow();
}

export async function getStudio(db: Db, studioId: string): Promise<{ id: string; name: string } | undefined> {
  return db.selectFrom('studios').select(['id', 'name']).where('id', '=', studioId).executeTakeFirst();
}

export async function studioName(db: Db, studioId: string): Promise<string> {
  const r = await db.selectFrom('studios').select('name').where('id', '=', studioId).executeTakeFirstOrThrow();
  return r.name;
}

export async function studioCreatedAt(db: Db, studioId: string): Promise<Date> {
  const r = await db.selectFrom('studios').select('created_at').where('id', '=', studioId).executeTakeFirstOrThrow();
  return new Date(r.created_at);
}
