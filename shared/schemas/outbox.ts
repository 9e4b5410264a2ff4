// The outbox's shared shapes: what a sent e-mail was for, the page query with its cursor, and the
// summaries, messages and pages the outbox API returns.
import { z } from 'zod';

/** What a sent e-mail was for: an invitation to the studio, a presentation link, a choice notification. */
export const sentMailKindSchema = z.enum(['invitation', 'presentation', 'choice']);
export type SentMailKind = z.infer<typeof sentMailKindSchema>;

export const OUTBOX_PAGE_SIZE = 20;
export const OUTBOX_MAX_PAGE_SIZE = 50;

/** A page's position: the time (ms) and id of the last message on the page before. */
const CURSOR = /^(\d{1,15})_([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})$/;

export const outboxQuerySchema = z.object({
  before: z
    .string()
    .regex(CURSOR, 'Not a page of this outbox.')
    .transform((v) => {
      // The regex above has matched, so both groups are there.
      const [, ms, id] = CURSOR.exec(v)!;
      return { at: new Date(Number(ms)), id: id! };
    })
    .optional(),
  limit: z.coerce
    .number({ message: 'Give the page size as a number.' })
    .int('Give the page size as a whole number.')
    .min(1, 'Ask for at least 1 message.')
    .max(OUTBOX_MAX_PAGE_SIZE, `Ask for at most ${OUTBOX_MAX_PAGE_SIZE} messages.`)
    .default(OUTBOX_PAGE_SIZE),
});

export const outboxCursor = (sentAt: Date, id: string): string => `${sentAt.getTime()}_${id}`;

export interface OutboxSummary {
  id: string;
  kind: SentMailKind;
  to: string;
  subject: string;
  preview: string;
  sentAt: string;
}

export interface OutboxMessage extends Omit<OutboxSummary, 'preview'> {
  from: string;
  text: string;
  html: string | null;
}

/** One page, newest first; `next` asks for the page after it, null on the last. */
export interface OutboxPage {
  messages: OutboxSummary[];
  next: string | null;
}
