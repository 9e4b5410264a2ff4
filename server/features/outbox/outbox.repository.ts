// Database reads and writes for the Outbox: records each mail sent for a studio, and lists (a page
// at a time, newest first) and reads that studio's sent mail.
import type { Db } from '../../db/database';
import type { SentMailKind } from '../../../shared/schemas/outbox';
import type { QueuedMailState } from '../../../shared/schemas/outbox';

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

export async function insertQueuedMail(
  db: Db,
  v: {
    studioId: string;
    projectId: string | null;
    inviteId?: string | null;
    kind: SentMailKind;
    to: string;
    subject: string;
    text: string;
    html: string | null;
  },
): Promise<string> {
  const row = await db
    .insertInto('queued_mail')
    .values({
      studio_id: v.studioId,
      project_id: v.projectId,
      invite_id: v.inviteId ?? null,
      kind: v.kind,
      recipient: v.to,
      subject: v.subject,
      text_body: v.text,
      html_body: v.html,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function getQueuedMail(db: Db, id: string) {
  return db.selectFrom('queued_mail').selectAll().where('id', '=', id).executeTakeFirst();
}

/** Marks a queued message sent and drops its text (sent_mail keeps the Outbox's copy). */
export async function markQueuedMailSent(db: Db, id: string): Promise<void> {
  await db
    .updateTable('queued_mail')
    .set({ state: 'sent', sent_at: new Date(), text_body: null, html_body: null, last_error: null })
    .where('id', '=', id)
    .execute();
}

/** Counts a failed attempt; `state` is failing while it will be tried again, failed once it will not. */
export async function markQueuedMailFailed(
  db: Db,
  id: string,
  state: Exclude<QueuedMailState, 'sent' | 'sending'>,
  error: string,
) {
  await db
    .updateTable('queued_mail')
    .set((eb) => ({ state, attempts: eb('attempts', '+', 1), last_error: error }))
    .where('id', '=', id)
    .where('state', '!=', 'sent')
    .execute();
}

/** Gives up on a message: it stays failed, its text dropped. */
export async function giveUpQueuedMail(db: Db, id: string): Promise<void> {
  await db
    .updateTable('queued_mail')
    .set({ state: 'failed', text_body: null, html_body: null })
    .where('id', '=', id)
    .where('state', '!=', 'sent')
    .execute();
}

/** A project's queued mail, newest first. */
export async function listProjectMail(db: Db, studioId: string, projectId: string, limit: number) {
  return db
    .selectFrom('queued_mail')
    .select(['id', 'kind', 'recipient', 'subject', 'state', 'attempts', 'created_at', 'sent_at'])
    .where('studio_id', '=', studioId)
    .where('project_id', '=', projectId)
    .orderBy('created_at', 'desc')
    .orderBy('id', 'desc')
    .limit(limit)
    .execute();
}
