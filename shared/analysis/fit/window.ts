// Fit check rule `window-blocked`: placed pieces against a window's wall, under its span, rising
// above its sill and starting below its head.
import { placeOpening } from '../../geometry/openings';
import { layoutShellWalls } from '../../geometry/walls';
import { dot, sub } from '../../geometry/vec';
import type { RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { isWalkedOver } from '../../geometry/piece';
import { TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { capitalise, cmText, theName } from './messages';

/** A piece this close (mm) to a window's wall stands against it: a sofa pushed back, a desk under the window (common practice). */
export const AGAINST_WALL_MM = 150;

/**
 * `window-blocked`: placed boxes (plan mm) against a window's wall, under its span, rising above
 * its sill and starting below its head. Rugs never block a window.
 */
export function findBlockedWindows(shell: RoomShell, boxes: readonly PieceBox[]): Finding[] {
  const walls = layoutShellWalls(shell);
  const findings: Finding[] = [];
  for (const opening of shell.openings) {
    if (opening.type !== 'window') continue;
    const wall = walls[opening.wall];
    if (!wall) continue;
    const window = placeOpening(wall, opening);
    for (const box of boxes) {
      if (isWalkedOver(box.piece)) continue;
      if (box.topMm <= window.sillMm + TOUCH_TOLERANCE_MM || box.bottomMm >= window.headMm - TOUCH_TOLERANCE_MM) continue;
      let nearestMm = Infinity;
      let farthestMm = -Infinity;
      let fromMm = Infinity;
      let toMm = -Infinity;
      for (const corner of box.corners) {
        const offset = sub(corner, wall.start);
        // Distance into the room from the wall's inside face, and position along the wall.
        const inwardMm = -dot(offset, wall.outward);
        nearestMm = Math.min(nearestMm, inwardMm);
        farthestMm = Math.max(farthestMm, inwardMm);
        const alongMm = dot(offset, wall.direction);
        fromMm = Math.min(fromMm, alongMm);
        toMm = Math.max(toMm, alongMm);
      }
      // Wholly behind the wall's face is another room's business (and an outside-room finding).
      if (nearestMm > AGAINST_WALL_MM || farthestMm <= 0) continue;
      if (Math.min(toMm, window.toMm) - Math.max(fromMm, window.fromMm) <= TOUCH_TOLERANCE_MM) continue;
      findings.push({
        kind: 'window-blocked',
        pieces: [box.piece.id],
        openings: [opening.id],
        message: `${capitalise(theName(box.piece))} rises above the window sill (${cmText(window.sillMm)})`,
      });
    }
  }
  return findings;
}
