// The designer's side of presentations: make one, send it, watch it, withdraw or extend it, and
// confirm the client's choices ("Mark as decided").
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import {
  LINK_LIFETIME_DAYS,
  createPresentationSchema,
  decideProjectSchema,
  extendPresentationSchema,
  sendPresentationSchema,
  type PresentationSummary,
} from '../../../shared/schemas/presentation';
import { ALL_ROLES, WRITERS, route, type SignedInContext, type RouteDef } from '../../http/routes';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import type { Db } from '../../db/database';
import { newTokenId, toTokenTime } from '../../services/tokens/presentation-token';
import { limitPresentationMail } from '../../services/rate-limit/mail-limits';
import { listMembers } from '../studio/members.repository';
import {
  getPresentation,
  insertPresentation,
  insertShownRooms,
  latestDecision,
  listPresentations,
  projectForPresentation,
  roomsWithOptions,
  setProjectState,
  studioName,
  updatePresentation,
  type PresentationRow,
} from './presentations.repository';
import { sendStudioMail } from '../outbox/outbox.service';
import { lockProjectState } from '../projects/projects.repository';
import { DECIDED_REOPEN_FIRST, decidedRefusal } from '../projects/project-states';
import { invitationMail, presentationLink, presentationState, presentationSummaries } from './presentations.service';

const DAY_MS = 86_400_000;

async function projectOrThrow(db: Db, studioId: string, projectId: string) {
  return orNotFound(await projectForPresentation(db, studioId, projectId), 'That project');
}

async function presentationOrThrow(db: Db, studioId: string, id: string) {
  return orNotFound(await getPresentation(db, studioId, id), 'That presentation');
}

async function summaries(ctx: SignedInContext, rows: PresentationRow[]): Promise<PresentationSummary[]> {
  const { caller } = ctx;
  const members = await listMembers(ctx.services.db, caller.studioId);
  return presentationSummaries(ctx.services.db, ctx.services.config, rows, {
    // The link opens the client's page and lets its holder choose, so viewers do not get it.
    withLinks: WRITERS.includes(caller.role),
    memberNames: new Map(members.map((m) => [m.id, m.name])),
  });
}

const one = async (ctx: SignedInContext, row: PresentationRow) => ({ presentation: (await summaries(ctx, [row]))[0] });

/** Every room must be the project's, every option that room's; names the first field that is not. */
async function assertShownRoomsBelong(
  db: Db,
  studioId: string,
  projectId: string,
  rooms: { roomId: string; optionIds: string[] }[],
) {
  const rows = await roomsWithOptions(
    db,
    studioId,
    projectId,
    rooms.map((r) => r.roomId),
  );
  const fields: Record<string, string> = {};
  rooms.forEach((room, i) => {
    const mine = rows.filter((r) => r.room_id === room.roomId);
    if (mine.length === 0) fields[`rooms[${i}].roomId`] = 'Not a room of this project.';
    else if (!room.optionIds.every((id) => mine.some((r) => r.option_id === id)))
      fields[`rooms[${i}].optionIds`] = 'Pick options of this room only.';
  });
  const first = Object.values(fields)[0];
  if (first) throw new HttpError(400, 'invalid', first, fields);
}

const refuseUnlessActive = (p: PresentationRow, doing: string) => {
  const state = presentationState(p);
  if (state === 'withdrawn')
    throw new HttpError(409, 'withdrawn', `This link was withdrawn, so it cannot be ${doing}. Make a new presentation instead.`);
  if (state === 'expired') throw new HttpError(409, 'expired', `This link has expired. Extend it before it is ${doing}.`);
};

export const presentationRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/projects/:projectId/presentations',
    access: ALL_ROLES,
    params: projectIdParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      await projectOrThrow(ctx.services.db, caller.studioId, projectId);
      await ctx.services.links.flushOpens();
      return { presentations: await summaries(ctx, await listPresentations(ctx.services.db, caller.studioId, projectId)) };
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/presentations',
    access: WRITERS,
    params: projectIdParamSchema,
    body: createPresentationSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      const body = ctx.body;
      const row = await ctx.services.db.transaction().execute(async (trx) => {
        const project = orNotFound(await lockProjectState(trx, caller.studioId, projectId), 'That project');
        if (project.state === 'archived')
          throw new HttpError(409, 'archived', 'This project is archived. Restore it before presenting it.');
        if (project.state === 'decided') throw decidedRefusal(DECIDED_REOPEN_FIRST);
        await assertShownRoomsBelong(trx, caller.studioId, projectId, body.rooms);
        const issuedAt = toTokenTime(new Date());
        const created = await insertPresentation(trx, {
          studioId: caller.studioId,
          projectId,
          createdBy: caller.memberId,
          tokenId: newTokenId(),
          message: body.message,
          showPrices: body.showPrices,
          issuedAt,
          tokenExpiresAt: new Date(issuedAt.getTime() + LINK_LIFETIME_DAYS * DAY_MS),
          expiresAt: new Date(issuedAt.getTime() + body.expiresInDays * DAY_MS),
        });
        await insertShownRooms(trx, created.id, body.rooms);
        // A link made is a link shared (sent or copied): the project is now with the client.
        if (project.state === 'draft') await setProjectState(trx, projectId, 'presented');
        return created;
      });
      ctx.res.status(201);
      return one(ctx, row);
    },
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/send',
    access: WRITERS,
    params: idParamSchema,
    body: sendPresentationSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const body = ctx.body;
      const { db, config } = ctx.services;
      const p = await presentationOrThrow(db, caller.studioId, id);
      refuseUnlessActive(p, 'sent');
      const project = await projectOrThrow(db, caller.studioId, p.project_id);
      const to = body.to ?? project.client_email;
      if (!to)
        throw new HttpError(400, 'invalid', 'The client has no e-mail address. Type one here, or copy the link instead.', {
          to: 'Enter the client’s e-mail.',
        });
      await limitPresentationMail(db, ctx.res, caller.studioId, to);
      const mail = invitationMail({
        to,
        studio: await studioName(db, caller.studioId),
        project: project.name,
        clientName: project.client_name,
        message: p.message,
        link: await presentationLink(config, p),
        expiresAt: p.expires_at,
      });
      // Sent last inside the transaction: a refused mail leaves nothing marked sent.
      const sent = await db.transaction().execute(async (trx) => {
        const saved = await updatePresentation(trx, p.id, { sent_at: new Date(), sent_to: to });
        if (project.state === 'draft') await setProjectState(trx, project.id, 'presented');
        await sendStudioMail(
          trx,
          { ...ctx.services, log: ctx.log },
          { studioId: caller.studioId, kind: 'presentation', ...mail },
          'The e-mail could not be sent. Try again in a moment, or copy the link instead.',
        );
        return saved;
      });
      return one(ctx, sent);
    },
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/withdraw',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const p = await presentationOrThrow(ctx.services.db, caller.studioId, id);
      // Withdrawing twice keeps the first time: that is when the link stopped working.
      const saved = p.withdrawn_at ? p : await updatePresentation(ctx.services.db, p.id, { withdrawn_at: new Date() });
      ctx.services.links.forgetPresentation(p.id);
      return one(ctx, saved);
    },
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/extend',
    access: WRITERS,
    params: idParamSchema,
    body: extendPresentationSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const { days } = ctx.body;
      const p = await presentationOrThrow(ctx.services.db, caller.studioId, id);
      if (p.withdrawn_at)
        throw new HttpError(
          409,
          'withdrawn',
          'This link was withdrawn, so it cannot be extended. Make a new presentation instead.',
        );
      const latest = p.token_expires_at.getTime();
      if (p.expires_at.getTime() >= latest) {
        throw new HttpError(
          409,
          'at_latest',
          `A link works for at most ${LINK_LIFETIME_DAYS} days. Make a new presentation to keep going.`,
        );
      }
      // From today when it has already run out, so extending an expired link opens it again.
      const from = Math.max(Date.now(), p.expires_at.getTime());
      const saved = await updatePresentation(ctx.services.db, p.id, {
        expires_at: new Date(Math.min(from + days * DAY_MS, latest)),
      });
      ctx.services.links.forgetPresentation(p.id);
      return one(ctx, saved);
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/decide',
    access: WRITERS,
    params: projectIdParamSchema,
    body: decideProjectSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      const { presentationId } = ctx.body;
      const saved = await ctx.services.db.transaction().execute(async (trx) => {
        // The presentation's row before the project's, in the order a client's choice takes them.
        const p = await getPresentation(trx, caller.studioId, presentationId, { forUpdate: true });
        const project = orNotFound(await lockProjectState(trx, caller.studioId, projectId), 'That project');
        if (!p || p.project_id !== projectId) throw notFound('That presentation');
        if (project.state === 'archived') throw new HttpError(409, 'archived', 'This project is archived. Restore it first.');
        if (project.state === 'decided') {
          // Asking twice for the same decision changes nothing; another needs Reopen first.
          if (p.decided_at && p.decided_at.getTime() === (await latestDecision(trx, projectId))?.getTime()) return p;
          throw decidedRefusal('This project is already decided. Reopen the project first to decide it again.');
        }
        if (p.withdrawn_at)
          throw new HttpError(409, 'withdrawn', 'This presentation was withdrawn; its choices cannot decide the project.');
        const [summary] = await presentationSummaries(trx, ctx.services.config, [p], {
          withLinks: false,
          memberNames: new Map(),
        });
        if (!summary.complete)
          throw new HttpError(409, 'incomplete', 'Every room in this presentation needs a choice before the project is decided.');
        await setProjectState(trx, projectId, 'decided');
        return updatePresentation(trx, p.id, { decided_at: new Date() });
      });
      ctx.services.links.forgetPresentation(saved.id);
      return { state: 'decided' as const, ...(await one(ctx, saved)) };
    },
  }),
];
