// Presentation links carry a JWT: HS256 only, an audience and a header type of their own (so no
// other token the app might sign later can pass for one), issued-at, expiry and a random id that
// the server stores. The stored row, not the token, decides whether the link still works, so
// withdrawing takes effect on the next request.
import { randomBytes } from 'node:crypto';
import { errors, jwtVerify, SignJWT } from 'jose';

export const PRESENTATION_ALG = 'HS256';
export const PRESENTATION_AUDIENCE = 'parlour:presentation';
export const PRESENTATION_TYP = 'parlour-presentation+jwt';
export const PRESENTATION_ISSUER = 'parlour';

/** Longer than any real token; anything bigger is refused before it is parsed. */
export const MAX_TOKEN_LENGTH = 1024;
const TOKEN_SHAPE = /^[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/;

export interface PresentationTokenClaims {
  /** The random id stored beside the presentation. */
  tokenId: string;
  /** Whole seconds: JWT times have no fractions, and the same times sign the same token again. */
  issuedAt: Date;
  expiresAt: Date;
}

export type TokenCheck = { ok: true; tokenId: string } | { ok: false; reason: 'invalid' | 'expired' };

/** 128 random bits, base64url. */
export function newTokenId(): string {
  return randomBytes(16).toString('base64url');
}

/** Cuts a time to whole seconds, as it will read back from the token. */
export function toTokenTime(date: Date): Date {
  return new Date(Math.floor(date.getTime() / 1000) * 1000);
}

/**
 * Signs the link's token. HS256 over the same claims gives the same token, so the link can be
 * rebuilt from the stored id and times and never needs storing itself.
 */
export function signPresentationToken(key: Uint8Array, claims: PresentationTokenClaims): Promise<string> {
  return new SignJWT({})
    .setProtectedHeader({ alg: PRESENTATION_ALG, typ: PRESENTATION_TYP })
    .setIssuer(PRESENTATION_ISSUER)
    .setAudience(PRESENTATION_AUDIENCE)
    .setJti(claims.tokenId)
    .setIssuedAt(Math.floor(claims.issuedAt.getTime() / 1000))
    .setExpirationTime(Math.floor(claims.expiresAt.getTime() / 1000))
    .sign(key);
}

/**
 * Whether each part is the one base64url spelling of its bytes. A decoder ignores the unused low
 * bits of the last character, so several texts decode to the same signature; only the one the
 * signer wrote is the link.
 */
function isCanonical(token: string): boolean {
  return token.split('.').every((part) => Buffer.from(part, 'base64url').toString('base64url') === part);
}

/**
 * Checks signature, algorithm, type, audience, issuer and expiry. Never throws: a bad token is an
 * answer ("invalid"), and an expired one is told apart only once its signature is good.
 */
export async function verifyPresentationToken(key: Uint8Array, token: string): Promise<TokenCheck> {
  if (token.length > MAX_TOKEN_LENGTH || !TOKEN_SHAPE.test(token) || !isCanonical(token)) return { ok: false, reason: 'invalid' };
  try {
    const { payload } = await jwtVerify(token, key, {
      algorithms: [PRESENTATION_ALG],
      audience: PRESENTATION_AUDIENCE,
      issuer: PRESENTATION_ISSUER,
      typ: PRESENTATION_TYP,
      requiredClaims: ['jti', 'iat', 'exp'],
    });
    if (typeof payload.jti !== 'string' || payload.jti.length === 0 || payload.jti.length > 64)
      return { ok: false, reason: 'invalid' };
    return { ok: true, tokenId: payload.jti };
  } catch (err) {
    if (err instanceof errors.JWTExpired) return { ok: false, reason: 'expired' };
    return { ok: false, reason: 'invalid' };
  }
}
