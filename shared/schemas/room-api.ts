// Bodies and answers of the rooms and options API.
import { z } from 'zod';
import { versionSchema as version } from './common';
import { roomNameSchema as roomName, roomShellSchema, type RoomShell } from './room';
import { optionDocSchema, optionNameSchema as optionName, optionNoteSchema, type OptionDoc } from './option';

/** How many rooms a project and options a room may hold: more than any real job needs (common practice). */
export const PROJECT_LIMITS = { roomsPerProject: 60, optionsPerRoom: 12 } as const;

export const createRoomSchema = z.object({ name: roomName, shell: roomShellSchema });
export type CreateRoomBody = z.input<typeof createRoomSchema>;

export const saveRoomSchema = z.object({ name: roomName.optional(), shell: roomShellSchema.optional(), version });
export type SaveRoomBody = z.input<typeof saveRoomSchema>;

export const createOptionSchema = z.object({
  name: optionName.default(''),
  note: optionNoteSchema.default(''),
  // Duplicate this option's pieces and finishes (it must belong to the same room).
  fromOptionId: z.uuid().optional(),
});
export type CreateOptionBody = z.input<typeof createOptionSchema>;

export const saveOptionSchema = z.object({
  name: optionName.optional(),
  note: optionNoteSchema.optional(),
  doc: optionDocSchema.optional(),
  version,
});
export type SaveOptionBody = z.input<typeof saveOptionSchema>;

export const reorderOptionsSchema = z.object({ optionIds: z.array(z.uuid()).min(1) });

export interface RoomRecord {
  id: string;
  projectId: string;
  name: string;
  position: number;
  shell: RoomShell;
  version: number;
  updatedAt: string;
}

export interface OptionRecord {
  id: string;
  roomId: string;
  name: string;
  note: string;
  position: number;
  doc: OptionDoc;
  version: number;
  updatedAt: string;
  /**
   * In a room's list of options: the client chose it and the project is decided, so it stays as
   * it is (and so do the room's walls and openings) until the project is reopened.
   */
  decided?: boolean;
}

export interface RoomSummary {
  id: string;
  name: string;
  position: number;
  optionCount: number;
  floorAreaM2: number;
  updatedAt: string;
}

/** "Option A", "Option B"… by position, then the option's own name when it has one. */
export function optionLabel(position: number, name: string): string {
  const letter = position < 26 ? String.fromCharCode(65 + position) : String(position + 1);
  return name ? `Option ${letter} · ${name}` : `Option ${letter}`;
}
