// Database reads and writes for a studio's invitations: add one, list the open ones, find one by
// its token's hash, delete one and mark one accepted.
import type { Db } from '../../db/database';
import type { InviteInfo, Role } from '../../../shared/schemas/studio';

type InviteRow = { id: string; email: string; role: Role; created_at: Date; expires_at: Date; accepted_at: Date | null };

export const toInviteInfo = (r: InviteRow, studioName?: string): InviteInfo => ({
  id: r.id,
  email: r.email,
  role: r.role,
  studioName,
  createdAt: r.created_at.toISOString(),
  expiresAt: r.expires_at.toISOString(),
  acceptedAt: r.accepted_at ? r.accepted_at.toISOString() : null,
});

const INVITE_COLUMNS = [
  'invites.id',
  'invites.email',
  'invites.role',
  'invites.created_at',
  'invites.expires_at',
  'invites.accepted_at',
] as const;

export async function insertInvite(
  db: Db,
  v: { studioId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
) {
  return db
    .insertInto('invites')
    .values({
      studio_id: v.studioId,
      email: v.email,
      role: v.role,
      token_hash: v.tokenHash,
      invited_by: v.invitedBy,
      expires_at: v.expiresAt,
    })
    .returning(['id', 'email', 'role', 'created_at', 'expires_at', 'accepted_at'])
    .executeTakeFirstOrThrow();
}

export async function listOpenInvites(db: Db, studioId: string) {
  return db
    .selectFrom('invites')
    .select(INVITE_COLUMNS)
    .where('studio_id', '=', studioId)
    .where('accepted_at', 'is', null)
    .where('expires_at', '>', new Date())
    .orderBy('created_at', 'desc')
    .execute();
}

/** `forUpdate` (inside a transaction): holds the invitation until commit, so it is accepted once. */
export async function findInviteByTokenHash(db: Db, tokenHash: string, opts: { forUpdate?: boolean } = {}) {
  const q = db
    .selectFrom('invites')
    .innerJoin('studios', 'studios.id', 'invites.studio_id')
    .select([...INVITE_COLUMNS, 'invites.studio_id', 'studios.name as studio_name'])
    .where('invites.token_hash', '=', tokenHash);
  return (opts.forUpdate ? q.forUpdate(['invites']) : q).executeTakeFirst();
}

export async function deleteInvite(db: Db, studioId: string, id: string): Promise<boolean> {
  const r = await db
    .deleteFrom('invites')
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .where('accepted_at', 'is', null)
    .executeTakeFirst();
  return Number(r.numDeletedRows) > 0;
}

export async function markInviteAccepted(db: Db, id: string): Promise<void> {
  await db.updateTable('invites').set({ accepted_at: new Date() }).where('id', '=', id).execute();
}
