// Comparing an option with the others of its room: its budget, unpriced lines, new pieces, fit
// findings (open and seen apart) and the share of floor left free, as the compare table puts them side by side.
import type { RoomShell } from '../schemas/room';
import type { OptionDoc, Piece } from '../schemas/option';
import { boundsMm } from '../geometry/polygon';
import { checkFit } from './fit';
import { sortBySeen } from './seen-findings';
import { blocksWalking, placedBoxes } from './fit/boxes';
import { FREE, WALL, rasteriseFloor } from './fit/floor-grid';
import type { FinishLookup } from './finish-takeoff';
import { buildSchedule } from './schedule-lines';
import type { TakeoffSettings } from './takeoff-settings';

/** Grid cell for measuring free floor, mm: 2 cm keeps the share within a fraction of a per cent. */
export const FREE_FLOOR_CELL_MM = 20;
/**
 * The most cells the free-floor grid may have: a 10 m × 10 m box at 2 cm. A larger room gets
 * coarser cells, so a 1,000 m² room costs what a 100 m² one does (its share, to one decimal, is
 * no less exact: each cell is a smaller part of the floor).
 */
export const MAX_FREE_FLOOR_CELLS = 250_000;

/** The free-floor grid's cell for an outline (plan mm): 20 mm, or coarser to stay within MAX_FREE_FLOOR_CELLS. */
export function freeFloorCellMm(outline: readonly (readonly [number, number])[]): number {
  const { minX, minY, maxX, maxY } = boundsMm(outline);
  return Math.max(FREE_FLOOR_CELL_MM, Math.ceil(Math.sqrt(((maxX - minX) * (maxY - minY)) / MAX_FREE_FLOOR_CELLS)));
}

/**
 * The share (0–1) of a room's floor (plan mm) not under a placed piece one walks round: rugs and
 * pieces mounted overhead leave the floor free, as in the fit check.
 */
export function freeFloorShare(shell: RoomShell, pieces: readonly Piece[]): number {
  const obstacles = placedBoxes(pieces).filter((b) => blocksWalking(b.piece));
  const grid = rasteriseFloor(shell.outline, obstacles, freeFloorCellMm(shell.outline));
  let inside = 0;
  let free = 0;
  for (const label of grid.label) {
    if (label === WALL) continue;
    inside++;
    if (label === FREE) free++;
  }
  return inside === 0 ? 0 : free / inside;
}

export interface OptionComparison {
  budget: number;
  unpricedCount: number;
  newPieceCount: number;
  /** Every finding of the fit check, open or seen. */
  findingCount: number;
  /** Of those, the ones the designer marked as seen and intended. */
  seenFindingCount: number;
  /** Free floor as a percentage, one decimal. */
  freeFloorPercent: number;
}

/** The figures the compare table puts side by side for one option of a room (plan mm). */
export function compareOption(
  shell: RoomShell,
  doc: OptionDoc,
  finishes: FinishLookup,
  settings: TakeoffSettings,
): OptionComparison {
  const { totals } = buildSchedule(shell, doc, finishes, settings);
  const findings = checkFit(shell, doc.pieces);
  return {
    budget: totals.budget,
    unpricedCount: totals.unpricedCount,
    newPieceCount: totals.newPieceCount,
    findingCount: findings.length,
    seenFindingCount: sortBySeen(findings, doc.seen).seen.length,
    freeFloorPercent: Math.round(freeFloorShare(shell, doc.pieces) * 1000) / 10,
  };
}
