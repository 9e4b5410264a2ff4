// The studio's members and invitations. Rules and transactions are in studio.service.ts.
import { z } from 'zod';
import { changeRoleSchema, inviteSchema, studioSettingsSchema } from '../../../shared/schemas/studio';
import { acceptInviteSchema } from '../../../shared/schemas/account';
import { idParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, OWNERS, route, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { startSession } from '../../services/auth/session';
import { listMembers, toMember } from './members.repository';
import { deleteInvite, listOpenInvites, toInviteInfo } from './invites.repository';
import { acceptInvite, changeMemberRole, inviteMember, openInvite, removeMember } from './studio.service';
import { updateStudioMoney } from './studios.repository';

const tokenParamSchema = z.object({ token: z.string().min(20).max(200) });

export const studioRoutes: RouteDef[] = [
  route({
    // The studio's currency and locale for every price.
    method: 'patch',
    path: '/api/studio/settings',
    access: OWNERS,
    body: studioSettingsSchema,
    handler: async (ctx) => ({ settings: await updateStudioMoney(ctx.services.db, ctx.caller.studioId, ctx.body) }),
  }),
  route({
    method: 'get',
    path: '/api/studio/members',
    access: ALL_ROLES,
    handler: async (ctx) => ({ members: await listMembers(ctx.services.db, ctx.caller.studioId) }),
  }),
  route({
    method: 'patch',
    path: '/api/studio/members/:id',
    access: OWNERS,
    params: idParamSchema,
    body: changeRoleSchema,
    handler: async (ctx) => ({ member: await changeMemberRole(ctx.services.db, ctx.caller, ctx.params.id, ctx.body.role) }),
  }),
  route({
    method: 'delete',
    path: '/api/studio/members/:id',
    access: OWNERS,
    params: idParamSchema,
    handler: (ctx) => removeMember(ctx.services.db, ctx.caller, ctx.params.id),
  }),
  route({
    method: 'get',
    path: '/api/studio/invites',
    access: OWNERS,
    handler: async (ctx) => ({
      invites: (await listOpenInvites(ctx.services.db, ctx.caller.studioId)).map((r) => toInviteInfo(r)),
    }),
  }),
  route({
    method: 'post',
    path: '/api/studio/invites',
    access: OWNERS,
    body: inviteSchema,
    async handler(ctx) {
      const invite = await inviteMember(ctx.services, ctx.caller, ctx.body);
      ctx.res.status(201);
      return { invite };
    },
  }),
  route({
    method: 'delete',
    path: '/api/studio/invites/:id',
    access: OWNERS,
    params: idParamSchema,
    async handler(ctx) {
      if (!(await deleteInvite(ctx.services.db, ctx.caller.studioId, ctx.params.id))) throw notFound('That invitation');
      return undefined;
    },
  }),
  route({
    method: 'get',
    path: '/api/invites/:token',
    access: 'public',
    params: tokenParamSchema,
    handler: async (ctx) => ({ invite: await openInvite(ctx.services.db, ctx.params.token) }),
  }),
  route({
    method: 'post',
    path: '/api/invites/:token/accept',
    access: 'public',
    params: tokenParamSchema,
    body: acceptInviteSchema,
    async handler(ctx) {
      const member = await acceptInvite(ctx.services.db, ctx.params.token, ctx.body);
      await startSession(ctx.services.db, ctx.res, member.id, ctx.services.config.SECURE_COOKIES);
      ctx.res.status(201);
      return { member: toMember(member) };
    },
  }),
];
