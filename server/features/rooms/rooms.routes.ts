import { isDeepStrictEqual } from 'node:util';
import { z } from 'zod';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import { optionDocSchema } from '../../../shared/schemas/option';
import {
  PROJECT_LIMITS,
  createOptionSchema,
  createRoomSchema,
  reorderOptionsSchema,
  saveOptionSchema,
  saveRoomSchema,
} from '../../../shared/schemas/room-api';
import { readPlanFile, writePlanFile } from '../../../shared/schemas/plan-file';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import { getProject, lockProjectState, touchProject } from '../projects/projects.repository';
import type { Db } from '../../db/database';
import {
  countOptionsLocked,
  countRoomsLocked,
  deleteOption,
  deleteRoom,
  getOption,
  getRoom,
  insertOption,
  insertRoom,
  listOptions,
  setOptionPositions,
  updateOptionIfVersion,
  updateRoomIfVersion,
} from './rooms.repository';
import { assertDrawableShell, fileSlug, problemsToFields, roomSummaries } from './rooms.service';
import { assertDeletable, assertOptionEditable, assertShellEditable, choiceKeptRefusal, isChoiceKept } from './room-guards';

const exportQuery = z.object({ optionId: z.uuid().optional() });
const EMPTY_DOC = optionDocSchema.parse({});

async function projectOrThrow(db: Db, studioId: string, projectId: string) {
  return orNotFound(await getProject(db, studioId, projectId), 'That project');
}

async function roomOrThrow(db: Db, studioId: string, id: string) {
  return orNotFound(await getRoom(db, studioId, id), 'That room');
}

async function optionOrThrow(db: Db, studioId: string, id: string) {
  return orNotFound(await getOption(db, studioId, id), 'That option');
}

/** A room and its first option, in one transaction. */
async function createRoomWithOption(
  db: Db,
  studioId: string,
  projectId: string,
  room: { name: string; shell: unknown },
  option: { name: string; note: string; doc: unknown },
) {
  return db.transaction().execute(async (trx) => {
    await projectOrThrow(trx, studioId, projectId);
    if ((await countRoomsLocked(trx, projectId)) >= PROJECT_LIMITS.roomsPerProject) {
      throw new HttpError(
        409,
        'too_many_rooms',
        `A project holds at most ${PROJECT_LIMITS.roomsPerProject} rooms. Delete one before adding another.`,
      );
    }
    const created = await insertRoom(trx, { studioId, projectId, ...room });
    const first = await insertOption(trx, { studioId, roomId: created.id, ...option });
    await touchProject(trx, projectId);
    return { room: created, options: [first] };
  });
}

/** Runs a delete; the database's refusal to take a client's choice with it becomes a 409. */
async function deleteKeepingChoices(what: 'room' | 'option', run: () => Promise<void>): Promise<void> {
  try {
    await run();
  } catch (err) {
    if (isChoiceKept(err)) throw choiceKeptRefusal(what);
    throw err;
  }
}

const conflict = (what: string, current: unknown) =>
  new HttpError(409, 'conflict', `Someone saved this ${what} after you opened it. Reload theirs or keep yours.`, undefined, {
    current,
  });

/** Project pages list their rooms through this. */
export const projectRoomsExtra = async (db: Db, studioId: string, projectId: string) => ({
  rooms: await roomSummaries(db, studioId, projectId),
});

export const roomRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/projects/:projectId/rooms',
    access: ALL_ROLES,
    params: projectIdParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      await projectOrThrow(ctx.services.db, caller.studioId, projectId);
      return { rooms: await roomSummaries(ctx.services.db, caller.studioId, projectId) };
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/rooms',
    access: WRITERS,
    params: projectIdParamSchema,
    body: createRoomSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      const body = ctx.body;
      assertDrawableShell(body.shell);
      const result = await createRoomWithOption(
        ctx.services.db,
        caller.studioId,
        projectId,
        { name: body.name, shell: body.shell },
        { name: '', note: '', doc: EMPTY_DOC },
      );
      ctx.res.status(201);
      return result;
    },
  }),
  route({
    method: 'post',
    path: '/api/projects/:projectId/rooms/import',
    access: WRITERS,
    params: projectIdParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { projectId } = ctx.params;
      const read = readPlanFile(ctx.req.body);
      if (!read.ok) {
        const fields = problemsToFields(
          read.errors.map((e) => {
            const at = e.indexOf(': ');
            return { path: e.slice(0, at), message: e.slice(at + 2) };
          }),
        );
        throw new HttpError(400, 'invalid_plan_file', `This plan file cannot be read: ${read.errors[0]}`, fields);
      }
      const {
        room: { name, ...shell },
        option,
      } = read.plan;
      const doc = optionDocSchema.parse({ pieces: option.pieces, finishes: option.finishes });
      const result = await createRoomWithOption(
        ctx.services.db,
        caller.studioId,
        projectId,
        { name: name || 'Imported room', shell },
        { name: option.name, note: option.note ?? '', doc },
      );
      ctx.res.status(201);
      return result;
    },
  }),
  route({
    method: 'get',
    path: '/api/rooms/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const room = await roomOrThrow(ctx.services.db, caller.studioId, id);
      return { room, options: await listOptions(ctx.services.db, caller.studioId, id) };
    },
  }),
  route({
    method: 'put',
    path: '/api/rooms/:id',
    access: WRITERS,
    params: idParamSchema,
    body: saveRoomSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const body = ctx.body;
      if (body.shell) assertDrawableShell(body.shell);
      return ctx.services.db.transaction().execute(async (trx) => {
        if (body.shell) {
          const room = await roomOrThrow(trx, caller.studioId, id);
          await lockProjectState(trx, caller.studioId, room.projectId, 'share');
          if (!isDeepStrictEqual(body.shell, room.shell)) await assertShellEditable(trx, caller.studioId, id);
        }
        const saved = await updateRoomIfVersion(trx, caller.studioId, id, body.version, { name: body.name, shell: body.shell });
        if (!saved) throw conflict('room', await roomOrThrow(trx, caller.studioId, id));
        await touchProject(trx, saved.projectId);
        return { room: saved };
      });
    },
  }),
  route({
    method: 'delete',
    path: '/api/rooms/:id',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      await deleteKeepingChoices('room', () =>
        ctx.services.db.transaction().execute(async (trx) => {
          const room = await roomOrThrow(trx, caller.studioId, id);
          // Held until the room is gone, so no presentation can start showing it in between.
          await lockProjectState(trx, caller.studioId, room.projectId);
          await assertDeletable(trx, caller.studioId, { roomId: id });
          await deleteRoom(trx, caller.studioId, id);
          await touchProject(trx, room.projectId);
        }),
      );
      return undefined;
    },
  }),
  route({
    method: 'get',
    path: '/api/rooms/:id/plan-file',
    access: ALL_ROLES,
    params: idParamSchema,
    query: exportQuery,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const { optionId } = ctx.query;
      const room = await roomOrThrow(ctx.services.db, caller.studioId, id);
      const options = await listOptions(ctx.services.db, caller.studioId, id);
      const option = optionId ? options.find((o) => o.id === optionId) : options[0];
      if (!option) throw notFound('That option');
      const text = writePlanFile({
        room: { name: room.name, ...room.shell },
        option: {
          name: option.name || `Option ${String.fromCharCode(65 + option.position)}`,
          note: option.note || undefined,
          pieces: option.doc.pieces,
          finishes: option.doc.finishes,
        },
      });
      ctx.res.setHeader('Content-Type', 'application/json; charset=utf-8');
      ctx.res.setHeader('Content-Disposition', `attachment; filename="${fileSlug(room.name)}.plan.json"`);
      ctx.res.send(text);
      return undefined;
    },
  }),
  route({
    method: 'post',
    path: '/api/rooms/:id/options',
    access: WRITERS,
    params: idParamSchema,
    body: createOptionSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const body = ctx.body;
      const option = await ctx.services.db.transaction().execute(async (trx) => {
        const room = await roomOrThrow(trx, caller.studioId, id);
        if ((await countOptionsLocked(trx, id)) >= PROJECT_LIMITS.optionsPerRoom) {
          throw new HttpError(
            409,
            'too_many_options',
            `A room holds at most ${PROJECT_LIMITS.optionsPerRoom} options. Delete one before adding another.`,
          );
        }
        let doc = EMPTY_DOC;
        let note = body.note;
        if (body.fromOptionId) {
          const from = await getOption(trx, caller.studioId, body.fromOptionId);
          if (!from || from.roomId !== id)
            throw new HttpError(400, 'invalid', 'Duplicate an option of this room.', {
              fromOptionId: 'Not an option of this room.',
            });
          doc = from.doc;
          note = note || from.note;
        }
        await touchProject(trx, room.projectId);
        return insertOption(trx, { studioId: caller.studioId, roomId: id, name: body.name, note, doc });
      });
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
      const { caller } = ctx;
      const { id } = ctx.params;
      const { optionIds } = ctx.body;
      return ctx.services.db.transaction().execute(async (trx) => {
        await roomOrThrow(trx, caller.studioId, id);
        const current = await listOptions(trx, caller.studioId, id);
        const same = current.length === optionIds.length && current.every((o) => optionIds.includes(o.id));
        if (!same)
          throw new HttpError(400, 'invalid', 'List every option of this room exactly once.', {
            optionIds: 'Must list every option of this room once.',
          });
        await setOptionPositions(trx, id, optionIds);
        return { options: await listOptions(trx, caller.studioId, id) };
      });
    },
  }),
  route({
    method: 'put',
    path: '/api/options/:id',
    access: WRITERS,
    params: idParamSchema,
    body: saveOptionSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      const body = ctx.body;
      return ctx.services.db.transaction().execute(async (trx) => {
        const current = await optionOrThrow(trx, caller.studioId, id);
        const changes =
          (body.name !== undefined && body.name !== current.name) ||
          (body.note !== undefined && body.note !== current.note) ||
          (body.doc !== undefined && !isDeepStrictEqual(body.doc, current.doc));
        if (changes) await assertOptionEditable(trx, caller.studioId, id);
        const saved = await updateOptionIfVersion(trx, caller.studioId, id, body.version, {
          name: body.name,
          note: body.note,
          doc: body.doc,
        });
        if (!saved) throw conflict('option', await optionOrThrow(trx, caller.studioId, id));
        return { option: saved };
      });
    },
  }),
  route({
    method: 'delete',
    path: '/api/options/:id',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      const { caller } = ctx;
      const { id } = ctx.params;
      await deleteKeepingChoices('option', () =>
        ctx.services.db.transaction().execute(async (trx) => {
          const option = await optionOrThrow(trx, caller.studioId, id);
          const room = await roomOrThrow(trx, caller.studioId, option.roomId);
          await lockProjectState(trx, caller.studioId, room.projectId);
          const siblings = await listOptions(trx, caller.studioId, option.roomId);
          if (siblings.length <= 1) throw new HttpError(409, 'last_option', 'A room keeps at least one option.');
          await assertDeletable(trx, caller.studioId, { optionId: id });
          await deleteOption(trx, id);
          await setOptionPositions(
            trx,
            option.roomId,
            siblings.filter((o) => o.id !== id).map((o) => o.id),
          );
        }),
      );
      return undefined;
    },
  }),
];
