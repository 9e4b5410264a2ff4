// Fit check rule `overlap`: pairs of placed pieces that share floor area and height; rugs never count,
// pieces stacked apart in height are fine, and so is a piece standing on another.
import type { Finding } from './finding';
import { isWalkedOver } from '../../geometry/piece';
import { convexOverlap, standsOn, TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { capitalise, theName } from './messages';

/**
 * `overlap`: pairs of placed boxes (plan mm) that share floor area and height. Rugs (walked over,
 * geometry/piece) never count: a rug lies under furniture (common practice). Pieces stacked apart in height (a wall cabinet above
 * a sideboard) are fine, and so is a piece standing on another (boxes: standsOn, a lamp a few
 * millimetres into a table top).
 */
export function findOverlaps(boxes: readonly PieceBox[]): Finding[] {
  const solid = boxes.filter((box) => !isWalkedOver(box.piece));
  const halfDiagonalMm = solid.map((box) => Math.hypot(box.halfWidthMm, box.halfDepthMm));
  const findings: Finding[] = [];
  for (let i = 0; i < solid.length; i++) {
    for (let j = i + 1; j < solid.length; j++) {
      const a = solid[i]!;
      const b = solid[j]!;
      const sharedHeightMm = Math.min(a.topMm, b.topMm) - Math.max(a.bottomMm, b.bottomMm);
      if (sharedHeightMm <= TOUCH_TOLERANCE_MM) continue;
      // A cheap distance test first: boxes further apart than their half-diagonals cannot meet.
      const reachMm = halfDiagonalMm[i]! + halfDiagonalMm[j]!;
      if (Math.hypot(a.centre[0] - b.centre[0], a.centre[1] - b.centre[1]) >= reachMm) continue;
      if (!convexOverlap(a.corners, b.corners) || standsOn(a, b) || standsOn(b, a)) continue;
      const [first, second] = a.piece.id <= b.piece.id ? [a.piece, b.piece] : [b.piece, a.piece];
      findings.push({
        kind: 'overlap',
        pieces: [first.id, second.id],
        openings: [],
        message: `${capitalise(theName(first))} and ${theName(second)} overlap`,
      });
    }
  }
  return findings;
}
