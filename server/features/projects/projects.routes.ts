// The projects API: list, create, read and change a studio's projects, and reopen a decided one.
import { createProjectSchema, listQuerySchema, projectPatchSchema } from '../../../shared/schemas/project';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { changeProject, createProject, findProjects, projectDetail, reopenDecidedProject } from './projects.service';

// A project's rooms are listed by the rooms feature: GET /api/projects/:projectId/rooms.
export const projectRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/projects',
    access: ALL_ROLES,
    query: listQuerySchema,
    async handler(ctx) {
      return { projects: await findProjects(ctx.services.db, ctx.caller.studioId, ctx.query) };
    },
  }),
  route({
    method: 'post',
    path: '/api/projects',
    access: WRITERS,
    body: createProjectSchema,
    async handler(ctx) {
      const project = await createProject(ctx.services.db, ctx.caller.studioId, ctx.body);
      ctx.res.status(201);
      return { project };
    },
  }),
  route({
    method: 'get',
    path: '/api/projects/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    async handler(ctx) {
      return projectDetail(ctx.services.db, ctx.caller.studioId, ctx.params.id);
    },
  }),
  route({
    method: 'patch',
    path: '/api/projects/:id',
    access: WRITERS,
    params: idParamSchema,
    body: projectPatchSchema,
    async handler(ctx) {
      return { project: await changeProject(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body) };
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/reopen',
    access: WRITERS,
    params: projectIdParamSchema,
    async handler(ctx) {
      return { project: await reopenDecidedProject(ctx.services, ctx.caller, ctx.params.projectId) };
    },
  }),
];
