// Fit check safety rules by what a piece is: `climbable-near-window` (in a room marked as a child's,
// a piece a child can climb standing under or beside a window) and `tall-not-fixed` (tall storage
// not marked as fixed to the wall). Each message ends with the caution that local codes and
// licensed professionals come first. Plan mm.
import { placeOpening } from '../../geometry/openings';
import { layoutShellWalls } from '../../geometry/walls';
import type { PieceKind } from '../../schemas/piece-kind';
import type { RoomShell } from '../../schemas/room';
import { MM_PER_INCH } from '../../units/length';
import { closestPair, type PieceBox } from './boxes';
import type { Finding } from './finding';
import { capitalise, cmText, theName } from './messages';

/** The caution every safety finding ends with: the check is a reminder, not a safety assessment. */
export const SAFETY_CAUTION = 'Check local codes and ask a licensed professional where it matters.';

/**
 * Pieces a small child can climb: seats, beds and cots, low tables and low storage with drawers or
 * shelves to step on (common practice; CPSC window safety and IRC R312.2 ask that climbable
 * furniture be kept away from windows).
 */
export const CLIMBABLE_KINDS: ReadonlySet<PieceKind> = new Set<PieceKind>([
  'sofa',
  'corner-sofa',
  'armchair',
  'dining-chair',
  'stool',
  'bench',
  'ottoman',
  'coffee-table',
  'side-table',
  'bedside-table',
  'desk',
  'bed',
  'cot',
  'chest-of-drawers',
  'sideboard',
  'media-unit',
  'open-shelving',
  'bookcase',
]);

/**
 * A window's sill must stand at least 24 in above the floor where it has no opening limiter or guard
 * (IRC 2012+ R312.2.1, window fall protection, which prints it as 610 mm; docs/references.md):
 * standing on a piece, a child's floor is the piece's top, so a sill less than this above it is
 * within reach.
 */
export const SAFE_SILL_ABOVE_MM = 24 * MM_PER_INCH;

/** A piece this close (mm) on plan to a window's opening is within a child's reach of it: an arm and a lean (common practice). */
export const CLIMB_REACH_MM = 600;

/**
 * Storage at least 27 in tall can tip onto a child and should be fixed to the wall: the height from
 * which US CPSC's clothing storage rule applies (16 CFR 1261, adopting ASTM F2057-23, from 1 Sept
 * 2023; CPSC's guidance on clothing storage units, docs/references.md). CPSC "Anchor It!" asks the
 * same of bookcases and shelving, so the same height is used for them.
 */
export const TIP_OVER_HEIGHT_MM = 27 * MM_PER_INCH;

/** Freestanding storage that tips when climbed or when its drawers are all pulled out. */
export const TALL_STORAGE_KINDS: ReadonlySet<PieceKind> = new Set<PieceKind>([
  'wardrobe',
  'chest-of-drawers',
  'bookcase',
  'open-shelving',
]);

/** Whether the designer may mark a piece as fixed to the wall: tall storage, standing on the floor. */
export function isTallStorage(piece: Pick<PieceBox['piece'], 'kind' | 'height' | 'elevation'>): boolean {
  return (
    piece.kind !== undefined && TALL_STORAGE_KINDS.has(piece.kind) && piece.elevation === 0 && piece.height >= TIP_OVER_HEIGHT_MM
  );
}

/** `tall-not-fixed`: placed tall storage (isTallStorage) the designer has not marked as fixed to the wall. */
export function findTallNotFixed(boxes: readonly PieceBox[]): Finding[] {
  return boxes
    .filter((box) => isTallStorage(box.piece) && box.piece.fixedToWall !== true)
    .map((box) => ({
      kind: 'tall-not-fixed' as const,
      pieces: [box.piece.id],
      openings: [],
      message: `${capitalise(theName(box.piece))} (${cmText(box.piece.height)} tall) is not marked as fixed to the wall: furniture this tall can tip over onto a child. Fix it with an anchoring kit as its maker directs. ${SAFETY_CAUTION}`,
    }));
}

/**
 * `climbable-near-window`: in a room marked as a child's, placed climbable pieces (CLIMBABLE_KINDS)
 * on the floor within CLIMB_REACH_MM of a window's opening on plan, whose top stands less than
 * SAFE_SILL_ABOVE_MM below its sill.
 */
export function findClimbableNearWindows(shell: RoomShell, boxes: readonly PieceBox[]): Finding[] {
  if (!shell.childRoom) return [];
  const climbable = boxes.filter((box) => box.piece.kind && CLIMBABLE_KINDS.has(box.piece.kind) && box.piece.elevation === 0);
  if (climbable.length === 0) return [];
  const walls = layoutShellWalls(shell);
  const findings: Finding[] = [];
  for (const opening of shell.openings) {
    if (opening.type !== 'window') continue;
    const wall = walls[opening.wall];
    if (!wall) continue;
    const window = placeOpening(wall, opening);
    for (const box of climbable) {
      const aboveTopMm = window.sillMm - box.topMm;
      if (aboveTopMm >= SAFE_SILL_ABOVE_MM) continue;
      if (closestPair(box.corners, [window.insideStart, window.insideEnd]).distanceMm > CLIMB_REACH_MM) continue;
      const where =
        aboveTopMm <= 0 ? 'rises above the window sill' : `stands ${cmText(aboveTopMm)} below the window sill, within reach`;
      findings.push({
        kind: 'climbable-near-window',
        pieces: [box.piece.id],
        openings: [opening.id],
        message: `${capitalise(theName(box.piece))} ${where}: a child can climb it to the window. Move it away, or fit window guards or opening limiters. ${SAFETY_CAUTION}`,
      });
    }
  }
  return findings;
}
