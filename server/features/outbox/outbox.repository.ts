// Database reads and writes for the Outbox: records each mail sent for a studio, and lists (a page
// at a time, newest first) and reads that studio's sent mail.
import type { Db } from '../../db/database';
import type { SentMailKind } from '../../../shared/schemas/outbox';

export async function insertSentMail(
  db: Db,
  v: { studioId: string; kind: SentMailKind; from: string; to: string; subject: string; text: string; html: string | null },
): Promise<void> {
  await db
    .insertInto('sent_mail')
    .values({
      studio_id: v.studioId,
      kind: v.kind,
      sender: v.from,
      recipient: v.to,
      subject: v.subject,
      text_body: v.text,
      html_body: v.html,
    })
    .execute();
}

const PREVIEW_CHARS = 160;

/** One page of a studio's sent mail of the given kinds, newest first, strictly after `before`. */
export async function listSentMail(
  db: Db,
  studioId: string,
  kinds: readonly SentMailKind[],
  limit: number,
  before?: { at: Date; id: string },
) {
  let q = db
    .selectFrom('sent_mail')
    .select((eb) => [
      'id',
      'kind',
      'recipient',
      'subject',
      'created_at',
      eb.fn<string>('left', ['text_body', eb.val(PREVIEW_CHARS)]).as('preview'),
    ])
    .where('studio_id', '=', studioId)
    .where('kind', 'in', kinds);
  if (before) q = q.where((eb) => eb(eb.refTuple('created_at', 'id'), '<', eb.tuple(before.at, before.id)));
  return q.orderBy('created_at', 'desc').orderBy('id', 'desc').limit(limit).execute();
}

export async function getSentMail(db: Db, studioId: string, kinds: readonly SentMailKind[], id: string) {
  return db
    .selectFrom('sent_mail')
    .selectAll()
    .where('studio_id', '=', studioId)
    .where('kind', 'in', kinds)
    .where('id', '=', id)
    .executeTakeFirst();
}
