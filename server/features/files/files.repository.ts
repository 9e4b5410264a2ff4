// All SQL of the files feature: which stored files a studio's finishes use, and for what.
import type { Db } from '../../db/database';

/** Whether one of the studio's finishes uses `key` for something processing made (not its kept original). */
export async function isDerivedFileOfStudio(db: Db, studioId: string, key: string): Promise<boolean> {
  const row = await db
    .selectFrom('finish_files')
    .select('finish_id')
    .where('key', '=', key)
    .where('studio_id', '=', studioId)
    .where('purpose', '<>', 'master')
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}

/** Whether `key` is a texture (either size) of one of these finishes of the studio. */
export async function isTextureOfFinishes(db: Db, studioId: string, finishIds: readonly string[], key: string): Promise<boolean> {
  if (finishIds.length === 0) return false;
  const row = await db
    .selectFrom('finish_files')
    .select('finish_id')
    .where('key', '=', key)
    .where('studio_id', '=', studioId)
    .where('finish_id', 'in', [...finishIds])
    .where('purpose', 'in', ['texture', 'texture-large'])
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}
