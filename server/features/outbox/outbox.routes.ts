import { z } from 'zod';
import type { RouteDef } from '../../http/routes';
import { HttpError, notFound } from '../../http/errors';
import { listOutbox, readOutboxMessage } from '../../services/mail/outbox';

// The Outbox stands in for the recipients' mailboxes in the local setup, so an invitee without an
// account can follow their link: it is public, and absent (404) unless OUTBOX_DIR is configured.
function outboxDir(dir: string | undefined): string {
  if (!dir) throw new HttpError(404, 'not_found', 'There is no outbox in this setup.');
  return dir;
}

export const outboxRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/outbox',
    access: 'public',
    async handler(ctx) {
      const messages = await listOutbox(outboxDir(ctx.deps.config.OUTBOX_DIR));
      return { messages: messages.map(({ html: _html, text, ...m }) => ({ ...m, preview: text.slice(0, 160) })) };
    },
  },
  {
    method: 'get',
    path: '/api/outbox/:id',
    access: 'public',
    async handler(ctx) {
      const { id } = z.object({ id: z.string().max(60) }).parse(ctx.req.params);
      const message = await readOutboxMessage(outboxDir(ctx.deps.config.OUTBOX_DIR), id);
      if (!message) throw notFound('That message');
      return { message };
    },
  },
];
