// Sending a stored derived file (a texture, swatch, preview or normalised model) once a route has authorised it.
import { z } from 'zod';
import type { Response } from 'express';
import type { RouteContext } from '../../http/routes';
import { notFound } from '../../http/errors';
import { hashOfKey } from './file-keys';

export const fileParam = z.object({ name: z.string().max(100) });

// Content-hashed names never change meaning, so a browser (and later a CDN) may keep them a year.
// private: these files are for the studio's members (and its presentations), so shared caches must not keep them.
const IMMUTABLE = 'private, max-age=31536000, immutable';

/**
 * Answers with the stored derived file `key` (already authorised by the caller), as an immutable
 * private WebP or glTF binary; a matching If-None-Match gets 304. `extra` headers go on both answers.
 */
export async function sendDerivedFile(
  ctx: Pick<RouteContext, 'req' | 'res' | 'services'>,
  key: string,
  extra: Record<string, string> = {},
): Promise<undefined> {
  const etag = `"${hashOfKey(key)}"`;
  const cacheHeaders = { ETag: etag, 'Cache-Control': IMMUTABLE, 'X-Content-Type-Options': 'nosniff', ...extra };
  const res: Response = ctx.res;
  if (ctx.req.headers['if-none-match'] === etag) {
    res.status(304).set(cacheHeaders).end();
    return undefined;
  }
  const bytes = await ctx.services.storage.get(key);
  if (!bytes) throw notFound('That file');
  res
    .set(cacheHeaders)
    .type(key.endsWith('.glb') ? 'model/gltf-binary' : 'image/webp')
    .send(bytes);
  return undefined;
}
