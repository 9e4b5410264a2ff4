// The studio's own row: its settings for prices.
import type { Db } from '../../db/database';
import type { MoneySettings } from '../../../shared/units/money';

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
