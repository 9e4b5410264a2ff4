import type { Db } from '../../db/database';
import type { RoomShell } from '../../../shared/schemas/room';
import { validateRoomShell, type FieldProblem } from '../../../shared/geometry/validate';
import { computeTakeoff } from '../../../shared/analysis/takeoff';
import type { RoomSummary } from '../../../shared/schemas/room-api';
import { HttpError } from '../../http/errors';
import { listRooms, toRoom } from './rooms.repository';

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
      floorAreaM2: computeTakeoff(room.shell).floorArea_m2,
      updatedAt: latest(room.updatedAt, r.options_updated_at),
    };
  });
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
