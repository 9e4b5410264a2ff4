// Cross-site request forgery guard for cookie-authenticated writes. SameSite=Lax cookies already
// stay home on cross-site POSTs; this second check refuses a write that carries the session
// cookie when the browser says it came from another origin.
import type { Request, RequestHandler } from 'express';
import { HttpError } from '../../http/errors';
import { SESSION_COOKIE, readCookie } from '../auth/session';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
// The client's presentation routes authorise by the token in their path, never by the cookie, and
// their page sends no referrer at all (so its Origin reads "null"): a forged request would need
// the token, which the cookie does not add to. Paths are relative to /api, where this is mounted.
const TOKEN_AUTHORISED_PREFIX = '/p/';

// Read exactly as the session middleware reads it: whatever it would sign in with counts here.
const hasSessionCookie = (req: Request) => readCookie(req, SESSION_COOKIE) !== null;

function originOf(url: string): string | null {
  try {
    const origin = new URL(url).origin;
    return origin === 'null' ? null : origin;
  } catch {
    return null;
  }
}

/**
 * Allows the configured public origin and the request's own (same-origin behind any host name).
 * A request with neither Origin nor Referer is let through: browsers always send Origin on a
 * cross-origin write, so only non-browser clients (scripts, tests) omit both.
 */
/** Mount at /api. */
export function originCheck(publicUrl: string): RequestHandler {
  const publicOrigin = originOf(publicUrl);
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method) || req.path.startsWith(TOKEN_AUTHORISED_PREFIX) || !hasSessionCookie(req)) return next();
    const origin = req.headers.origin;
    const referer = req.headers.referer;
    if (origin === undefined && referer === undefined) return next();
    const claimed =
      origin !== undefined && origin !== 'null' ? originOf(origin) : referer !== undefined ? originOf(referer) : null;
    const own = `${req.protocol}://${req.get('host') ?? ''}`;
    if (claimed !== null && (claimed === publicOrigin || claimed === own)) return next();
    next(
      new HttpError(
        403,
        'cross_site',
        'This request came from another site, so it was refused. Open Parlour directly and try again.',
      ),
    );
  };
}
