// The rooms and options API: a project's rooms, creating and importing a room, opening, saving,
// deleting and exporting one as a plan file, and adding, ordering, saving and deleting its options.
import { z } from 'zod';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import {
  createOptionSchema,
  createRoomSchema,
  reorderOptionsSchema,
  saveOptionSchema,
  saveRoomSchema,
} from '../../../shared/schemas/room-api';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import {
  addOption,
  createRoom,
  exportPlanFile,
  importPlanFile,
  listProjectRooms,
  openRoom,
  removeOption,
  removeRoom,
  reorderOptions,
  saveOption,
  saveRoom,
} from './rooms.service';

const exportQuery = z.object({ optionId: z.uuid().optional() });

export const roomRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/projects/:projectId/rooms',
    access: ALL_ROLES,
    params: projectIdParamSchema,
    async handler(ctx) {
      return { rooms: await listProjectRooms(ctx.services.db, ctx.caller.studioId, ctx.params.projectId) };
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/rooms',
    access: WRITERS,
    params: projectIdParamSchema,
    body: createRoomSchema,
    async handler(ctx) {
      const created = await createRoom(ctx.services.db, ctx.caller.studioId, ctx.params.projectId, ctx.body);
      ctx.res.status(201);
      return created;
    },
  }),
  route({
    // The body is the plan file itself, read by the service (its errors name the file's fields).
    method: 'post',
    path: '/api/projects/:projectId/rooms/import',
    access: WRITERS,
    params: projectIdParamSchema,
    async handler(ctx) {
      const created = await importPlanFile(ctx.services.db, ctx.caller.studioId, ctx.params.projectId, ctx.req.body);
      ctx.res.status(201);
      return created;
    },
  }),
  route({
    method: 'get',
    path: '/api/rooms/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    async handler(ctx) {
      return openRoom(ctx.services.db, ctx.caller.studioId, ctx.params.id);
    },
  }),
  route({
    method: 'put',
    path: '/api/rooms/:id',
    access: WRITERS,
    params: idParamSchema,
    body: saveRoomSchema,
    async handler(ctx) {
      return { room: await saveRoom(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body) };
    },
  }),
  route({
    method: 'delete',
    path: '/api/rooms/:id',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      await removeRoom(ctx.services.db, ctx.caller.studioId, ctx.params.id);
    },
  }),
  route({
    method: 'get',
    path: '/api/rooms/:id/plan-file',
    access: ALL_ROLES,
    params: idParamSchema,
    query: exportQuery,
    async handler(ctx) {
      const file = await exportPlanFile(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.query.optionId);
      ctx.res.setHeader('Content-Type', 'application/json; charset=utf-8');
      ctx.res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
      ctx.res.send(file.text);
    },
  }),
  route({
    method: 'post',
    path: '/api/rooms/:id/options',
    access: WRITERS,
    params: idParamSchema,
    body: createOptionSchema,
    async handler(ctx) {
      const option = await addOption(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body);
      ctx.res.status(201);
      return { option };
    },
  }),
  route({
    method: 'put',
    path: '/api/rooms/:id/option-order',
    access: WRITERS,
    params: idParamSchema,
    body: reorderOptionsSchema,
    async handler(ctx) {
      return { options: await reorderOptions(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body.optionIds) };
    },
  }),
  route({
    method: 'put',
    path: '/api/options/:id',
    access: WRITERS,
    params: idParamSchema,
    body: saveOptionSchema,
    async handler(ctx) {
      return { option: await saveOption(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body) };
    },
  }),
  route({
    method: 'delete',
    path: '/api/options/:id',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      await removeOption(ctx.services.db, ctx.caller.studioId, ctx.params.id);
    },
  }),
];
