// Limits on the mail Parlour sends to people outside a studio, from its own address: sign-up is
// open, so a studio's own allowance is not enough, and every recipient also has one across all
// studios together. Figures are common practice for a product whose mail goes to a studio's own
// clients and colleagues.
import type { Db } from '../../db/database';
import { enforceRateLimits, waitInWords, type RateHit, type RateRule } from './rate-limit';

const DAY_MS = 86_400_000;

/** Presentation mails per studio per (sliding) day. */
export const PRESENTATION_MAIL_RATE: RateRule = { bucket: 'presentation-mail', limit: 50, windowMs: DAY_MS };
/** The same for a studio younger than a day: a studio signed up to send mail gets little out. */
export const NEW_STUDIO_PRESENTATION_MAIL_LIMIT = 10;
export const NEW_STUDIO_AGE_MS = DAY_MS;
/** Mails to one address per day from every studio together, presentations and invitations alike. */
export const RECIPIENT_MAIL_RATE: RateRule = { bucket: 'mail-to', limit: 3, windowMs: DAY_MS };

/**
 * The address a recipient is counted under: lower case, without a "+tag" on the local part
 * (RFC 5233 sub-addressing, which most mail services deliver to the same mailbox).
 */
export function recipientKey(email: string): string {
  const address = email.trim().toLowerCase();
  const at = address.lastIndexOf('@');
  if (at < 1) return address;
  const local = address.slice(0, at);
  const plus = local.indexOf('+');
  return `${plus > 0 ? local.slice(0, plus) : local}${address.slice(at)}`;
}

const COPY_INSTEAD = ', or copy the link and send it yourself';

function recipientHit(to: string, advice = ''): RateHit {
  return {
    rule: RECIPIENT_MAIL_RATE,
    key: recipientKey(to),
    message: (s) =>
      `${to} has already been sent ${RECIPIENT_MAIL_RATE.limit} e-mails from Parlour today. Try again in ${waitInWords(s)}${advice}.`,
  };
}

/** Counts a presentation mail against the studio's day and the recipient's, or answers 429 counting neither. */
export async function limitPresentationMail(
  db: Db,
  studio: { id: string; createdAt: Date },
  to: string,
  now = new Date(),
): Promise<void> {
  const studioId = studio.id;
  const young = now.getTime() - studio.createdAt.getTime() < NEW_STUDIO_AGE_MS;
  const limit = young ? NEW_STUDIO_PRESENTATION_MAIL_LIMIT : PRESENTATION_MAIL_RATE.limit;
  await enforceRateLimits(db, [
    {
      rule: { ...PRESENTATION_MAIL_RATE, limit },
      key: studioId,
      message: (s) =>
        `Your studio has sent ${limit} presentation e-mails today${young ? ', the limit for its first day' : ''}. Try again in ${waitInWords(s)}${COPY_INSTEAD}.`,
    },
    recipientHit(to, COPY_INSTEAD),
  ]);
}

/** Counts an invitation mail against the recipient's day, or answers 429. */
export async function limitInvitationMail(db: Db, to: string): Promise<void> {
  await enforceRateLimits(db, [recipientHit(to)]);
}
