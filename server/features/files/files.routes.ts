import { z } from 'zod';
import { requireCaller, type RouteDef } from '../../http/routes';
import { notFound } from '../../http/errors';
import { finishServices } from '../finishes/finishes.service';
import { canReadFile } from './files.access';
import { hashOfKey, keyFromFileName } from './file-keys';

const fileParam = z.object({ name: z.string().max(100) });

// Content-hashed names never change meaning, so a browser (and later a CDN) may keep them a year.
// private: these files are for the studio's members (and its presentations), so shared caches must not keep them.
const IMMUTABLE = 'private, max-age=31536000, immutable';

export const fileRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/files/:name',
    access: 'signed-in',
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { name } = fileParam.parse(ctx.req.params);
      const key = keyFromFileName(name);
      // Someone else's file and no file at all answer the same, so names cannot be probed.
      if (!key || !(await canReadFile(ctx.deps.db, caller, key))) throw notFound('That file');
      const etag = `"${hashOfKey(key)}"`;
      const cacheHeaders = { ETag: etag, 'Cache-Control': IMMUTABLE, 'X-Content-Type-Options': 'nosniff' };
      if (ctx.req.headers['if-none-match'] === etag) {
        ctx.res.status(304).set(cacheHeaders).end();
        return undefined;
      }
      const bytes = await finishServices(ctx.deps).storage.get(key);
      if (!bytes) throw notFound('That file');
      ctx.res.set(cacheHeaders).type('image/webp').send(bytes);
      return undefined;
    },
  },
];
