// Who may load a stored file. Now: signed-in members of a studio that owns a finish using it.
// Later: a presentation's visitor, for the files of the finishes its options use (add the check
// here, so the files route keeps one question to ask).
import type { Db } from '../../db/database';
import type { Caller } from '../../http/routes';

export async function canReadFile(db: Db, caller: Caller | null, fileKey: string): Promise<boolean> {
  if (!caller) return false;
  const row = await db
    .selectFrom('finish_files')
    .select('finish_id')
    .where('key', '=', fileKey)
    .where('studio_id', '=', caller.studioId)
    // The kept original is private even to the studio: only what processing made is served.
    .where('purpose', '<>', 'master')
    .limit(1)
    .executeTakeFirst();
  return Boolean(row);
}
