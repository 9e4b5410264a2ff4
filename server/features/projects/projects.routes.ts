import { createProjectSchema, listQuerySchema, projectPatchSchema } from '../../../shared/schemas/project';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import { getClient, insertClient } from '../clients/clients.repository';
import { getProject, insertProject, listProjects, lockProjectState, reopenProject, updateProject } from './projects.repository';
import { patchStateChange } from './project-states';
import type { Db } from '../../db/database';

/** Rooms of a project, for its page. Filled by the rooms feature through this hook. */
export type ProjectExtras = (db: Db, studioId: string, projectId: string) => Promise<Record<string, unknown>>;

export function projectRoutes(extras: ProjectExtras[] = []): RouteDef[] {
  return [
    route({
      method: 'get',
      path: '/api/projects',
      access: ALL_ROLES,
      query: listQuerySchema,
      async handler(ctx) {
        const query = ctx.query;
        return { projects: await listProjects(ctx.services.db, ctx.caller.studioId, query) };
      },
    }),
    route({
      method: 'post',
      path: '/api/projects',
      access: WRITERS,
      body: createProjectSchema,
      async handler(ctx) {
        const { caller } = ctx;
        const body = ctx.body;
        const id = await ctx.services.db.transaction().execute(async (trx) => {
          let clientId = body.clientId;
          if (clientId) {
            if (!(await getClient(trx, caller.studioId, clientId))) {
              throw new HttpError(400, 'invalid', 'Pick one of your clients.', { clientId: 'Pick one of your clients.' });
            }
          } else {
            clientId = (await insertClient(trx, caller.studioId, body.newClient!)).id;
          }
          return (
            await insertProject(trx, { studioId: caller.studioId, clientId, name: body.name, address: body.address ?? null })
          ).id;
        });
        ctx.res.status(201);
        return { project: await getProject(ctx.services.db, caller.studioId, id) };
      },
    }),
    route({
      method: 'get',
      path: '/api/projects/:id',
      access: ALL_ROLES,
      params: idParamSchema,
      async handler(ctx) {
        const { caller } = ctx;
        const { id } = ctx.params;
        const project = await getProject(ctx.services.db, caller.studioId, id);
        if (!project) throw notFound('That project');
        const client = await getClient(ctx.services.db, caller.studioId, project.client.id);
        let more: Record<string, unknown> = {};
        for (const extra of extras) more = { ...more, ...(await extra(ctx.services.db, caller.studioId, id)) };
        return {
          project,
          client: client && { id: client.id, name: client.name, email: client.email, phone: client.phone },
          ...more,
        };
      },
    }),
    route({
      method: 'patch',
      path: '/api/projects/:id',
      access: WRITERS,
      params: idParamSchema,
      body: projectPatchSchema,
      async handler(ctx) {
        const { caller } = ctx;
        const { id } = ctx.params;
        const { state, ...rest } = ctx.body;
        await ctx.services.db.transaction().execute(async (trx) => {
          const current = orNotFound(await lockProjectState(trx, caller.studioId, id), 'That project');
          const change = state ? patchStateChange(current.state, current.previous_state, state) : null;
          const changes = change ? { ...rest, state: change.state, previous_state: change.previousState } : rest;
          await updateProject(trx, caller.studioId, id, changes);
        });
        return { project: await getProject(ctx.services.db, caller.studioId, id) };
      },
    }),
    route({
      // Decided → presented, on purpose: the clients' links can change their choices again.
      method: 'post',
      path: '/api/projects/:projectId/reopen',
      access: WRITERS,
      params: projectIdParamSchema,
      async handler(ctx) {
        const { caller } = ctx;
        const { projectId } = ctx.params;
        await ctx.services.db.transaction().execute(async (trx) => {
          const current = orNotFound(await lockProjectState(trx, caller.studioId, projectId), 'That project');
          if (current.state === 'archived') throw new HttpError(409, 'archived', 'This project is archived. Restore it first.');
          if (!(await reopenProject(trx, caller.studioId, projectId, caller.memberId))) {
            throw new HttpError(409, 'not_decided', 'Only a decided project can be reopened; this one is not decided.');
          }
        });
        // Every link of the studio shows whether the project is decided: drop what this instance keeps.
        ctx.services.links.forgetStudio(caller.studioId);
        return { project: await getProject(ctx.services.db, caller.studioId, projectId) };
      },
    }),
  ];
}
