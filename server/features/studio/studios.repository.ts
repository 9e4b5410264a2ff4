// All SQL of the studios table: making one at sign-up, its name and age, its settings for prices.
import type { Db } from '../../db/database';
import type { MoneySettings } from '../../../shared/units/money';

export async function insertStudio(db: Db, name: string): Promise<{ id: string }> {
  return db.insertInto('studios').values({ name }).returning(['id']).executeTakeFirstOrThrow();
}

export async function getStudio(db: Db, studioId: string): Promise<({ id: string; name: string } & MoneySettings) | undefined> {
  return db.selectFrom('studios').select(['id', 'name', 'currency', 'locale']).where('id', '=', studioId).executeTakeFirst();
}

export async function studioName(db: Db, studioId: string): Promise<string> {
  const r = await db.selectFrom('studios').select('name').where('id', '=', studioId).executeTakeFirstOrThrow();
  return r.name;
}

export async function studioCreatedAt(db: Db, studioId: string): Promise<Date> {
  const r = await db.selectFrom('studios').select('created_at').where('id', '=', studioId).executeTakeFirstOrThrow();
  return new Date(r.created_at);
}

export async function studioMoney(db: Db, studioId: string): Promise<MoneySettings> {
  return db.selectFrom('studios').select(['currency', 'locale']).where('id', '=', studioId).executeTakeFirstOrThrow();
}

export async function updateStudioMoney(db: Db, studioId: string, patch: Partial<MoneySettings>): Promise<MoneySettings> {
  if (patch.currency === undefined && patch.locale === undefined) return studioMoney(db, studioId);
  return db
    .updateTable('studios')
    .set(patch)
    .where('id', '=', studioId)
    .returning(['currency', 'locale'])
    .executeTakeFirstOrThrow();
}
