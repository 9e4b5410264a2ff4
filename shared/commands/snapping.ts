// Pure snapping helpers for the plan (mm, x right, y down; angles degrees clockwise seen from above).
// The editor calls them while a piece is dragged and then applies the commands they suggest.
import { layoutShellWalls, type WallLayout } from '../geometry/walls';
import { addScaled, dot, sub } from '../geometry/vec';
import type { Piece } from '../schemas/option';
import type { PlanPoint, RoomShell } from '../schemas/room';
import { normaliseRotationDeg, pieceBoundsMm, pieceFootprintMm, type PiecePose } from '../geometry/piece';

/** Plan grid spacing in mm: 10 cm is fine enough to lay out furniture and coarse enough to hit (common practice). */
export const DEFAULT_GRID_MM = 100;
/** Turns snap to this many degrees: 15° gives the right angles and the 45° and 30° splays rooms have (common practice). */
export const DEFAULT_ANGLE_STEP_DEG = 15;
/** A piece this close (mm) to a wall's inside face is pushed flush against it (common practice). */
export const WALL_SNAP_TOLERANCE_MM = 100;
/** A piece edge this close (mm) to another piece's edge lines up with it (common practice). */
export const PIECE_SNAP_TOLERANCE_MM = 50;
/** One arrow-key nudge in mm, and a large one (common practice). */
export const NUDGE_STEP_MM = 10;
export const NUDGE_LARGE_STEP_MM = 100;

function roundToStep(value: number, step: number): number {
  // Adding 0 turns a −0 from rounding a small negative value into 0.
  return Math.round(value / step) * step + 0;
}

/** A plan point (mm) moved to the nearest grid crossing; a grid of 0 or less leaves it where it is. */
export function snapToGrid(point: PlanPoint, gridMm: number = DEFAULT_GRID_MM): PlanPoint {
  if (!(gridMm > 0) || !Number.isFinite(gridMm)) return point;
  return [roundToStep(point[0], gridMm), roundToStep(point[1], gridMm)];
}

/** An angle in degrees rounded to the nearest step and folded into [0, 360). */
export function snapAngle(angleDeg: number, stepDeg: number = DEFAULT_ANGLE_STEP_DEG): number {
  if (!(stepDeg > 0) || !Number.isFinite(stepDeg)) return normaliseRotationDeg(angleDeg);
  return normaliseRotationDeg(roundToStep(angleDeg, stepDeg));
}

/** A piece moved by (dx, dy) plan mm. */
export function nudge<P extends Pick<Piece, 'x' | 'y'>>(piece: P, dxMm: number, dyMm: number): P {
  return { ...piece, x: piece.x + dxMm, y: piece.y + dyMm };
}

/** The piece after snapping to a wall, and which wall (null when none was close enough). */
export interface WallSnap<P> {
  piece: P;
  wall: number | null;
}

/** The turn (degrees clockwise) that points a piece's front, its own +y, along a plan direction. */
function rotationFacingDeg(direction: readonly [number, number]): number {
  // A piece's front after turning by θ is (−sin θ, cos θ), so θ = atan2(−dx, dy).
  return normaliseRotationDeg((Math.atan2(-direction[0], direction[1]) * 180) / Math.PI);
}

/**
 * When a piece (plan mm) comes within toleranceMm of a wall's inside face, either side, puts its back
 * flush against that face and turns it to face into the room, keeping its place along the wall. The
 * nearest wall wins; the piece's centre must be in front of the wall and alongside it.
 */
export function snapPieceToWalls<P extends PiecePose>(
  piece: P,
  shell: Pick<RoomShell, 'outline' | 'wallThickness' | 'wallThicknesses'>,
  toleranceMm: number = WALL_SNAP_TOLERANCE_MM,
): WallSnap<P> {
  const corners = pieceFootprintMm(piece);
  const walls = layoutShellWalls(shell);
  let best: { wall: WallLayout; gapMm: number; alongMm: number; inward: [number, number] } | null = null;
  for (const wall of walls) {
    const inward: [number, number] = [-wall.outward[0], -wall.outward[1]];
    const centre = sub([piece.x, piece.y], wall.start);
    const alongMm = dot(centre, wall.direction);
    if (dot(centre, inward) <= 0 || alongMm < 0 || alongMm > wall.lengthMm) continue;
    const gapMm = Math.min(...corners.map((c) => dot(sub(c, wall.start), inward)));
    if (Math.abs(gapMm) > toleranceMm) continue;
    if (best === null || Math.abs(gapMm) < Math.abs(best.gapMm)) best = { wall, gapMm, alongMm, inward };
  }
  if (best === null) return { piece, wall: null };
  const wall = best.wall;
  const [x, y] = addScaled(addScaled(wall.start, wall.direction, best.alongMm), best.inward, piece.depth / 2);
  return { piece: { ...piece, x, y, rotation: rotationFacingDeg(best.inward) }, wall: wall.index };
}

/** Which other piece an axis snapped to, and the plan line (x or y, mm) the two edges now share. */
export interface EdgeSnap {
  pieceId: string;
  lineMm: number;
}

/** The piece after lining up with other pieces, and what it lined up with on each axis. */
export interface PieceSnap<P> {
  piece: P;
  x: EdgeSnap | null;
  y: EdgeSnap | null;
}

type Axis = 'x' | 'y';

function nearestEdge(
  moving: { min: number; max: number },
  others: readonly { id: string; min: number; max: number }[],
  toleranceMm: number,
): { shiftMm: number; snap: EdgeSnap } | null {
  let best: { shiftMm: number; snap: EdgeSnap } | null = null;
  for (const other of others) {
    // Butting up against either side of the other piece, or lining up with either of its edges.
    const candidates: [number, number][] = [
      [other.min - moving.max, other.min],
      [other.max - moving.min, other.max],
      [other.min - moving.min, other.min],
      [other.max - moving.max, other.max],
    ];
    for (const [shiftMm, lineMm] of candidates) {
      if (Math.abs(shiftMm) > toleranceMm) continue;
      if (best === null || Math.abs(shiftMm) < Math.abs(best.shiftMm)) best = { shiftMm, snap: { pieceId: other.id, lineMm } };
    }
  }
  return best;
}

/**
 * Lines a piece (plan mm) up with other placed pieces: on each axis independently, the nearest edge
 * of another piece's plan box within toleranceMm of one of this piece's edges pulls it level. Pieces
 * in the holding area and the piece itself are ignored.
 */
export function snapPieceToPieces<P extends PiecePose & Pick<Piece, 'id'>>(
  piece: P,
  others: readonly Piece[],
  toleranceMm: number = PIECE_SNAP_TOLERANCE_MM,
): PieceSnap<P> {
  const own = pieceBoundsMm(piece);
  const boxes = others
    .filter((o) => o.id !== piece.id && o.placed !== false)
    .map((o) => ({ id: o.id, bounds: pieceBoundsMm(o) }));
  const along = (axis: Axis) =>
    nearestEdge(
      axis === 'x' ? { min: own.minX, max: own.maxX } : { min: own.minY, max: own.maxY },
      boxes.map((b) =>
        axis === 'x'
          ? { id: b.id, min: b.bounds.minX, max: b.bounds.maxX }
          : { id: b.id, min: b.bounds.minY, max: b.bounds.maxY },
      ),
      toleranceMm,
    );
  const x = along('x');
  const y = along('y');
  return {
    piece: { ...piece, x: piece.x + (x?.shiftMm ?? 0), y: piece.y + (y?.shiftMm ?? 0) },
    x: x?.snap ?? null,
    y: y?.snap ?? null,
  };
}
