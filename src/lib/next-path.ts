// Where to go after signing in: only a path on this site, never another origin.

/** The default landing page after signing in. */
export const AFTER_SIGN_IN = '/projects';

/**
 * `next` when it is a same-site path ("/projects/abc?x=1"); otherwise the projects list. Refuses
 * "//host", "/\\host" (browsers read both as another host), schemes, and control characters.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return AFTER_SIGN_IN;
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f\\]/.test(next)) return AFTER_SIGN_IN;
  try {
    const url = new URL(next, 'http://same.site');
    if (url.origin !== 'http://same.site') return AFTER_SIGN_IN;
    if (url.pathname === '/sign-in') return AFTER_SIGN_IN;
    return `${url.pathname}${url.search}${url.hash}`;
  } catch {
    return AFTER_SIGN_IN;
  }
}
