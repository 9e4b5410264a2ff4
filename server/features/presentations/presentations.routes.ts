// The designer's side of presentations: make one, send it, watch it, withdraw or extend it, and
// confirm the client's choices ("Mark as decided"). Rules and transactions are in presentations.service.ts.
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import {
  createPresentationSchema,
  decideProjectSchema,
  extendPresentationSchema,
  sendPresentationSchema,
} from '../../../shared/schemas/presentation';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import {
  createPresentation,
  decideProject,
  extendPresentation,
  listProjectPresentations,
  sendPresentation,
  withdrawPresentation,
} from './presentations.service';

export const presentationRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/projects/:projectId/presentations',
    access: ALL_ROLES,
    params: projectIdParamSchema,
    handler: async (ctx) => ({
      presentations: await listProjectPresentations(ctx.services, ctx.caller, ctx.params.projectId),
    }),
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/presentations',
    access: WRITERS,
    params: projectIdParamSchema,
    body: createPresentationSchema,
    async handler(ctx) {
      const presentation = await createPresentation(ctx.services, ctx.caller, ctx.params.projectId, ctx.body);
      ctx.res.status(201);
      return { presentation };
    },
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/send',
    access: WRITERS,
    params: idParamSchema,
    body: sendPresentationSchema,
    handler: async (ctx) => ({
      presentation: await sendPresentation(ctx.services, ctx.log, ctx.caller, ctx.params.id, ctx.body),
    }),
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/withdraw',
    access: WRITERS,
    params: idParamSchema,
    handler: async (ctx) => ({ presentation: await withdrawPresentation(ctx.services, ctx.caller, ctx.params.id) }),
  }),
  route({
    method: 'post',
    path: '/api/presentations/:id/extend',
    access: WRITERS,
    params: idParamSchema,
    body: extendPresentationSchema,
    handler: async (ctx) => ({
      presentation: await extendPresentation(ctx.services, ctx.caller, ctx.params.id, ctx.body.days),
    }),
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/decide',
    access: WRITERS,
    params: projectIdParamSchema,
    body: decideProjectSchema,
    handler: async (ctx) => ({
      state: 'decided' as const,
      presentation: await decideProject(ctx.services, ctx.caller, ctx.params.projectId, ctx.body.presentationId),
    }),
  }),
];
