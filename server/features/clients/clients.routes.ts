import { clientBodySchema, clientPatchSchema, listQuerySchema } from '../../../shared/schemas/project';
import { idParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, WRITERS, requireCaller, type RouteDef } from '../../http/routes';
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
  {
    method: 'get',
    path: '/api/clients',
    access: ALL_ROLES,
    async handler(ctx) {
      const query = listQuerySchema.parse(ctx.req.query);
      return { clients: await listClients(ctx.deps.db, requireCaller(ctx).studioId, query) };
    },
  },
  {
    method: 'post',
    path: '/api/clients',
    access: WRITERS,
    async handler(ctx) {
      const body = clientBodySchema.parse(ctx.req.body);
      const client = await insertClient(ctx.deps.db, requireCaller(ctx).studioId, body);
      ctx.res.status(201);
      return { client: toClient(client) };
    },
  },
  {
    method: 'get',
    path: '/api/clients/:id',
    access: ALL_ROLES,
    async handler(ctx) {
      const { id } = idParamSchema.parse(ctx.req.params);
      const client = await getClient(ctx.deps.db, requireCaller(ctx).studioId, id);
      if (!client) throw notFound('That client');
      return { client: toClient(client) };
    },
  },
  {
    method: 'patch',
    path: '/api/clients/:id',
    access: WRITERS,
    async handler(ctx) {
      const { id } = idParamSchema.parse(ctx.req.params);
      const patch = clientPatchSchema.parse(ctx.req.body);
      const client = await updateClient(ctx.deps.db, requireCaller(ctx).studioId, id, patch);
      if (!client) throw notFound('That client');
      return { client: toClient(client) };
    },
  },
];
