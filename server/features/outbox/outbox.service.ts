// Parlour's sent mail: every message goes through the mailer, and in the local setup (where the
// Outbox stands in for the recipients' mailboxes) it is also recorded with the studio it was sent
// for. With a real mail service nothing is recorded: the rows would be a second, readable copy of
// single-use links that the database otherwise keeps only as hashes.
import type { AppConfig } from '../../config';
import type { Db } from '../../db/database';
import type { MailMessage, Mailer } from '../../services/mail/mailer';
import type { Logger } from '../../services/logging/logger';
import type { Role } from '../../../shared/schemas/studio';
import type { SentMailKind } from '../../../shared/schemas/outbox';
import { HttpError } from '../../http/errors';
import { insertSentMail } from './outbox.repository';

export const hasOutbox = (config: AppConfig): boolean => Boolean(config.OUTBOX_DIR);

// Invitations make their holder a member, so only owners (who alone may invite) read them; a
// presentation mail holds the client's link, which viewers are not given anywhere else either.
const KINDS_BY_ROLE: Record<Role, readonly SentMailKind[]> = {
  owner: ['invitation', 'presentation', 'choice'],
  designer: ['presentation', 'choice'],
  viewer: ['choice'],
};
export const visibleKinds = (role: Role): readonly SentMailKind[] => KINDS_BY_ROLE[role];

/**
 * Sends `mail` for `studioId`. The row is written first and the message sent inside the same
 * transaction (the caller's, when `db` is one), so a message the mail server refused is never
 * listed as sent. A refused message answers 502 with `failure` as its message.
 */
export async function sendStudioMail(
  db: Db,
  deps: { mailer: Mailer; config: AppConfig; log?: Logger },
  mail: MailMessage & { studioId: string; kind: SentMailKind },
  failure = 'The e-mail could not be sent. Try again in a moment.',
): Promise<void> {
  const { studioId, kind, ...message } = mail;
  const send = () =>
    deps.mailer.send(message).catch((err: Error) => {
      deps.log?.error({ err, mailKind: kind }, 'mail failed');
      throw new HttpError(502, 'mail_failed', failure);
    });
  if (!hasOutbox(deps.config)) return send();
  const run = async (trx: Db) => {
    await insertSentMail(trx, {
      studioId,
      kind,
      from: deps.config.MAIL_FROM,
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html ?? null,
    });
    await send();
  };
  await (db.isTransaction ? run(db) : db.transaction().execute(run));
}
