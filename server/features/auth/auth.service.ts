// Sign-up, sign-in, sign-out and the session's details: makes a studio and its first owner, checks
// passwords, and applies the sign-in and sign-up rate limits.
import type { Db } from '../../db/database';
import type { SignInBody } from '../../../shared/schemas/studio';
import type { SignUpBody } from '../../../shared/schemas/account';
import type { AppConfig } from '../../config';
import { clearRateLimit, enforceRateLimit, waitInWords, type RateRule } from '../../services/rate-limit/rate-limit';
import { dummyPasswordHash, hashPassword, verifyPassword, type PasswordVerifier } from '../../services/auth/passwords';
import type { Caller } from '../../http/routes';
import type { SessionInfo } from '../../../shared/schemas/studio';
import { HttpError, notFound } from '../../http/errors';
import { clientAddressKey } from '../../services/rate-limit/client-address';
import { findMemberByEmail, getMember, insertMember, toMember } from '../studio/members.repository';
import { getStudio, insertStudio } from '../studio/studios.repository';
import { deleteSession } from './auth.repository';

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

/**
 * Makes a studio and its first owner, within the hourly allowance of new studios per client
 * address (`ip`; a refusal is a 429 with Retry-After).
 */
export async function signUp(
  db: Db,
  config: Pick<AppConfig, 'SIGN_UP_LIMIT_PER_HOUR'>,
  ip: string | undefined,
  body: SignUpBody,
) {
  await enforceRateLimit(
    db,
    signUpRate(config),
    clientAddressKey(ip),
    (s) => `Too many new studios were made from this address. Try again in ${waitInWords(s)}.`,
  );
  const passwordHash = await hashPassword(body.password);
  return db.transaction().execute(async (trx) => {
    if (await findMemberByEmail(trx, body.email)) {
      throw new HttpError(409, 'email_taken', 'An account with this e-mail already exists. Sign in instead.', {
        email: 'This e-mail already has an account.',
      });
    }
    const studio = await insertStudio(trx, body.studioName);
    return insertMember(trx, { studioId: studio.id, email: body.email, name: body.name, role: 'owner', passwordHash });
  });
}

export async function signIn(db: Db, body: SignInBody, verify: PasswordVerifier = verifyPassword): Promise<{ id: string }> {
  await enforceRateLimit(db, SIGN_IN_RATE, body.email, (s) => `Too many attempts to sign in. Try again in ${waitInWords(s)}.`);
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

/** Signs the caller's session out. */
export async function signOut(db: Db, caller: Caller): Promise<void> {
  await deleteSession(db, caller.sessionId);
}

/** Who is signed in, in which studio, and whether this setup has an Outbox. */
export async function sessionInfo(db: Db, config: Pick<AppConfig, 'OUTBOX_DIR'>, caller: Caller): Promise<SessionInfo> {
  const member = await getMember(db, caller.studioId, caller.memberId);
  const studio = await getStudio(db, caller.studioId);
  if (!member || !studio) throw notFound('Your account');
  return { member: toMember(member), studio, outbox: Boolean(config.OUTBOX_DIR) };
}
