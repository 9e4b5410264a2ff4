// The clients API: list and search a studio's clients, add one, read one and change one.
import { clientBodySchema, clientPatchSchema, listQuerySchema } from '../../../shared/schemas/project';
import { idParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { getClient, insertClient, listClients, updateClient } from './clients.repository';

const toClient = (r: { id: string; name: string; email: string | null; phone: string | null; updated_at: Date }) => ({
  id: r.id,
  name: r.name,
  email: r.email,
  phone: r.phone,
  updatedAt: r.updated_at.toISOString(),
});

export const clientRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/clients',
    access: ALL_ROLES,
    query: listQuerySchema,
    async handler(ctx) {
      const query = ctx.query;
      return { clients: await listClients(ctx.services.db, ctx.caller.studioId, query) };
    },
  }),
  route({
    method: 'post',
    path: '/api/clients',
    access: WRITERS,
    body: clientBodySchema,
    async handler(ctx) {
      const body = ctx.body;
      const client = await insertClient(ctx.services.db, ctx.caller.studioId, body);
      ctx.res.status(201);
      return { client: toClient(client) };
    },
  }),
  route({
    method: 'get',
    path: '/api/clients/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    async handler(ctx) {
      const { id } = ctx.params;
      const client = await getClient(ctx.services.db, ctx.caller.studioId, id);
      if (!client) throw notFound('That client');
      return { client: toClient(client) };
    },
  }),
  route({
    method: 'patch',
    path: '/api/clients/:id',
    access: WRITERS,
    params: idParamSchema,
    body: clientPatchSchema,
    async handler(ctx) {
      const { id } = ctx.params;
      const patch = ctx.body;
      const client = await updateClient(ctx.services.db, ctx.caller.studioId, id, patch);
      if (!client) throw notFound('That client');
      return { client: toClient(client) };
    },
  }),
];
