// Security headers (helmet) with a content security policy that lets the page load only the
// app's own scripts, styles, fonts, images and workers: an injected <script> or a stylesheet from
// elsewhere is refused by the browser even if some text slipped through unescaped.
import helmet from 'helmet';
import type { RequestHandler } from 'express';

/** Seconds a browser keeps to HTTPS once it has seen the site over HTTPS: one year (common practice). */
const HSTS_MAX_AGE_S = 365 * 86_400;

export const CONTENT_SECURITY_POLICY: Record<string, string[]> = {
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'"],
  'font-src': ["'self'"],
  'img-src': ["'self'"],
  'connect-src': ["'self'"],
  // The editor's fit check runs in a module Worker built from the app's own file; blob: is the
  // form bundlers fall back to for inlined workers.
  'worker-src': ["'self'", 'blob:'],
  'object-src': ["'none'"],
  'base-uri': ["'self'"],
  'form-action': ["'self'"],
  'frame-ancestors': ["'none'"],
};

/**
 * `secure`: the app is reached over HTTPS (SECURE_COOKIES), so browsers may be told to stay on
 * it. Over plain http (local use) both would break the page, so they are left out.
 */
export function securityHeaders(opts: { secure: boolean }): RequestHandler {
  const { set, removed } = securityHeaderList(opts);
  return (_req, res, next) => {
    for (const name of removed) res.removeHeader(name);
    for (const [name, value] of set) res.setHeader(name, value);
    next();
  };
}

/**
 * The headers securityHeaders sets on every answer (and those it removes), worked out once: for a
 * route answered before it (the client link's ready answer), which writes them in one go.
 */
export function securityHeaderList(opts: { secure: boolean }): { set: [string, string | string[]][]; removed: string[] } {
  const helmetHeaders = helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: { ...CONTENT_SECURITY_POLICY, ...(opts.secure ? { 'upgrade-insecure-requests': [] } : {}) },
    },
    strictTransportSecurity: opts.secure ? { maxAge: HSTS_MAX_AGE_S, includeSubDomains: true } : false,
    // Same-origin pages get the full referrer (and browsers then send Origin on same-origin
    // writes, which the origin check needs); other sites get none. The client's page and its API
    // answers tighten this to no-referrer themselves, since their address holds the token.
    referrerPolicy: { policy: 'same-origin' },
  }) as RequestHandler;
  // With this configuration helmet's headers are the same for every request (no nonce, nothing
  // read from the request), so they are worked out once and set in one pass per answer.
  return headersOf(helmetHeaders);
}

/** What a header-only middleware sets and removes, read by running it once against a stand-in answer. */
function headersOf(middleware: RequestHandler): { set: [string, string | string[]][]; removed: string[] } {
  const set = new Map<string, [string, string | string[]]>();
  const removed: string[] = [];
  const res = {
    setHeader(name: string, value: string | string[]) {
      set.set(name.toLowerCase(), [name, value]);
    },
    removeHeader(name: string) {
      set.delete(name.toLowerCase());
      removed.push(name);
    },
  };
  let passed = false;
  void middleware({} as never, res as never, (err?: unknown) => {
    if (err) throw err;
    passed = true;
  });
  if (!passed) throw new Error('the security headers middleware did not pass the request on at once');
  return { set: [...set.values()], removed };
}

/**
 * Every API answer is `Cache-Control: no-store` unless its route says otherwise: members' data,
 * links and plan files must not stay in a browser's or a proxy's cache after signing out. Stored
 * files (content-hashed, never changing) set their own `private` header over this one.
 */
export function apiNoStore(): RequestHandler {
  return (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  };
}
