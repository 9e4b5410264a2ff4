// The fit check as it stood before the speed work, frozen: the bench times it beside today's and
// tests/reference/fit-reference.test.ts checks both give the same findings. Do not edit.
import type { RoomShell } from '../../../shared/schemas/room';
import type { Finding } from '../../../shared/analysis/fit/finding';
import { distanceToSegmentMm, segmentCrossesConvex, TOUCH_TOLERANCE_MM, type PieceBox } from '../../../shared/analysis/fit/boxes';
import { pointInPolygon } from '../../../shared/geometry/polygon';
import { capitalise, theName } from '../../../shared/analysis/fit/messages';
import type { Vec2 } from '../../../shared/geometry/vec';

function cornerOutside(corner: Vec2, outline: readonly Vec2[]): boolean {
  if (pointInPolygon(corner, outline)) return false;
  // A corner on the wall face (flush, or lost in rounding) is inside for the designer.
  for (let i = 0; i < outline.length; i++) {
    if (distanceToSegmentMm(corner, outline[i], outline[(i + 1) % outline.length]) <= TOUCH_TOLERANCE_MM) return false;
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
    const crossesWall = outline.some((start, i) =>
      segmentCrossesConvex(start, outline[(i + 1) % outline.length], box.corners, TOUCH_TOLERANCE_MM),
    );
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
