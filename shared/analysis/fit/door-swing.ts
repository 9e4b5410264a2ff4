// Fit check rule `door-swing`: placed pieces standing in the quarter disc a door's leaf sweeps into
// the room, with the arc drawn as a convex polygon of short straight pieces.
import { doorSwing, type DoorSwing } from '../../geometry/openings';
import { layoutShellWalls } from '../../geometry/walls';
import { addScaled, directionDeg } from '../../geometry/vec';
import type { Door, RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { isWalkedOver } from '../../geometry/piece';
import { convexOverlap, TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { capitalise, theName } from './messages';

/** Straight pieces standing in for the leaf's arc; at 32 the chord falls short of the arc by under 0.12 % of the leaf (1 mm on an 820 mm leaf). */
const ARC_SEGMENTS = 32;

/** The quarter disc a leaf sweeps (plan mm) as a convex polygon: hinge, then the arc from closed to open. */
export function swingSector(swing: DoorSwing): [number, number][] {
  const sector: [number, number][] = [swing.hingeMm];
  for (let k = 0; k <= ARC_SEGMENTS; k++) {
    const angleDeg = swing.closedAngleDeg + (swing.sweepDeg * k) / ARC_SEGMENTS;
    sector.push(addScaled(swing.hingeMm, directionDeg(angleDeg), swing.leafLengthMm));
  }
  return sector;
}

/** A door that opens into the room, with its leaf's sweep and the quarter disc it covers (plan mm). */
export interface InwardSwing {
  door: Door;
  swing: DoorSwing;
  sector: [number, number][];
}

/** Every door of the shell that swings into the room, on a wall the outline has. */
export function inwardSwings(shell: RoomShell): InwardSwing[] {
  const walls = layoutShellWalls(shell);
  const found: InwardSwing[] = [];
  for (const opening of shell.openings) {
    if (opening.type !== 'door' || opening.swing !== 'in') continue;
    const wall = walls[opening.wall];
    if (!wall) continue;
    const swing = doorSwing(wall, opening);
    found.push({ door: opening, swing, sector: swingSector(swing) });
  }
  return found;
}

/**
 * `door-swing`: placed boxes (plan mm) below a door's head that stand in the quarter disc its leaf
 * sweeps into this room. Doors opening out sweep the next room, which this check cannot see. Rugs
 * are left out: interior doors are trimmed to pass over floor coverings (common practice).
 */
export function findDoorSwings(shell: RoomShell, boxes: readonly PieceBox[]): Finding[] {
  const findings: Finding[] = [];
  for (const { door: opening, swing, sector } of inwardSwings(shell)) {
    for (const box of boxes) {
      if (isWalkedOver(box.piece) || box.bottomMm >= opening.height) continue;
      // The sector lies within a leaf's length of the hinge and the box within its half-diagonal of
      // its centre: further apart than both (and a millimetre), they cannot meet.
      const apartMm = Math.hypot(box.centre[0] - swing.hingeMm[0], box.centre[1] - swing.hingeMm[1]);
      if (apartMm > swing.leafLengthMm + Math.hypot(box.halfWidthMm, box.halfDepthMm) + TOUCH_TOLERANCE_MM) continue;
      if (!convexOverlap(box.corners, sector)) continue;
      findings.push({
        kind: 'door-swing',
        pieces: [box.piece.id],
        openings: [opening.id],
        message: `${capitalise(theName(box.piece))} stands in the door’s swing`,
      });
    }
  }
  return findings;
}
