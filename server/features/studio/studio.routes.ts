import { z } from 'zod';
import { changeRoleSchema, inviteSchema, studioSettingsSchema } from '../../../shared/schemas/studio';
import { acceptInviteSchema } from '../../../shared/schemas/account';
import { idParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, OWNERS, requireCaller, type RouteDef } from '../../http/routes';
import { HttpError, notFound } from '../../http/errors';
import { escapeHtml } from '../../services/mail/escape-html';
import { hashToken, newToken } from '../../services/auth/tokens';
import { hashPassword } from '../../services/auth/passwords';
import { startSession } from '../../services/auth/session';
import { enforceRateLimit, type RateRule } from '../../services/rate-limit/rate-limit';
import { limitInvitationMail } from '../../services/rate-limit/mail-limits';
import { sendStudioMail } from '../outbox/outbox.service';
import { updateStudioMoney } from './studio.repository';
import {
  countOwners,
  deleteMember,
  deleteSessionsOf,
  findMemberByEmail,
  getMember,
  insertMember,
  listMembers,
  setMemberRole,
  toMember,
} from './members.repository';
import {
  deleteInvite,
  findInviteByTokenHash,
  insertInvite,
  listOpenInvites,
  markInviteAccepted,
  toInviteInfo,
} from './invites.repository';

const INVITE_DAYS = 14;
/** Invitations per studio per hour: a whole team at once, but not a mail cannon (common practice). */
export const INVITE_RATE: RateRule = { bucket: 'invite', limit: 30, windowMs: 60 * 60_000 };
const tokenParamSchema = z.object({ token: z.string().min(20).max(200) });

async function openInviteOrThrow(
  db: Parameters<typeof findInviteByTokenHash>[0],
  token: string,
  opts: { forUpdate?: boolean } = {},
) {
  const invite = await findInviteByTokenHash(db, hashToken(token), opts);
  if (!invite) throw new HttpError(404, 'invite_not_found', 'This invitation link is not valid. Ask the studio for a new one.');
  if (invite.accepted_at) throw new HttpError(410, 'invite_used', 'This invitation has already been accepted. Sign in instead.');
  if (invite.expires_at.getTime() < Date.now())
    throw new HttpError(410, 'invite_expired', 'This invitation has expired. Ask the studio for a new one.');
  return invite;
}

export const studioRoutes: RouteDef[] = [
  {
    // The studio's currency and locale for every price.
    method: 'patch',
    path: '/api/studio/settings',
    access: OWNERS,
    handler: async (ctx) => ({
      settings: await updateStudioMoney(ctx.deps.db, requireCaller(ctx).studioId, studioSettingsSchema.parse(ctx.req.body)),
    }),
  },
  {
    method: 'get',
    path: '/api/studio/members',
    access: ALL_ROLES,
    handler: async (ctx) => ({ members: await listMembers(ctx.deps.db, requireCaller(ctx).studioId) }),
  },
  {
    method: 'patch',
    path: '/api/studio/members/:id',
    access: OWNERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      const { role } = changeRoleSchema.parse(ctx.req.body);
      return ctx.deps.db.transaction().execute(async (trx) => {
        const member = await getMember(trx, caller.studioId, id);
        if (!member) throw notFound('That member');
        if (member.role === 'owner' && role !== 'owner' && (await countOwners(trx, caller.studioId)) <= 1) {
          throw new HttpError(409, 'last_owner', 'A studio needs at least one owner. Make someone else an owner first.');
        }
        await setMemberRole(trx, id, role);
        // Sessions read the role on every request, so the change applies at once.
        return { member: toMember({ ...member, role }) };
      });
    },
  },
  {
    method: 'delete',
    path: '/api/studio/members/:id',
    access: OWNERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      await ctx.deps.db.transaction().execute(async (trx) => {
        const member = await getMember(trx, caller.studioId, id);
        if (!member) throw notFound('That member');
        if (member.role === 'owner' && (await countOwners(trx, caller.studioId)) <= 1) {
          throw new HttpError(409, 'last_owner', 'A studio needs at least one owner.');
        }
        await deleteSessionsOf(trx, id);
        await deleteMember(trx, id);
      });
      return undefined;
    },
  },
  {
    method: 'get',
    path: '/api/studio/invites',
    access: OWNERS,
    handler: async (ctx) => ({
      invites: (await listOpenInvites(ctx.deps.db, requireCaller(ctx).studioId)).map((r) => toInviteInfo(r)),
    }),
  },
  {
    method: 'post',
    path: '/api/studio/invites',
    access: OWNERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const body = inviteSchema.parse(ctx.req.body);
      const { db, config } = ctx.deps;
      await enforceRateLimit(
        db,
        ctx.res,
        INVITE_RATE,
        caller.studioId,
        'That is a lot of invitations in a short time. Please wait a while, then send the rest.',
      );
      if (await findMemberByEmail(db, body.email)) {
        throw new HttpError(409, 'email_taken', 'This person already has a Parlour account.', {
          email: 'Already has an account.',
        });
      }
      await limitInvitationMail(db, ctx.res, body.email);
      const studio = await db.selectFrom('studios').select('name').where('id', '=', caller.studioId).executeTakeFirstOrThrow();
      const inviter = await getMember(db, caller.studioId, caller.memberId);
      const { token, hash } = newToken();
      const link = `${config.publicUrl}/invite/${token}`;
      const by = inviter?.name ?? 'A colleague';
      // One transaction: an invitation whose mail could not be sent is not kept either.
      const invite = await db.transaction().execute(async (trx) => {
        const made = await insertInvite(trx, {
          studioId: caller.studioId,
          email: body.email,
          role: body.role,
          tokenHash: hash,
          invitedBy: caller.memberId,
          expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
        });
        await sendStudioMail(
          trx,
          ctx.deps,
          {
            studioId: caller.studioId,
            kind: 'invitation',
            to: body.email,
            subject: `${by} invited you to ${studio.name} on Parlour`,
            text: `${by} invited you to join ${studio.name} on Parlour as ${body.role}.\n\nAccept the invitation: ${link}\n\nThe link works for ${INVITE_DAYS} days.`,
            html: `<p>${escapeHtml(by)} invited you to join <strong>${escapeHtml(studio.name)}</strong> on Parlour as ${body.role}.</p><p><a href="${link}">Accept the invitation</a></p><p>The link works for ${INVITE_DAYS} days.</p>`,
          },
          'The invitation e-mail could not be sent, so no invitation was made. Try again in a moment.',
        );
        return made;
      });
      ctx.res.status(201);
      return { invite: toInviteInfo(invite) };
    },
  },
  {
    method: 'delete',
    path: '/api/studio/invites/:id',
    access: OWNERS,
    async handler(ctx) {
      const { id } = idParamSchema.parse(ctx.req.params);
      if (!(await deleteInvite(ctx.deps.db, requireCaller(ctx).studioId, id))) throw notFound('That invitation');
      return undefined;
    },
  },
  {
    method: 'get',
    path: '/api/invites/:token',
    access: 'public',
    async handler(ctx) {
      const { token } = tokenParamSchema.parse(ctx.req.params);
      const invite = await openInviteOrThrow(ctx.deps.db, token);
      return { invite: toInviteInfo(invite, invite.studio_name) };
    },
  },
  {
    method: 'post',
    path: '/api/invites/:token/accept',
    access: 'public',
    async handler(ctx) {
      const { token } = tokenParamSchema.parse(ctx.req.params);
      const body = acceptInviteSchema.parse(ctx.req.body);
      const passwordHash = await hashPassword(body.password);
      const member = await ctx.deps.db.transaction().execute(async (trx) => {
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
      await startSession(ctx.deps.db, ctx.res, member.id, ctx.deps.config.SECURE_COOKIES);
      ctx.res.status(201);
      return { member: toMember(member) };
    },
  },
];
