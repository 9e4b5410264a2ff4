// All SQL of the auth feature's own: a signed-in session's row. (Sessions are made and read by
// services/auth/session.ts; members and studios live in the studio feature's repositories.)
import type { Db } from '../../db/database';

/** Ends one session: its cookie no longer signs anyone in. */
export async function deleteSession(db: Db, sessionId: string): Promise<void> {
  await db.deleteFrom('sessions').where('id', '=', sessionId).execute();
}
