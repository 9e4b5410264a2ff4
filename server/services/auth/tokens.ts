// Random tokens for cookies and e-mailed links, and the hash that is stored in their place.
import { createHash, randomBytes } from 'node:crypto';

/** A random 256-bit token for a cookie or an e-mailed link; only its hash is stored. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('base64url');
}
