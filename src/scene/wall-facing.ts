// Which walls stand between the eye and the room, so the Overview can fade them and the room reads
// like a model. Scene metres, y up; pure so it can be tested without a renderer.

/**
 * A wall fades once the eye's direction from the room centre points this far along its outward
 * normal (cosine). Below it the wall is seen edge-on or from high above and hides little, and
 * fading it would make the room flicker between looks while orbiting.
 */
export const FADE_FACING_MIN = 0.2;

type Vec3 = readonly [number, number, number];

export interface FacingWall {
  index: number;
  /** Horizontal unit vector out of the room, scene axes. */
  outward: Vec3;
}

/**
 * Indices of the walls whose outward normal faces the eye: the dot product of the outward normal
 * with the unit direction from the room centre to the eye (both scene metres) is at least `minFacing`.
 * Looking straight down, the direction is nearly vertical, so no wall fades.
 */
export function wallsFacingEye(walls: readonly FacingWall[], eye: Vec3, roomCentre: Vec3, minFacing = FADE_FACING_MIN): number[] {
  const dx = eye[0] - roomCentre[0];
  const dy = eye[1] - roomCentre[1];
  const dz = eye[2] - roomCentre[2];
  const length = Math.hypot(dx, dy, dz);
  if (length === 0) return [];
  const facing: number[] = [];
  for (const wall of walls) {
    const dot = (wall.outward[0] * dx + wall.outward[1] * dy + wall.outward[2] * dz) / length;
    if (dot >= minFacing) facing.push(wall.index);
  }
  return facing;
}
