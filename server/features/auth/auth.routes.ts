import { signInSchema, type SessionInfo } from '../../../shared/schemas/studio';
import { signUpSchema } from '../../../shared/schemas/account';
import { requireCaller, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { clearSessionCookie, startSession } from '../../services/auth/session';
import { getMember, toMember } from '../studio/members.repository';
import { enforceRateLimit, waitInWords } from '../../services/rate-limit/rate-limit';
import { clientAddressKey } from '../../services/rate-limit/client-address';
import { signIn, signUp, signUpRate } from './auth.service';

export const authRoutes: RouteDef[] = [
  {
    method: 'post',
    path: '/api/auth/sign-up',
    access: 'public',
    async handler({ req, res, deps }) {
      const body = signUpSchema.parse(req.body);
      await enforceRateLimit(
        deps.db,
        res,
        signUpRate(deps.config),
        clientAddressKey(req.ip),
        (s) => `Too many new studios were made from this address. Try again in ${waitInWords(s)}.`,
      );
      const member = await signUp(deps.db, body);
      await startSession(deps.db, res, member.id, deps.config.SECURE_COOKIES);
      res.status(201);
      return { member: toMember(member) };
    },
  },
  {
    method: 'post',
    path: '/api/auth/sign-in',
    access: 'public',
    async handler({ req, res, deps }) {
      const body = signInSchema.parse(req.body);
      const member = await signIn(deps.db, res, body, deps.verifyPassword);
      await startSession(deps.db, res, member.id, deps.config.SECURE_COOKIES);
      return { ok: true };
    },
  },
  {
    method: 'post',
    path: '/api/auth/sign-out',
    access: 'signed-in',
    async handler(ctx) {
      const caller = requireCaller(ctx);
      await ctx.deps.db.deleteFrom('sessions').where('id', '=', caller.sessionId).execute();
      clearSessionCookie(ctx.res);
      return undefined;
    },
  },
  {
    method: 'get',
    path: '/api/auth/me',
    access: 'signed-in',
    async handler(ctx): Promise<SessionInfo> {
      const caller = requireCaller(ctx);
      const member = await getMember(ctx.deps.db, caller.studioId, caller.memberId);
      const studio = await ctx.deps.db
        .selectFrom('studios')
        .select(['id', 'name', 'currency', 'locale'])
        .where('id', '=', caller.studioId)
        .executeTakeFirst();
      if (!member || !studio) throw notFound('Your account');
      return { member: toMember(member), studio, outbox: Boolean(ctx.deps.config.OUTBOX_DIR) };
    },
  },
];
