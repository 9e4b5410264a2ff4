// Shared by the outline commands: what happens to openings, thickness overrides and wall finishes
// when corners move, appear or disappear.
//
// The rule for openings: an opening's offset is a measurement from its wall's start corner, so a
// command keeps it. When the wall has become too short to hold the opening where it is, the opening
// slides back towards the start corner until it fits; when it cannot fit at all, the command is
// refused (the designer removes or narrows the opening first).
import { CORNER_MARGIN_MM } from '../geometry/tolerances';
import { itemAt } from '../item-at';
import { distance, dot, normalise, sub, addScaled, type Vec2 } from '../geometry/vec';
import type { OptionDoc } from '../schemas/option';
import type { Opening, PlanPoint, RoomShell } from '../schemas/room';
import type { Checked } from './command';
import type { EditorDoc } from './editor-doc';

/** How an opening reads in a message: "door d1". */
export function openingWords(opening: Opening): string {
  return `${opening.type} ${opening.id}`;
}

function mm(value: number): string {
  return `${Number(value.toFixed(1))} mm`;
}

/** Length in mm of wall `wall` of a plan outline (mm). */
export function wallLengthMm(outline: readonly Vec2[], wall: number): number {
  return distance(itemAt(outline, wall, 'corner'), itemAt(outline, (wall + 1) % outline.length, 'corner'));
}

/**
 * Openings refitted to a new plan outline (mm) by the keep-the-offset rule above. Returns the same
 * array when nothing had to move, so unchanged shells stay shared.
 */
export function refitOpenings(openings: readonly Opening[], outline: readonly PlanPoint[]): Checked<Opening[]> {
  let changed = false;
  const refitted: Opening[] = [];
  for (const opening of openings) {
    if (opening.wall >= outline.length) {
      return {
        ok: false,
        reason: `${openingWords(opening)} is on wall ${opening.wall}, which the new outline does not have (remove it first)`,
      };
    }
    const lengthMm = wallLengthMm(outline, opening.wall);
    const latestOffsetMm = lengthMm - CORNER_MARGIN_MM - opening.width;
    if (latestOffsetMm < CORNER_MARGIN_MM) {
      return {
        ok: false,
        reason: `${openingWords(opening)} (${mm(opening.width)} wide) would no longer fit on wall ${opening.wall} (${mm(lengthMm)} long)`,
      };
    }
    if (opening.offset > latestOffsetMm) {
      refitted.push({ ...opening, offset: latestOffsetMm });
      changed = true;
    } else {
      refitted.push(opening);
    }
  }
  return { ok: true, value: changed ? refitted : (openings as Opening[]) };
}

/**
 * For each wall of the new outline, the old walls whose settings (thickness override, finish) it
 * inherits, first choice first. Corner insertions and removals renumber walls with it.
 */
export type WallSources = readonly (readonly number[])[];

/** Wall sources after splitting wall `wall` of an outline of `count` walls in two: both halves inherit it. */
export function sourcesAfterSplit(count: number, wall: number): WallSources {
  const sources: number[][] = [];
  for (let j = 0; j <= count; j++) sources.push([j <= wall ? j : j - 1]);
  return sources;
}

/** New index of old corner `corner` after removing corner `removed` (any other corner). */
export function cornerAfterRemoval(corner: number, removed: number): number {
  return corner < removed ? corner : corner - 1;
}

/** New index of old wall `wall` after removing corner `removed` of `count`: the two walls meeting there merge. */
export function wallAfterRemoval(wall: number, removed: number, count: number): number {
  const previous = (removed + count - 1) % count;
  return cornerAfterRemoval(wall === removed ? previous : wall, removed);
}

/** Wall sources after removing corner `removed` of `count`: the merged wall prefers the wall that ended at it. */
export function sourcesAfterRemoval(count: number, removed: number): WallSources {
  const sources: number[][] = Array.from({ length: count - 1 }, () => []);
  const previous = (removed + count - 1) % count;
  // The wall ending at the removed corner goes first so the merged wall keeps its settings.
  const order = [previous, ...Array.from({ length: count }, (_, j) => j).filter((j) => j !== previous)];
  for (const j of order) itemAt(sources, wallAfterRemoval(j, removed, count), 'wall').push(j);
  return sources;
}

/** Per-wall thickness overrides (mm) renumbered by wall sources; trailing empty entries are trimmed. */
export function remapThicknesses(thicknesses: RoomShell['wallThicknesses'], sources: WallSources): RoomShell['wallThicknesses'] {
  if (thicknesses === undefined) return undefined;
  const remapped = sources.map((from) => from.map((j) => thicknesses[j] ?? null).find((t) => t !== null) ?? null);
  while (remapped.length > 0 && remapped[remapped.length - 1] === null) remapped.pop();
  return remapped.length > 0 ? remapped : undefined;
}

/** An option's wall finish overrides renumbered by wall sources; the same option when it has none. */
export function remapWallFinishes(option: OptionDoc, sources: WallSources): OptionDoc {
  const overrides = option.finishes.wallOverrides;
  if (Object.keys(overrides).length === 0) return option;
  const remapped: Record<string, string> = {};
  sources.forEach((from, wall) => {
    const finishId = from.map((j) => overrides[String(j)]).find((f) => f !== undefined);
    if (finishId !== undefined) remapped[String(wall)] = finishId;
  });
  return { ...option, finishes: { ...option.finishes, wallOverrides: remapped } };
}

/** Every option's wall finish overrides renumbered by wall sources. */
export function remapAllWallFinishes(options: EditorDoc['options'], sources: WallSources): EditorDoc['options'] {
  const remapped: Record<string, OptionDoc> = {};
  for (const [optionId, option] of Object.entries(options)) remapped[optionId] = remapWallFinishes(option, sources);
  return remapped;
}

/** Where the middle of an opening on an old wall falls along a new wall, as the new offset (mm) of its near edge. */
export function reprojectOffsetMm(opening: Opening, oldStart: Vec2, oldEnd: Vec2, newStart: Vec2, newEnd: Vec2): number {
  const middle = addScaled(oldStart, normalise(sub(oldEnd, oldStart)), opening.offset + opening.width / 2);
  return dot(sub(middle, newStart), normalise(sub(newEnd, newStart))) - opening.width / 2;
}
