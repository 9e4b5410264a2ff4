import { signInSchema, type SessionInfo } from '../../../shared/schemas/studio';
import { signUpSchema } from '../../../shared/schemas/account';
import { route, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { clearSessionCookie, startSession } from '../../services/auth/session';
import { getMember, toMember } from '../studio/members.repository';
import { enforceRateLimit, waitInWords } from '../../services/rate-limit/rate-limit';
import { clientAddressKey } from '../../services/rate-limit/client-address';
import { signIn, signUp, signUpRate } from './auth.service';

export const authRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/api/auth/sign-up',
    access: 'public',
    body: signUpSchema,
    async handler({ req, res, services, body }) {
      await enforceRateLimit(
        services.db,
        res,
        signUpRate(services.config),
        clientAddressKey(req.ip),
        (s) => `Too many new studios were made from this address. Try again in ${waitInWords(s)}.`,
      );
      const member = await signUp(services.db, body);
      await startSession(services.db, res, member.id, services.config.SECURE_COOKIES);
      res.status(201);
      return { member: toMember(member) };
    },
  }),
  route({
    method: 'post',
    path: '/api/auth/sign-in',
    access: 'public',
    body: signInSchema,
    async handler({ res, services, body }) {
      const member = await signIn(services.db, res, body, services.verifyPassword);
      await startSession(services.db, res, member.id, services.config.SECURE_COOKIES);
      return { ok: true };
    },
  }),
  route({
    method: 'post',
    path: '/api/auth/sign-out',
    access: 'signed-in',
    async handler(ctx) {
      const { caller } = ctx;
      await ctx.services.db.deleteFrom('sessions').where('id', '=', caller.sessionId).execute();
      clearSessionCookie(ctx.res);
      return undefined;
    },
  }),
  route({
    method: 'get',
    path: '/api/auth/me',
    access: 'signed-in',
    async handler(ctx): Promise<SessionInfo> {
      const { caller } = ctx;
      const member = await getMember(ctx.services.db, caller.studioId, caller.memberId);
      const studio = await ctx.services.db
        .selectFrom('studios')
        .select(['id', 'name'])
        .where('id', '=', caller.studioId)
        .executeTakeFirst();
      if (!member || !studio) throw notFound('Your account');
      return { member: toMember(member), studio, outbox: Boolean(ctx.services.config.OUTBOX_DIR) };
    },
  }),
];
