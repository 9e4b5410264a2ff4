import type { Db } from '../../db/database';
import type { SignInBody } from '../../../shared/schemas/studio';
import type { SignUpBody } from '../../../shared/schemas/account';
import type { Response } from 'express';
import type { AppConfig } from '../../config';
import { HttpError } from '../../http/errors';
import { clearRateLimit, enforceRateLimit, waitInWords, type RateRule } from '../../services/rate-limit/rate-limit';
import { dummyPasswordHash, hashPassword, verifyPassword, type PasswordVerifier } from '../../services/auth/passwords';
import { findMemberByEmail, insertMember } from '../studio/members.repository';

// Five attempts per e-mail within a sliding 15 minutes (common practice; OWASP's authentication
// guidance recommends throttling, no fixed numbers). Every attempt is counted before its password
// is checked, so a burst in parallel cannot get past the limit; the right password clears the count.
export const SIGN_IN_RATE: RateRule = { bucket: 'sign-in', limit: 5, windowMs: 15 * 60_000 };

/** New studios per client address per hour, counted before anything is made (`SIGN_UP_LIMIT_PER_HOUR`). */
export const signUpRate = (config: Pick<AppConfig, 'SIGN_UP_LIMIT_PER_HOUR'>): RateRule => ({
  bucket: 'sign-up',
  limit: config.SIGN_UP_LIMIT_PER_HOUR,
  windowMs: 60 * 60_000,
});

/** Checks a password against its stored hash; the app's is scrypt, tests may count the calls. */
export type { PasswordVerifier } from '../../services/auth/passwords';

export async function signUp(db: Db, body: SignUpBody) {
  const passwordHash = await hashPassword(body.password);
  return db.transaction().execute(async (trx) => {
    if (await findMemberByEmail(trx, body.email)) {
      throw new HttpError(409, 'email_taken', 'An account with this e-mail already exists. Sign in instead.', {
        email: 'This e-mail already has an account.',
      });
    }
    const studio = await trx.insertInto('studios').values({ name: body.studioName }).returning(['id']).executeTakeFirstOrThrow();
    return insertMember(trx, { studioId: studio.id, email: body.email, name: body.name, role: 'owner', passwordHash });
  });
}

export async function signIn(
  db: Db,
  res: Response,
  body: SignInBody,
  verify: PasswordVerifier = verifyPassword,
): Promise<{ id: string }> {
  await enforceRateLimit(
    db,
    res,
    SIGN_IN_RATE,
    body.email,
    (s) => `Too many attempts to sign in. Try again in ${waitInWords(s)}.`,
  );
  const member = await findMemberByEmail(db, body.email);
  const ok = await verify(body.password, member?.password_hash ?? (await dummyPasswordHash()));
  if (!member || !ok) {
    throw new HttpError(401, 'wrong_password', 'That e-mail and password do not match.', {
      password: 'That e-mail and password do not match.',
    });
  }
  await clearRateLimit(db, SIGN_IN_RATE, body.email);
  return member;
}
