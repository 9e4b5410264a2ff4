// The client's side: public routes that authorise by the link's token alone. Every refusal is a
// plain 404 or 410 that says nothing about the presentation behind it.
import { z } from 'zod';
import type { Request, Response } from 'express';
import { choiceBodySchema, viewBodySchema, type ChoiceAnswer } from '../../../shared/schemas/presentation';
import { route, type RouteDef } from '../../http/routes';
import { HttpError } from '../../http/errors';
import { fileParam, sendDerivedFile } from '../files/files.service';
import { chooseOption, linkFileKey, loadClientLink, notifyDesigner, recordView } from './client.service';

const roomParam = z.object({ roomId: z.uuid() });
/** The content type Express gives a JSON text. */
const JSON_TYPE = 'application/json; charset=utf-8';

// The token travels in the path; keep it out of Referer headers and caches.
function privateAnswer(res: Response): void {
  res.setHeader('Cache-Control', 'no-store');
  res.setHeader('Referrer-Policy', 'no-referrer');
}

const tokenOf = (req: Request): string => (typeof req.params.token === 'string' ? req.params.token : '');

export const clientPresentationRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/p/:token',
    access: 'public',
    async handler(ctx): Promise<undefined> {
      privateAnswer(ctx.res);
      const token = tokenOf(ctx.req);
      const cache = ctx.services.links;
      // The hot path of a busy link: a ready answer, no database round trip (see client-cache.ts).
      const link = cache.get(token) ?? (await cache.load(token, () => loadClientLink(ctx.services, token)));
      if (ctx.caller?.studioId !== link.studioId) cache.recordOpened(link.presentationId);
      // The bytes and their ETag are kept with the answer: sent as they are, nothing recomputed.
      ctx.res.setHeader('Content-Type', JSON_TYPE);
      ctx.res.setHeader('ETag', link.etag);
      ctx.res.send(link.bytes);
      return undefined;
    },
  }),
  route({
    // The textures of the finishes the shown options wear, for a visitor without an account. The
    // link is checked on every request (withdrawing stops it at once); the browser's own cache may
    // keep a file it already has, as for the studio's members.
    method: 'get',
    path: '/api/p/:token/files/:name',
    access: 'public',
    params: fileParam,
    async handler(ctx) {
      const key = await linkFileKey(ctx.services, tokenOf(ctx.req), ctx.params.name);
      if (!key) throw new HttpError(404, 'not_found', 'That file was not found.');
      return sendDerivedFile(ctx, key, { 'Referrer-Policy': 'no-referrer' });
    },
  }),
  route({
    method: 'post',
    path: '/api/p/:token/views',
    access: 'public',
    body: viewBodySchema,
    async handler(ctx) {
      privateAnswer(ctx.res);
      await recordView(ctx.services, { token: tokenOf(ctx.req), caller: ctx.caller, optionId: ctx.body.optionId });
      return undefined;
    },
  }),
  route({
    method: 'put',
    path: '/api/p/:token/rooms/:roomId/choice',
    access: 'public',
    body: choiceBodySchema,
    async handler(ctx): Promise<ChoiceAnswer> {
      privateAnswer(ctx.res);
      const room = roomParam.safeParse(ctx.req.params);
      const { optionId, comment } = ctx.body;
      const result = await chooseOption(ctx.services, {
        token: tokenOf(ctx.req),
        roomId: room.success ? room.data.roomId : null,
        optionId,
        comment,
      });
      if (result.changed && room.success) {
        ctx.services.links.forgetPresentation(result.presentation.id);
        await notifyDesigner(ctx.services, ctx.log, result.presentation, { roomId: room.data.roomId, optionId, comment });
      }
      return { choice: result.choice, changed: result.changed };
    },
  }),
];
