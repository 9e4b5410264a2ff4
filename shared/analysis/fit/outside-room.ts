// Fit check rule `outside-room`: placed pieces with a corner outside the room's outline or a wall
// running through them; a piece flush with a wall counts as inside.
import type { RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { pointInPolygon } from '../../geometry/polygon';
import { distanceToSegmentMm, segmentCrossesConvex, TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { capitalise, theName } from './messages';
import type { Vec2 } from '../../geometry/vec';

function cornerOutside(corner: Vec2, outline: readonly Vec2[]): boolean {
  if (pointInPolygon(corner, outline)) return false;
  // A corner on the wall face (flush, or lost in rounding) is inside for the designer.
  for (let i = 0; i < outline.length; i++) {
    if (distanceToSegmentMm(corner, outline[i]!, outline[(i + 1) % outline.length]!) <= TOUCH_TOLERANCE_MM) return false;
  }
  return true;
}

/**
 * `outside-room`: placed boxes (plan mm) with a corner outside the outline or a wall running through
 * them (the inside corner of an L poking into a piece). A piece flush with a wall, within
 * TOUCH_TOLERANCE_MM, is inside.
 */
export function findOutsideRoom(shell: Pick<RoomShell, 'outline'>, boxes: readonly PieceBox[]): Finding[] {
  const outline = shell.outline;
  const findings: Finding[] = [];
  for (const box of boxes) {
    // A wall further from the box's centre than its half-diagonal (and a millimetre) cannot run through it.
    const reachMm = Math.hypot(box.halfWidthMm, box.halfDepthMm) + TOUCH_TOLERANCE_MM;
    const crossesWall = outline.some((start, i) => {
      const end = outline[(i + 1) % outline.length]!;
      return (
        distanceToSegmentMm(box.centre, start, end) <= reachMm &&
        segmentCrossesConvex(start, end, box.corners, TOUCH_TOLERANCE_MM)
      );
    });
    const outsideCorners = box.corners.filter((corner) => cornerOutside(corner, outline)).length;
    if (!crossesWall && outsideCorners === 0) continue;
    const wholly = !crossesWall && outsideCorners === box.corners.length;
    findings.push({
      kind: 'outside-room',
      pieces: [box.piece.id],
      openings: [],
      message: `${capitalise(theName(box.piece))} stands ${wholly ? 'outside' : 'partly outside'} the room`,
    });
  }
  return findings;
}
