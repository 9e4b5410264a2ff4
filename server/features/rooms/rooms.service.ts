// The rooms feature's rules and transactions: rooms and their options are created within the
// project's limits, saved only over the version the designer opened, deleted only when no
// presentation shows them and no client's choice stands on them (room-guards.ts), reordered, and
// read from and written to plan files. SQL lives in rooms.repository.ts; routes only call these.
import { isDeepStrictEqual } from 'node:util';
import type { z } from 'zod';
import type { Db } from '../../db/database';
import type { RoomShell } from '../../../shared/schemas/room';
import { optionDocSchema, type OptionDoc } from '../../../shared/schemas/option';
import { validateRoomShell, type FieldProblem } from '../../../shared/geometry/validate';
import { computeTakeoff } from '../../../shared/analysis/takeoff';
import {
  PROJECT_LIMITS,
  type OptionRecord,
  type RoomRecord,
  type RoomSummary,
  type createOptionSchema,
  type createRoomSchema,
  type saveOptionSchema,
  type saveRoomSchema,
} from '../../../shared/schemas/room-api';
import { readPlanFile, writePlanFile } from '../../../shared/schemas/plan-file';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import { lockProjectState, touchProject } from '../projects/projects.repository';
import { projectOrThrow } from '../projects/projects.service';
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
  listRooms,
  RoomPositionsTaken,
  setOptionPositions,
  toRoom,
  updateOptionIfVersion,
  updateRoomIfVersion,
} from './rooms.repository';
import { assertDeletable, assertOptionEditable, assertShellEditable, deleteKeepingChoices } from './room-guards';

/** A room with its options, in position order: what creating, importing and opening a room answer. */
export interface RoomWithOptions {
  room: RoomRecord;
  options: OptionRecord[];
}

/** A plan file ready to download. */
export interface PlanFileDownload {
  fileName: string;
  text: string;
}

type NewRoom = z.output<typeof createRoomSchema>;
type RoomSave = z.output<typeof saveRoomSchema>;
type NewOption = z.output<typeof createOptionSchema>;
type OptionSave = z.output<typeof saveOptionSchema>;

const EMPTY_DOC = optionDocSchema.parse({});

export function problemsToFields(problems: FieldProblem[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const p of problems) fields[p.path] ??= p.message;
  return fields;
}

/** Refuses a shell that cannot be drawn or measured (crossing walls, openings off their wall…). */
export function assertDrawableShell(shell: RoomShell, prefix = 'shell'): void {
  const problems = validateRoomShell(shell, prefix);
  if (problems.length > 0) {
    const first = problems[0];
    throw new HttpError(400, 'invalid', `${first.path}: ${first.message}`, problemsToFields(problems));
  }
}

async function roomOrThrow(db: Db, studioId: string, id: string): Promise<RoomRecord> {
  return orNotFound(await getRoom(db, studioId, id), 'That room');
}

async function optionOrThrow(db: Db, studioId: string, id: string): Promise<OptionRecord> {
  return orNotFound(await getOption(db, studioId, id), 'That option');
}

const conflict = (what: string, current: unknown) =>
  new HttpError(409, 'conflict', `Someone saved this ${what} after you opened it. Reload theirs or keep yours.`, undefined, {
    current,
  });

/** The later of the room's own change and its options' (an ISO time). */
function latest(roomIso: string, options: Date | string | null): string {
  if (options === null) return roomIso;
  const t = new Date(options);
  return t.getTime() > Date.parse(roomIso) ? t.toISOString() : roomIso;
}

/** Rooms of a project with their option count and floor area, for the project page. */
export async function roomSummaries(db: Db, studioId: string, projectId: string): Promise<RoomSummary[]> {
  const rows = await listRooms(db, studioId, projectId);
  return rows.map((r) => {
    const room = toRoom(r);
    return {
      id: room.id,
      name: room.name,
      position: room.position,
      optionCount: Number(r.option_count),
      floorAreaM2: computeTakeoff(room.shell).floorAreaM2,
      updatedAt: latest(room.updatedAt, r.options_updated_at),
    };
  });
}

/** The rooms of one of the studio's projects; 404 when the studio has no such project. */
export async function listProjectRooms(db: Db, studioId: string, projectId: string): Promise<RoomSummary[]> {
  await projectOrThrow(db, studioId, projectId);
  return roomSummaries(db, studioId, projectId);
}

/** A room and its first option, in one transaction, within the project's room limit. */
async function createRoomWithOption(
  db: Db,
  studioId: string,
  projectId: string,
  room: { name: string; shell: RoomShell },
  option: { name: string; note: string; doc: OptionDoc },
): Promise<RoomWithOptions> {
  return db.transaction().execute(async (trx) => {
    await projectOrThrow(trx, studioId, projectId);
    if ((await countRoomsLocked(trx, projectId)) >= PROJECT_LIMITS.roomsPerProject) {
      throw new HttpError(
        409,
        'too_many_rooms',
        `A project holds at most ${PROJECT_LIMITS.roomsPerProject} rooms. Delete one before adding another.`,
      );
    }
    const created = await insertRoom(trx, { studioId, projectId, ...room }).catch((err: unknown) => {
      if (err instanceof RoomPositionsTaken) {
        throw new HttpError(503, 'busy', 'Many rooms are being added to this project at once. Try again in a moment.');
      }
      throw err;
    });
    const first = await insertOption(trx, { studioId, roomId: created.id, ...option });
    await touchProject(trx, projectId);
    return { room: created, options: [first] };
  });
}

/** A new room with one empty option. */
export async function createRoom(db: Db, studioId: string, projectId: string, input: NewRoom): Promise<RoomWithOptions> {
  assertDrawableShell(input.shell);
  return createRoomWithOption(
    db,
    studioId,
    projectId,
    { name: input.name, shell: input.shell },
    { name: '', note: '', doc: EMPTY_DOC },
  );
}

/** A new room and its option read from a plan file; 400 naming the fields when the file cannot be read. */
export async function importPlanFile(db: Db, studioId: string, projectId: string, file: unknown): Promise<RoomWithOptions> {
  const read = readPlanFile(file);
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
  return createRoomWithOption(
    db,
    studioId,
    projectId,
    { name: name || 'Imported room', shell },
    { name: option.name, note: option.note ?? '', doc },
  );
}

/** A room and its options, for the editor. */
export async function openRoom(db: Db, studioId: string, id: string): Promise<RoomWithOptions> {
  const room = await roomOrThrow(db, studioId, id);
  return { room, options: await listOptions(db, studioId, id) };
}

/**
 * Saves a room's name and shell over the version the designer opened (409 with the current room
 * otherwise). The walls around a decided project's chosen option do not change.
 */
export async function saveRoom(db: Db, studioId: string, id: string, input: RoomSave): Promise<RoomRecord> {
  if (input.shell) assertDrawableShell(input.shell);
  return db.transaction().execute(async (trx) => {
    if (input.shell) {
      const room = await roomOrThrow(trx, studioId, id);
      await lockProjectState(trx, studioId, room.projectId, 'share');
      if (!isDeepStrictEqual(input.shell, room.shell)) await assertShellEditable(trx, studioId, id);
    }
    const saved = await updateRoomIfVersion(trx, studioId, id, input.version, { name: input.name, shell: input.shell });
    if (!saved) throw conflict('room', await roomOrThrow(trx, studioId, id));
    await touchProject(trx, saved.projectId);
    return saved;
  });
}

/** Deletes a room and its options, unless a presentation shows it or a client's choice stands on it. */
export async function removeRoom(db: Db, studioId: string, id: string): Promise<void> {
  await deleteKeepingChoices('room', () =>
    db.transaction().execute(async (trx) => {
      const room = await roomOrThrow(trx, studioId, id);
      // Held until the room is gone, so no presentation can start showing it in between.
      await lockProjectState(trx, studioId, room.projectId);
      await assertDeletable(trx, studioId, { roomId: id });
      await deleteRoom(trx, studioId, id);
      await touchProject(trx, room.projectId);
    }),
  );
}

/** A file name for a download: lower-case words joined by hyphens. */
export function fileSlug(name: string): string {
  return (
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'room'
  );
}

/** The room with one of its options (the first unless named) as a plan file. */
export async function exportPlanFile(db: Db, studioId: string, id: string, optionId?: string): Promise<PlanFileDownload> {
  const room = await roomOrThrow(db, studioId, id);
  const options = await listOptions(db, studioId, id);
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
  return { fileName: `${fileSlug(room.name)}.plan.json`, text };
}

/** A new option after the room's last, empty or a copy of one of the room's options, within the room's option limit. */
export async function addOption(db: Db, studioId: string, roomId: string, input: NewOption): Promise<OptionRecord> {
  return db.transaction().execute(async (trx) => {
    const room = await roomOrThrow(trx, studioId, roomId);
    if ((await countOptionsLocked(trx, roomId)) >= PROJECT_LIMITS.optionsPerRoom) {
      throw new HttpError(
        409,
        'too_many_options',
        `A room holds at most ${PROJECT_LIMITS.optionsPerRoom} options. Delete one before adding another.`,
      );
    }
    let doc = EMPTY_DOC;
    let note = input.note;
    if (input.fromOptionId) {
      const from = await getOption(trx, studioId, input.fromOptionId);
      if (!from || from.roomId !== roomId)
        throw new HttpError(400, 'invalid', 'Duplicate an option of this room.', {
          fromOptionId: 'Not an option of this room.',
        });
      doc = from.doc;
      note = note || from.note;
    }
    await touchProject(trx, room.projectId);
    return insertOption(trx, { studioId, roomId, name: input.name, note, doc });
  });
}

/** Puts the room's options in the order given, which lists each of them once. */
export async function reorderOptions(db: Db, studioId: string, roomId: string, optionIds: string[]): Promise<OptionRecord[]> {
  return db.transaction().execute(async (trx) => {
    await roomOrThrow(trx, studioId, roomId);
    const current = await listOptions(trx, studioId, roomId);
    const same = current.length === optionIds.length && current.every((o) => optionIds.includes(o.id));
    if (!same)
      throw new HttpError(400, 'invalid', 'List every option of this room exactly once.', {
        optionIds: 'Must list every option of this room once.',
      });
    await setOptionPositions(trx, roomId, optionIds);
    return listOptions(trx, studioId, roomId);
  });
}

/**
 * Saves an option over the version the designer opened (409 with the current option otherwise).
 * An option a decided project stands on does not change.
 */
export async function saveOption(db: Db, studioId: string, id: string, input: OptionSave): Promise<OptionRecord> {
  return db.transaction().execute(async (trx) => {
    const current = await optionOrThrow(trx, studioId, id);
    const changes =
      (input.name !== undefined && input.name !== current.name) ||
      (input.note !== undefined && input.note !== current.note) ||
      (input.doc !== undefined && !isDeepStrictEqual(input.doc, current.doc));
    if (changes) await assertOptionEditable(trx, studioId, id);
    const saved = await updateOptionIfVersion(trx, studioId, id, input.version, {
      name: input.name,
      note: input.note,
      doc: input.doc,
    });
    if (!saved) throw conflict('option', await optionOrThrow(trx, studioId, id));
    return saved;
  });
}

/**
 * Deletes an option and closes the gap in the positions, unless it is the room's last, a
 * presentation shows it or a client's choice stands on it.
 */
export async function removeOption(db: Db, studioId: string, id: string): Promise<void> {
  await deleteKeepingChoices('option', () =>
    db.transaction().execute(async (trx) => {
      const option = await optionOrThrow(trx, studioId, id);
      const room = await roomOrThrow(trx, studioId, option.roomId);
      await lockProjectState(trx, studioId, room.projectId);
      const siblings = await listOptions(trx, studioId, option.roomId);
      if (siblings.length <= 1) throw new HttpError(409, 'last_option', 'A room keeps at least one option.');
      await assertDeletable(trx, studioId, { optionId: id });
      await deleteOption(trx, id);
      await setOptionPositions(
        trx,
        option.roomId,
        siblings.filter((o) => o.id !== id).map((o) => o.id),
      );
    }),
  );
}
