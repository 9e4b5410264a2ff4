// Mail nobody waits for (a client's choice told to the designer, an invitation) goes through the job queue: the
// message is kept in queued_mail and a job sends it, retrying with backoff while the mail server is
// away. The project page reads each message's state (sending, sent, failing, failed).
import type { AppConfig } from '../../config';
import type { Db } from '../../db/database';
import type { JobKind, JobQueue } from '../../services/jobs/job-queue';
import type { Logger } from '../../services/logging/logger';
import type { MailMessage, Mailer } from '../../services/mail/mailer';
import type { SentMailKind } from '../../../shared/schemas/outbox';
import type { ProjectMail } from '../../../shared/schemas/project';
import { hasOutbox } from './outbox.service';
import {
  getQueuedMail,
  giveUpQueuedMail,
  insertQueuedMail,
  insertSentMail,
  listProjectMail,
  markQueuedMailFailed,
  markQueuedMailSent,
} from './outbox.repository';

export const MAIL_JOB = 'mail';
/** Where a mail job goes once it has failed for good: the message is marked failed. */
export const MAIL_GAVE_UP_JOB = 'mail-gave-up';

/**
 * Mail jobs are retried 10 times with backoff from 5 s: the first retry after 5–10 s, the tenth
 * after 43–85 min, about 1.5 to 3 hours in all, enough for a mail server away for a while. A try
 * taking over a minute has failed.
 */
export const MAIL_JOB_POLICY = { retryLimit: 10, retryDelaySeconds: 5, timeoutSeconds: 60 } as const;
/** How many of a project's messages its page shows. */
const PROJECT_MAIL_SHOWN = 20;
/** The error kept with a failing message: enough to say why, never a whole stack. */
const ERROR_CHARS = 300;

interface MailJobData {
  mailId: string;
}

/**
 * Queues `mail` for `studioId` (and the project it is about): the message and its job commit
 * together, in the caller's transaction when `db` is one (then call `jobs.wake(MAIL_JOB)` after it).
 */
export async function queueStudioMail(
  db: Db,
  jobs: JobQueue,
  mail: MailMessage & { studioId: string; projectId: string | null; inviteId?: string; kind: SentMailKind },
): Promise<void> {
  const run = async (trx: Db) => {
    const mailId = await insertQueuedMail(trx, {
      studioId: mail.studioId,
      projectId: mail.projectId,
      inviteId: mail.inviteId ?? null,
      kind: mail.kind,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? null,
    });
    await jobs.send(MAIL_JOB, { mailId } satisfies MailJobData, { db: trx });
  };
  if (db.isTransaction) return run(db);
  await db.transaction().execute(run);
  jobs.wake(MAIL_JOB);
}

/** The project's queued mail as its page shows it, newest first. */
export async function projectMail(db: Db, studioId: string, projectId: string): Promise<ProjectMail[]> {
  const rows = await listProjectMail(db, studioId, projectId, PROJECT_MAIL_SHOWN);
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    to: r.recipient,
    subject: r.subject,
    state: r.state,
    attempts: r.attempts,
    queuedAt: r.created_at.toISOString(),
    sentAt: r.sent_at?.toISOString() ?? null,
  }));
}

/** The mail job kinds: one try per job run, the message's state kept up to date. */
export function mailJobKinds(deps: { db: Db; mailer: Mailer; config: AppConfig; logger: Logger }): JobKind<never>[] {
  const { db, config } = deps;
  const send: JobKind<MailJobData> = {
    name: MAIL_JOB,
    policy: { ...MAIL_JOB_POLICY, concurrency: 1, deadLetter: MAIL_GAVE_UP_JOB },
    handler: async ({ mailId }, run) => {
      const row = await getQueuedMail(db, mailId);
      if (!row || row.state === 'sent' || row.text_body === null) return;
      const message: MailMessage = {
        to: row.recipient,
        subject: row.subject,
        text: row.text_body,
        html: row.html_body ?? undefined,
      };
      try {
        await deps.mailer.send(message);
      } catch (err) {
        const last = run.retryCount >= run.retryLimit;
        await markQueuedMailFailed(
          db,
          mailId,
          last ? 'failed' : 'failing',
          String((err as Error).message ?? err).slice(0, ERROR_CHARS),
        );
        throw err;
      }
      await db.transaction().execute(async (trx) => {
        await markQueuedMailSent(trx, mailId);
        if (hasOutbox(config))
          await insertSentMail(trx, {
            studioId: row.studio_id,
            kind: row.kind,
            from: config.MAIL_FROM,
            to: row.recipient,
            subject: row.subject,
            text: row.text_body!,
            html: row.html_body,
          });
      });
    },
  };
  const gaveUp: JobKind<MailJobData> = {
    name: MAIL_GAVE_UP_JOB,
    policy: { retryLimit: 5, retryDelaySeconds: 10, timeoutSeconds: 60, concurrency: 1 },
    handler: async ({ mailId }) => {
      await giveUpQueuedMail(db, mailId);
      deps.logger.warn({ mailId }, 'mail gave up');
    },
  };
  return [send, gaveUp] as JobKind<never>[];
}
