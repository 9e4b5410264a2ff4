// The studio's members and invitations: the rules (a studio keeps an owner, an invitation is used
// once, in time, by someone without an account) and the transactions that hold them.
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { Caller } from '../../http/routes';
import type { InviteBody, InviteInfo, Member, Role } from '../../../shared/schemas/studio';
import type { AcceptInviteBody } from '../../../shared/schemas/account';
import { HttpError, notFound } from '../../http/errors';
import { memberInviteMail } from '../../services/mail/templates';
import { hashToken, newToken } from '../../services/auth/tokens';
import { hashPassword } from '../../services/auth/passwords';
import { enforceRateLimit, type RateRule } from '../../services/rate-limit/rate-limit';
import { limitInvitationMail } from '../../services/rate-limit/mail-limits';
import { MAIL_JOB, queueStudioMail } from '../outbox/mail-queue';
import {
  countOwners,
  deleteMember,
  deleteSessionsOf,
  findMemberByEmail,
  getMember,
  insertMember,
  setMemberRole,
  toMember,
} from './members.repository';
import { findInviteByTokenHash, insertInvite, markInviteAccepted, toInviteInfo } from './invites.repository';
import { studioName } from './studios.repository';

const INVITE_DAYS = 14;
/** Invitations per studio per hour: a whole team at once, but not a mail cannon (common practice). */
export const INVITE_RATE: RateRule = { bucket: 'invite', limit: 30, windowMs: 60 * 60_000 };

/** Changes a member's role; the studio's last owner stays an owner. */
export async function changeMemberRole(db: Db, caller: Caller, id: string, role: Role): Promise<Member> {
  return db.transaction().execute(async (trx) => {
    const member = await getMember(trx, caller.studioId, id);
    if (!member) throw notFound('That member');
    if (member.role === 'owner' && role !== 'owner' && (await countOwners(trx, caller.studioId)) <= 1) {
      throw new HttpError(409, 'last_owner', 'A studio needs at least one owner. Make someone else an owner first.');
    }
    await setMemberRole(trx, id, role);
    // Sessions read the role on every request, so the change applies at once.
    return toMember({ ...member, role });
  });
}

/** Removes a member and signs them out everywhere; the studio's last owner stays. */
export async function removeMember(db: Db, caller: Caller, id: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const member = await getMember(trx, caller.studioId, id);
    if (!member) throw notFound('That member');
    if (member.role === 'owner' && (await countOwners(trx, caller.studioId)) <= 1) {
      throw new HttpError(409, 'last_owner', 'A studio needs at least one owner.');
    }
    await deleteSessionsOf(trx, id);
    await deleteMember(trx, id);
  });
}

/**
 * Invites someone without an account and e-mails them the link, within the studio's hourly and
 * the recipient's daily limits (a refusal is a 429 with Retry-After). The mail goes through the job
 * queue with the invitation (both commit together), retried while the mail server is away; the
 * open invitations list says whether it has gone.
 */
export async function inviteMember(
  services: Pick<AppServices, 'db' | 'config' | 'jobs'>,
  caller: Caller,
  body: InviteBody,
): Promise<InviteInfo> {
  const { db, config } = services;
  await enforceRateLimit(
    db,
    INVITE_RATE,
    caller.studioId,
    'That is a lot of invitations in a short time. Please wait a while, then send the rest.',
  );
  if (await findMemberByEmail(db, body.email)) {
    throw new HttpError(409, 'email_taken', 'This person already has a Parlour account.', {
      email: 'Already has an account.',
    });
  }
  await limitInvitationMail(db, body.email);
  const studio = await studioName(db, caller.studioId);
  const inviter = await getMember(db, caller.studioId, caller.memberId);
  const { token, hash } = newToken();
  const link = `${config.publicUrl}/invite/${token}`;
  const by = inviter?.name ?? 'A colleague';
  const invite = await db.transaction().execute(async (trx) => {
    const made = await insertInvite(trx, {
      studioId: caller.studioId,
      email: body.email,
      role: body.role,
      tokenHash: hash,
      invitedBy: caller.memberId,
      expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
    });
    await queueStudioMail(trx, services.jobs, {
      studioId: caller.studioId,
      projectId: null,
      inviteId: made.id,
      kind: 'invitation',
      ...memberInviteMail({ to: body.email, by, studio, role: body.role, link, days: INVITE_DAYS }),
    });
    return made;
  });
  services.jobs.wake(MAIL_JOB);
  return toInviteInfo({ ...invite, mail_state: 'sending' });
}

/** The invitation behind a link, refused unless it is still open; `forUpdate` holds it until commit. */
async function openInviteOrThrow(db: Db, token: string, opts: { forUpdate?: boolean } = {}) {
  const invite = await findInviteByTokenHash(db, hashToken(token), opts);
  if (!invite) throw new HttpError(404, 'invite_not_found', 'This invitation link is not valid. Ask the studio for a new one.');
  if (invite.accepted_at) throw new HttpError(410, 'invite_used', 'This invitation has already been accepted. Sign in instead.');
  if (invite.expires_at.getTime() < Date.now())
    throw new HttpError(410, 'invite_expired', 'This invitation has expired. Ask the studio for a new one.');
  return invite;
}

/** What an open invitation's link shows before it is accepted. */
export async function openInvite(db: Db, token: string): Promise<InviteInfo> {
  const invite = await openInviteOrThrow(db, token);
  return toInviteInfo(invite, invite.studio_name);
}

/** Accepts an invitation: the new member, made once however many accept at the same moment. */
export async function acceptInvite(db: Db, token: string, body: AcceptInviteBody) {
  const passwordHash = await hashPassword(body.password);
  return db.transaction().execute(async (trx) => {
    // Locked until commit: a second acceptance at the same moment waits, then finds it used.
    const invite = await openInviteOrThrow(trx, token, { forUpdate: true });
    if (await findMemberByEmail(trx, invite.email)) {
      throw new HttpError(409, 'email_taken', 'This e-mail already has an account. Sign in instead.');
    }
    await markInviteAccepted(trx, invite.id);
    return insertMember(trx, {
      studioId: invite.studio_id,
      email: invite.email,
      name: body.name,
      role: invite.role,
      passwordHash,
    });
  });
}
