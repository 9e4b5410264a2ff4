// The studio's Outbox (local setup only): its pages and messages, read in outbox.service.ts.
import { idParamSchema } from '../../../shared/schemas/common';
import { outboxQuerySchema, type OutboxMessage, type OutboxPage } from '../../../shared/schemas/outbox';
import { route, type RouteDef } from '../../http/routes';
import { outboxMessage, outboxPage } from './outbox.service';

export const outboxRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/outbox',
    access: 'signed-in',
    query: outboxQuerySchema,
    handler: (ctx): Promise<OutboxPage> => outboxPage(ctx.services, ctx.caller, ctx.query),
  }),
  route({
    method: 'get',
    path: '/api/outbox/:id',
    access: 'signed-in',
    params: idParamSchema,
    handler: async (ctx): Promise<{ message: OutboxMessage }> => ({
      message: await outboxMessage(ctx.services, ctx.caller, ctx.params.id),
    }),
  }),
];
