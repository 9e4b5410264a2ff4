import { idParamSchema } from '../../../shared/schemas/common';
import { outboxCursor, outboxQuerySchema, type OutboxMessage, type OutboxPage } from '../../../shared/schemas/outbox';
import { route, type SignedInContext, type RouteDef } from '../../http/routes';
import { HttpError, orNotFound } from '../../http/errors';
import { getSentMail, listSentMail } from './outbox.repository';
import { hasOutbox, visibleKinds } from './outbox.service';

// The Outbox is the studio's own sent-mail folder in the local setup: members read their studio's
// mail (each role the kinds it may see) and copy or forward a link from it, as they would from a
// real mail program. Absent (404) when a real mail service is configured.
function callerKinds(ctx: SignedInContext) {
  const { caller } = ctx;
  if (!hasOutbox(ctx.services.config)) throw new HttpError(404, 'not_found', 'There is no outbox in this setup.');
  return { studioId: caller.studioId, kinds: visibleKinds(caller.role) };
}

export const outboxRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/outbox',
    access: 'signed-in',
    query: outboxQuerySchema,
    async handler(ctx): Promise<OutboxPage> {
      const { studioId, kinds } = callerKinds(ctx);
      const { before, limit } = ctx.query;
      // One row more than asked says whether another page follows.
      const rows = await listSentMail(ctx.services.db, studioId, kinds, limit + 1, before);
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
    },
  }),
  route({
    method: 'get',
    path: '/api/outbox/:id',
    access: 'signed-in',
    params: idParamSchema,
    async handler(ctx): Promise<{ message: OutboxMessage }> {
      const { studioId, kinds } = callerKinds(ctx);
      const { id } = ctx.params;
      const r = orNotFound(await getSentMail(ctx.services.db, studioId, kinds, id), 'That message');
      return {
        message: {
          id: r.id,
          kind: r.kind,
          from: r.sender,
          to: r.recipient,
          subject: r.subject,
          text: r.text_body,
          html: r.html_body,
          sentAt: r.created_at.toISOString(),
        },
      };
    },
  }),
];
