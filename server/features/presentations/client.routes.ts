// The client's side: public routes that authorise by the link's token alone. Every refusal is a
// plain 404 or 410 that says nothing about the presentation behind it.
import { z } from 'zod';
import type { Request, Response } from 'express';
import {
  choiceBodySchema,
  viewBodySchema,
  type ChoiceAnswer,
  type ClientPresentation,
} from '../../../shared/schemas/presentation';
import { optionLabel } from '../../../shared/schemas/room-api';
import { route, type RouteContext, type RouteDef } from '../../http/routes';
import { HttpError } from '../../http/errors';
import { lockProjectState, touchProject } from '../projects/projects.repository';
import { canPresentationReadFile } from '../files/files.access';
import { keyFromFileName } from '../files/file-keys';
import { fileParam, sendDerivedFile } from '../files/files.service';
import {
  getChoice,
  isShownOption,
  listShownOptions,
  logRequest,
  notifyAddresses,
  projectForPresentation,
  recordViewed,
  saveChoice,
  type PresentationRow,
} from './presentations.repository';
import { sendStudioMail } from '../outbox/outbox.service';
import {
  CHOICE_LIMIT,
  RATE_WINDOW_MS,
  VIEW_LIMIT,
  choiceMail,
  clientPresentation,
  linkNotFound,
  presentationFinishIds,
  presentationForToken,
} from './presentations.service';

const roomParam = z.object({ roomId: z.uuid() });

// The token travels in the path; keep it out of Referer headers and caches.
function privateAnswer(res: Response): void {
  res.setHeader('Cache-Control', 'no-store');
  res.setHeader('Referrer-Policy', 'no-referrer');
}

const tokenOf = (req: Request): string => (typeof req.params.token === 'string' ? req.params.token : '');

// The studio's own members opening the link (to check it) are not the client: their visits and
// looks are not recorded.
const isStudioMember = (ctx: RouteContext, p: PresentationRow) => ctx.caller?.studioId === p.studio_id;

function tooMany(res: Response): HttpError {
  res.setHeader('Retry-After', String(Math.ceil(RATE_WINDOW_MS / 1000)));
  return new HttpError(429, 'too_many', 'That was a lot of changes in a short time. Please wait a few minutes, then try again.');
}

async function notifyDesigner(
  ctx: RouteContext,
  p: PresentationRow,
  roomId: string,
  optionId: string,
  comment: string,
): Promise<void> {
  const { db, config } = ctx.services;
  try {
    const [project, shown, to] = await Promise.all([
      projectForPresentation(db, p.studio_id, p.project_id),
      listShownOptions(db, [p.id]),
      notifyAddresses(db, p.studio_id, p.created_by),
    ]);
    const inRoom = shown.filter((s) => s.room_id === roomId);
    const index = inRoom.findIndex((s) => s.option_id === optionId);
    if (!project || index < 0) return;
    const mail = {
      clientName: project.client_name,
      project: project.name,
      room: inRoom[index].room_name,
      option: optionLabel(index, inRoom[index].option_name),
      comment,
      projectLink: `${config.publicUrl}/projects/${project.id}`,
    };
    for (const address of to)
      await sendStudioMail(
        db,
        { ...ctx.services, log: ctx.log },
        { studioId: p.studio_id, kind: 'choice', ...choiceMail({ to: address, ...mail }) },
      );
  } catch (err) {
    // The choice is saved either way; the project page shows it even when the mail is lost.
    ctx.log.error({ err }, 'choice notification failed');
  }
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
      // The hot path of a busy link: a ready answer, no database round trip (see client-cache.ts).
      const link =
        cache.get(token) ??
        (await cache.load(token, async () => {
          const p = await presentationForToken(ctx.services.db, ctx.services.config, token);
          const answer: { presentation: ClientPresentation } = {
            presentation: await clientPresentation(ctx.services.db, p, token),
          };
          return { presentationId: p.id, studioId: p.studio_id, expiresAt: p.expires_at, body: JSON.stringify(answer) };
        }));
      if (ctx.caller?.studioId !== link.studioId) cache.recordOpened(link.presentationId);
      ctx.res.type('application/json').send(link.body);
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
      const p = await presentationForToken(ctx.services.db, ctx.services.config, tokenOf(ctx.req));
      const { name } = ctx.params;
      const key = keyFromFileName(name);
      const scope = { studioId: p.studio_id, finishIds: await presentationFinishIds(ctx.services.db, p) };
      // Another finish's file and no file at all answer the same, so names cannot be probed.
      if (!key || !(await canPresentationReadFile(ctx.services.db, scope, key)))
        throw new HttpError(404, 'not_found', 'That file was not found.');
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
      const { optionId } = ctx.body;
      await ctx.services.db.transaction().execute(async (trx) => {
        const p = await presentationForToken(trx, ctx.services.config, tokenOf(ctx.req), { forUpdate: true });
        if ((await logRequest(trx, p.id, 'view', new Date(Date.now() - RATE_WINDOW_MS))) > VIEW_LIMIT) throw tooMany(ctx.res);
        const ok = isStudioMember(ctx, p)
          ? await isShownOption(trx, p.id, optionId)
          : await recordViewed(trx, p.id, optionId, new Date());
        if (!ok) throw new HttpError(404, 'not_found', 'That option is not part of this presentation.');
      });
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
      const params = roomParam.safeParse(ctx.req.params);
      const body = ctx.body;
      const result = await ctx.services.db.transaction().execute(async (trx) => {
        // Holding the row serialises this link's posts across instances: the count below is exact.
        const p = await presentationForToken(trx, ctx.services.config, tokenOf(ctx.req), { forUpdate: true });
        if (!params.success) throw linkNotFound();
        const { roomId } = params.data;
        if ((await logRequest(trx, p.id, 'choice', new Date(Date.now() - RATE_WINDOW_MS))) > CHOICE_LIMIT) throw tooMany(ctx.res);
        // Held until the choice is saved, so Mark as decided cannot slip in between.
        const project = await lockProjectState(trx, p.studio_id, p.project_id, 'share');
        if (!project) throw linkNotFound();
        if (project.state === 'decided' || project.state === 'archived') {
          throw new HttpError(
            409,
            'decided',
            'Your designer has confirmed the choices for this project, so they cannot be changed here. Get in touch with them to change anything.',
          );
        }
        if (!(await isShownOption(trx, p.id, body.optionId, roomId)))
          throw new HttpError(404, 'not_found', 'That option is not part of this presentation.');
        const current = await getChoice(trx, p.id, roomId);
        if (current && current.option_id === body.optionId && current.comment === body.comment) {
          return {
            p,
            roomId,
            changed: false,
            choice: { optionId: current.option_id, comment: current.comment, chosenAt: current.chosen_at.toISOString() },
          };
        }
        const at = new Date();
        await saveChoice(trx, { presentationId: p.id, roomId, optionId: body.optionId, comment: body.comment, at });
        await touchProject(trx, p.project_id);
        return {
          p,
          roomId,
          changed: true,
          choice: { optionId: body.optionId, comment: body.comment, chosenAt: at.toISOString() },
        };
      });
      if (result.changed) {
        ctx.services.links.forgetPresentation(result.p.id);
        await notifyDesigner(ctx, result.p, result.roomId, body.optionId, body.comment);
      }
      return { choice: result.choice, changed: result.changed };
    },
  }),
];
