// Parlour's sent mail: every message goes through the mailer, and in the local setup (where the
// Outbox stands in for the recipients' mailboxes) it is also recorded with the studio it was sent
// for. With a real mail service nothing is recorded: the rows would be a second, readable copy of
// single-use links that the database otherwise keeps only as hashes.
import type { AppConfig } from '../../config';
import type { Db } from '../../db/database';
import type { MailMessage, Mailer } from '../../services/mail/mailer';
import type { Logger } from '../../services/logging/logger';
import type { Role } from '../../../shared/schemas/studio';
import type { AppServices } from '../../context';
import type { Caller } from '../../http/routes';
import {
  outboxCursor,
  type OutboxMessage,
  type OutboxPage,
  type SentMailKind,
  type outboxQuerySchema,
} from '../../../shared/schemas/outbox';
import type { z } from 'zod';
import { HttpError, orNotFound } from '../../http/errors';
import { getSentMail, insertSentMail, listSentMail } from './outbox.repository';

export const hasOutbox = (config: AppConfig): boolean => Boolean(config.OUTBOX_DIR);

// Invitations make their holder a member, so only owners (who alone may invite) read them; a
// presentation mail holds the client's link, which viewers are not given anywhere else either.
const KINDS_BY_ROLE: Record<Role, readonly SentMailKind[]> = {
  owner: ['invitation', 'presentation', 'choice'],
  designer: ['presentation', 'choice'],
  viewer: ['choice'],
};
export const visibleKinds = (role: Role): readonly SentMailKind[] => KINDS_BY_ROLE[role];

// The Outbox is the studio's own sent-mail folder in the local setup: members read their studio's
// mail (each role the kinds it may see) and copy or forward a link from it, as they would from a
// real mail program. Absent (404) when a real mail service is configured.
function callerKinds(config: AppConfig, caller: Caller) {
  if (!hasOutbox(config)) throw new HttpError(404, 'not_found', 'There is no outbox in this setup.');
  return { studioId: caller.studioId, kinds: visibleKinds(caller.role) };
}

/** One page of the studio's sent mail that the caller may read, newest first. */
export async function outboxPage(
  services: Pick<AppServices, 'db' | 'config'>,
  caller: Caller,
  query: z.output<typeof outboxQuerySchema>,
): Promise<OutboxPage> {
  const { studioId, kinds } = callerKinds(services.config, caller);
  const { before, limit } = query;
  // One row more than asked says whether another page follows.
  const rows = await listSentMail(services.db, studioId, kinds, limit + 1, before);
  const page = rows.slice(0, limit);
  const last = page.at(-1);
  return {
    messages: page.map((r) => ({
      id: r.id,
      kind: r.kind,
      to: r.recipient,
      subject: r.subject,
      preview: r.preview,
      sentAt: r.created_at.toISOString(),
    })),
    next: rows.length > limit && last ? outboxCursor(last.created_at, last.id) : null,
  };
}

/** One sent message in full, when the caller may read it. */
export async function outboxMessage(
  services: Pick<AppServices, 'db' | 'config'>,
  caller: Caller,
  id: string,
): Promise<OutboxMessage> {
  const { studioId, kinds } = callerKinds(services.config, caller);
  const r = orNotFound(await getSentMail(services.db, studioId, kinds, id), 'That message');
  return {
    id: r.id,
    kind: r.kind,
    from: r.sender,
    to: r.recipient,
    subject: r.subject,
    text: r.text_body,
    html: r.html_body,
    sentAt: r.created_at.toISOString(),
  };
}

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
