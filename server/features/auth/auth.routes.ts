// Signing up, in and out, and who is signed in. Rules are in auth.service.ts; the routes set the cookie.
import { signInSchema, type SessionInfo } from '../../../shared/schemas/studio';
import { signUpSchema } from '../../../shared/schemas/account';
import { route, type RouteDef } from '../../http/routes';
import { clearSessionCookie, startSession } from '../../services/auth/session';
import { toMember } from '../studio/members.repository';
import { sessionInfo, signIn, signOut, signUp } from './auth.service';

export const authRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/api/auth/sign-up',
    access: 'public',
    body: signUpSchema,
    async handler({ req, res, services, body }) {
      const member = await signUp(services.db, services.config, req.ip, body);
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
      const member = await signIn(services.db, body, services.verifyPassword);
      await startSession(services.db, res, member.id, services.config.SECURE_COOKIES);
      return { ok: true };
    },
  }),
  route({
    method: 'post',
    path: '/api/auth/sign-out',
    access: 'signed-in',
    async handler(ctx) {
      await signOut(ctx.services.db, ctx.caller);
      clearSessionCookie(ctx.res);
      return undefined;
    },
  }),
  route({
    method: 'get',
    path: '/api/auth/me',
    access: 'signed-in',
    handler: (ctx): Promise<SessionInfo> => sessionInfo(ctx.services.db, ctx.services.config, ctx.caller),
  }),
];
