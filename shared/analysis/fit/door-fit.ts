// Fit check rule `too-big-for-door`: whether each placed piece can be carried through one of the
// room's doors or passages, with the carry allowance and the clear width a door's leaf loses.
import type { Opening, RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { isWalkedOver } from '../../geometry/piece';
import type { PieceBox } from './boxes';
import { capitalise, theName, wholeCm } from './messages';

/** Room (mm) to spare on each measure when carrying a piece through: hands and a blanket round it (common practice). */
export const CARRY_ALLOWANCE_MM = 10;
/**
 * How much narrower a door's clear opening is than its leaf (mm): the open leaf and its stop stand
 * in the opening. A 34 in leaf gives a nominal 32 in clear opening (HUD Fair Housing Accessibility
 * Guidelines, 24 CFR 100), so 2 in × 25.4 mm (derived). A passage has no leaf and loses nothing.
 */
export const DOOR_LEAF_CLEAR_LOSS_MM = 2 * 25.4;

/** Clear width and height (mm) a piece can be carried through; a door's width is its leaf's (the plan file's rule, README). */
export function clearPassMm(opening: Opening): { widthMm: number; heightMm: number } {
  const loss = opening.type === 'door' ? DOOR_LEAF_CLEAR_LOSS_MM : 0;
  return { widthMm: opening.width - loss, heightMm: opening.height };
}

/**
 * Whether a box of the given sizes (mm) passes an opening of the given clear sizes (mm). It may be
 * carried on its side or on end, so its two smallest measures must fit across and up, one way or
 * the other. This ignores turning it round corners in a hallway or a stair: a known simplification.
 */
export function passesThrough(sizesMm: readonly [number, number, number], clear: { widthMm: number; heightMm: number }): boolean {
  const sorted: [number, number, number] = [...sizesMm];
  const [a, b] = sorted.sort((x, y) => x - y);
  const across = clear.widthMm - CARRY_ALLOWANCE_MM;
  const up = clear.heightMm - CARRY_ALLOWANCE_MM;
  return (a <= across && b <= up) || (b <= across && a <= up);
}

/**
 * `too-big-for-door`: placed pieces (mm) that pass through none of the room's doors and passages.
 * A room with no door or passage is left alone: there is no way in to judge. Rugs roll up.
 */
export function findTooBigForDoor(shell: RoomShell, boxes: readonly PieceBox[]): Finding[] {
  const ways = shell.openings.filter((opening) => opening.type !== 'window' && opening.wall < shell.outline.length);
  if (ways.length === 0) return [];
  const findings: Finding[] = [];
  for (const box of boxes) {
    const { piece } = box;
    if (isWalkedOver(piece)) continue;
    const sizes: [number, number, number] = [piece.width, piece.depth, piece.height];
    if (ways.some((way) => passesThrough(sizes, clearPassMm(way)))) continue;
    const listed = [...sizes].sort((x, y) => x - y).map(wholeCm);
    findings.push({
      kind: 'too-big-for-door',
      pieces: [piece.id],
      openings: ways.map((way) => way.id).sort(),
      message: `${capitalise(theName(piece))} (${listed.join(' × ')} cm) will not pass through any door of this room in one piece`,
    });
  }
  return findings;
}
