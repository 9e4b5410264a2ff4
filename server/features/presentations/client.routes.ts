// The client's side: public routes that authorise by the link's token alone. Every refusal is a
// plain 404 or 410 that says nothing about the presentation behind it.
import { z } from 'zod';
import type { Request, RequestHandler, Response } from 'express';
import { SESSION_COOKIE } from '../../services/auth/session';
import { REQUEST_ID_HEADER } from '../../services/logging/logger';
import type { ClientLinkCache, ReadyLink } from './client-cache';
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

/** Sends a link's ready answer as it is kept (bytes and ETag), counting the open unless the studio's own member looks. */
function sendReadyLink(res: Response, links: ClientLinkCache, link: ReadyLink, callerStudioId: string | undefined): void {
  if (callerStudioId !== link.studioId) links.recordOpened(link.presentationId);
  res.setHeader('Content-Type', JSON_TYPE);
  res.setHeader('ETag', link.etag);
  res.send(link.bytes);
}

/** A link's answer's headers (every one but the request id), in the flat form writeHead takes. */
type FlatHeaders = string[];

/**
 * The busiest request there is, a client's link whose answer is ready, answered before all of the
 * app's middleware with every header written in one go: the security headers (worked out once),
 * the link's private ones, the kept bytes' type, length and ETag, and the request's id and closing
 * log line (as requestLogger gives every request). No body to read, nothing to write (so no origin
 * check), no session to look up (a visitor has no session cookie). Anything else (a session
 * cookie, a conditional request, an answer not ready yet, a link that does not work) goes on to
 * the full stack and the route below, which does it all. A test holds both answers' headers equal.
 */
export function readyLinkFastPath(
  links: ClientLinkCache,
  opts: { beginLog: (req: Request, res: Response) => string; security: { set: [string, string | string[]][] } },
): RequestHandler {
  const fixed: FlatHeaders = [];
  for (const [name, value] of opts.security.set) {
    if (name.toLowerCase() === 'referrer-policy') continue; // the link's own, below
    fixed.push(name, Array.isArray(value) ? value.join(', ') : value);
  }
  fixed.push('Cache-Control', 'no-store', 'Referrer-Policy', 'no-referrer', 'Content-Type', JSON_TYPE);
  // Each ready answer's headers, made once per answer (an answer is replaced, never changed).
  const made = new WeakMap<ReadyLink, FlatHeaders>();
  return (req, res, next) => {
    if (req.method !== 'GET' || req.headers.cookie?.includes(SESSION_COOKIE)) return next();
    if (req.headers['if-none-match'] || req.headers['if-modified-since']) return next();
    const link = links.get(tokenOf(req));
    if (!link) return next();
    let headers = made.get(link);
    if (!headers) {
      headers = [...fixed, 'Content-Length', String(link.bytes.length), 'ETag', link.etag];
      made.set(link, headers);
    }
    const id = opts.beginLog(req, res);
    links.recordOpened(link.presentationId);
    res.writeHead(200, [REQUEST_ID_HEADER, id, ...headers]);
    res.end(link.bytes);
  };
}

export const clientPresentationRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/p/:token',
    access: 'public',
    async handler(ctx): Promise<undefined> {
      privateAnswer(ctx.res);
      const token = tokenOf(ctx.req);
      const cache = ctx.services.links;
      // A ready answer without a database round trip (see client-cache.ts); a visitor's usually
      // never gets here (readyLinkFastPath answers it first).
      const link = cache.get(token) ?? (await cache.load(token, () => loadClientLink(ctx.services, token)));
      // The bytes and their ETag are kept with the answer: sent as they are, nothing recomputed.
      sendReadyLink(ctx.res, cache, link, ctx.caller?.studioId);
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
