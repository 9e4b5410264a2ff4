// Openings placed on their walls in plan mm: where a door, window or passage's edges fall on the
// inside and outside faces, sill heights, and the arc a door leaf sweeps.
import type { Door, Opening, RoomShell } from '../schemas/room';
import { layoutShellWalls, type WallLayout } from './walls';
import { addScaled, angleDegOf, directionDeg, normaliseAngleDeg, type Vec2 } from './vec';

/** An opening placed on its wall, in plan mm. "Start" is the edge nearer the wall's start corner. */
export interface OpeningPlacement {
  id: string;
  type: Opening['type'];
  wall: number;
  /** Along the wall's inside face from its start corner, mm. */
  fromMm: number;
  toMm: number;
  /** Bottom and top of the hole above the floor, mm (doors and passages start at 0). */
  sillMm: number;
  headMm: number;
  insideStart: [number, number];
  insideEnd: [number, number];
  outsideStart: [number, number];
  outsideEnd: [number, number];
}

/** Height of an opening's bottom edge above the floor, mm. */
export function sillHeightMm(opening: Opening): number {
  return opening.type === 'window' ? opening.sill : 0;
}

/** Where an opening's edges fall on the inside and outside faces of its wall, plan mm. */
export function placeOpening(wall: WallLayout, opening: Opening): OpeningPlacement {
  const fromMm = opening.offset;
  const toMm = opening.offset + opening.width;
  const insideStart = addScaled(wall.start, wall.direction, fromMm);
  const insideEnd = addScaled(wall.start, wall.direction, toMm);
  const sillMm = sillHeightMm(opening);
  return {
    id: opening.id,
    type: opening.type,
    wall: wall.index,
    fromMm,
    toMm,
    sillMm,
    headMm: sillMm + opening.height,
    insideStart,
    insideEnd,
    // Reveals run square through the wall, so the outside edges sit straight out from the inside ones.
    outsideStart: addScaled(insideStart, wall.outward, wall.thicknessMm),
    outsideEnd: addScaled(insideEnd, wall.outward, wall.thicknessMm),
  };
}

/**
 * How far a door leaf stands open from closed, degrees: drawn open square to the wall, a usual
 * resting position for an interior door (common practice, no source). The 3D leaf, the walk's
 * collisions and the plan's swing all read it through doorSwing.
 */
export const DOOR_OPEN_ANGLE_DEG = 90;

/** A door leaf's sweep in plan mm; angles are degrees clockwise on the plan from +x. */
export interface DoorSwing {
  openingId: string;
  /** The hinge: on the inside face for a door swinging in, on the outside face for one swinging out. */
  hingeMm: [number, number];
  leafLengthMm: number;
  /** Direction of the closed leaf (across the opening). */
  closedAngleDeg: number;
  /** Direction of the leaf opened to DOOR_OPEN_ANGLE_DEG (into the room or out of it). */
  openAngleDeg: number;
  /** openAngleDeg − closedAngleDeg: positive sweeps clockwise on the plan, negative anticlockwise. */
  sweepDeg: number;
  /** The leaf's free end when closed and when open, plan mm. */
  closedTipMm: [number, number];
  openTipMm: [number, number];
  side: Door['swing'];
}

/** The arc a door leaf sweeps from closed to open at DOOR_OPEN_ANGLE_DEG, in plan mm. */
export function doorSwing(wall: WallLayout, door: Door): DoorSwing {
  const placement = placeOpening(wall, door);
  const outside = door.swing === 'out';
  const hingeMm =
    door.hinge === 'start'
      ? outside
        ? placement.outsideStart
        : placement.insideStart
      : outside
        ? placement.outsideEnd
        : placement.insideEnd;
  const closed: Vec2 = door.hinge === 'start' ? wall.direction : [-wall.direction[0], -wall.direction[1]];
  const away: Vec2 = outside ? wall.outward : [-wall.outward[0], -wall.outward[1]];
  // closed and away are perpendicular, so their cross product is ±1 and names the sweep direction.
  const sweepDeg = closed[0] * away[1] - closed[1] * away[0] > 0 ? DOOR_OPEN_ANGLE_DEG : -DOOR_OPEN_ANGLE_DEG;
  const closedAngleDeg = angleDegOf(closed);
  const openAngleDeg = normaliseAngleDeg(closedAngleDeg + sweepDeg);
  const open = directionDeg(openAngleDeg);
  return {
    openingId: door.id,
    hingeMm,
    leafLengthMm: door.width,
    closedAngleDeg,
    openAngleDeg,
    sweepDeg,
    closedTipMm: addScaled(hingeMm, closed, door.width),
    openTipMm: addScaled(hingeMm, open, door.width),
    side: door.swing,
  };
}

/** Every opening of a room shell placed on its wall, and every door's swing, in plan mm (openings on missing walls are left out). */
export function placeShellOpenings(shell: Pick<RoomShell, 'outline' | 'wallThickness' | 'wallThicknesses' | 'openings'>): {
  placements: OpeningPlacement[];
  swings: DoorSwing[];
} {
  const walls = layoutShellWalls(shell);
  const placements: OpeningPlacement[] = [];
  const swings: DoorSwing[] = [];
  for (const opening of shell.openings) {
    const wall = walls[opening.wall];
    if (!wall) continue;
    placements.push(placeOpening(wall, opening));
    if (opening.type === 'door') swings.push(doorSwing(wall, opening));
  }
  return { placements, swings };
}
