// The stored files route (GET /api/files/:name): serves a derived image only to signed-in members
// allowed to read it, and answers 404 alike for someone else's file and a missing one.
import { route, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { canReadFile } from './files.access';
import { keyFromFileName } from './file-keys';
import { fileParam, sendDerivedFile } from './files.service';

export const fileRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/files/:name',
    access: 'signed-in',
    params: fileParam,
    async handler(ctx) {
      const { caller } = ctx;
      const { name } = ctx.params;
      const key = keyFromFileName(name);
      // Someone else's file and no file at all answer the same, so names cannot be probed.
      if (!key || !(await canReadFile(ctx.services.db, caller, key))) throw notFound('That file');
      return sendDerivedFile(ctx, key);
    },
  }),
];
