// Sessions: a random token in an httpOnly SameSite cookie; the row is the truth, so deleting it
// signs out at once, and the role is read from the member row on every request.
import type { Request, RequestHandler, Response } from 'express';
import type { Db } from '../../db/database';
import type { Caller } from '../../http/routes';
import { hashToken, newToken } from './tokens';

export const SESSION_COOKIE = 'parlour_session';
const SESSION_DAYS = 30;

/** The one cookie reader: the session and the origin check must agree on what the cookie is. */
export function readCookie(req: Request, name: string): string | null {
  const header = req.headers.cookie;
  if (!header) return null;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0) continue;
    if (part.slice(0, eq).trim() === name) {
      try {
        return decodeURIComponent(part.slice(eq + 1).trim());
      } catch {
        return null;
      }
    }
  }
  return null;
}

export async function startSession(db: Db, res: Response, memberId: string, secure: boolean): Promise<void> {
  const { token, hash } = newToken();
  const expires = new Date(Date.now() + SESSION_DAYS * 86_400_000);
  await db.insertInto('sessions').values({ id: hash, member_id: memberId, expires_at: expires }).execute();
  res.cookie(SESSION_COOKIE, token, { httpOnly: true, sameSite: 'lax', secure, path: '/', expires });
}

export function clearSessionCookie(res: Response): void {
  res.clearCookie(SESSION_COOKIE, { path: '/' });
}

/** Puts the caller (or nothing) on res.locals.caller; a bad or stale cookie is just "signed out". */
export function sessionMiddleware(db: Db): RequestHandler {
  // Without a cookie (every client link's visitor) the request passes on at once, with no promise.
  return (req, res, next) => {
    const token = readCookie(req, SESSION_COOKIE);
    if (!token || token.length > 200) return next();
    return signIn(db, token, res, next);
  };
}

/** Looks the cookie's session up and puts its member on res.locals.caller when it is live. */
async function signIn(db: Db, token: string, res: Response, next: () => void): Promise<void> {
  const row = await db
    .selectFrom('sessions')
    .innerJoin('members', 'members.id', 'sessions.member_id')
    .select(['sessions.id as sessionId', 'members.id as memberId', 'members.studio_id as studioId', 'members.role'])
    .where('sessions.id', '=', hashToken(token))
    .where('sessions.expires_at', '>', new Date())
    .executeTakeFirst();
  if (row) res.locals.caller = row satisfies Caller;
  next();
}
