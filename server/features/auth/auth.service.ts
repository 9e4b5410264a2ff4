import type { Db } from '../../db/database';
import type { SignInBody, SignUpBody } from '../../../shared/schemas/studio';
import { HttpError } from '../../http/errors';
import { dummyPasswordHash, hashPassword, verifyPassword } from '../../services/auth/passwords';
import { findMemberByEmail, insertMember } from '../studio/members.repository';

// Five wrong passwords within 15 minutes lock that e-mail's sign-in for the rest of the window
// (common practice; OWASP's authentication guidance recommends throttling, no fixed numbers).
export const MAX_FAILURES = 5;
export const FAILURE_WINDOW_MS = 15 * 60_000;

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

export async function signIn(db: Db, body: SignInBody): Promise<{ id: string }> {
  const since = new Date(Date.now() - FAILURE_WINDOW_MS);
  const failures = await db
    .selectFrom('sign_in_failures')
    .select((eb) => [eb.fn.countAll<string>().as('n'), eb.fn.min('at').as('first')])
    .where('email', '=', body.email)
    .where('at', '>', since)
    .executeTakeFirstOrThrow();
  if (Number(failures.n) >= MAX_FAILURES) {
    const first = failures.first ? new Date(failures.first as Date).getTime() : Date.now();
    const minutes = Math.max(1, Math.ceil((first + FAILURE_WINDOW_MS - Date.now()) / 60_000));
    throw new HttpError(429, 'too_many_attempts', `Too many wrong passwords. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`);
  }
  const member = await findMemberByEmail(db, body.email);
  const ok = await verifyPassword(body.password, member?.password_hash ?? (await dummyPasswordHash()));
  if (!member || !ok) {
    await db.insertInto('sign_in_failures').values({ email: body.email }).execute();
    throw new HttpError(401, 'wrong_password', 'That e-mail and password do not match.', {
      password: 'That e-mail and password do not match.',
    });
  }
  await db.deleteFrom('sign_in_failures').where('email', '=', body.email).execute();
  return member;
}
