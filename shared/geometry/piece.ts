// What a piece occupies on the plan and how a person meets it: its footprint (a box turned about its
// centre), whether it is walked over (a rug, or anything lying flat) or under (hung above head
// height), and the heights that decide it. The fit check, the walk-through, the plan and the scene
// all read this one definition. Plan mm, x right, y down; rotation in degrees clockwise seen from above.
import type { Piece } from '../schemas/option';

/** The parts of a piece that fix where its box stands on the plan (mm, degrees clockwise seen from above). */
export type PiecePose = Pick<Piece, 'x' | 'y' | 'width' | 'depth' | 'rotation'>;

/** The parts of a piece that decide whether a person walks over it, under it or round it. */
export type PieceReach = Pick<Piece, 'kind' | 'height' | 'elevation'>;

/**
 * A piece this thin or thinner (mm) lies flat on the floor and is walked over, whatever its kind: a
 * mat or a rug entered without a kind (common practice: a rug is 5–20 mm thick).
 */
export const FLAT_MAX_HEIGHT_MM = 20;

/**
 * Clear headroom a person walks under without stooping (mm): 2.0 m, the headroom Approved Document K
 * (England, 2013 edition, Section 1 "Headroom for stairs") asks over stairs and landings. A piece
 * whose underside is at least this high (a high shelf, a pendant hung high) is walked under; any
 * lower (a wall cabinet at 1,400 mm, a pendant at 1,500 mm) is walked round.
 */
export const HEAD_CLEARANCE_MM = 2000;

/** Turns this close (degrees) to a full turn are taken as none. */
const FULL_TURN_TOLERANCE_DEG = 1e-9;

/** An axis-aligned box on the plan, mm. */
export interface PlanBounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** A piece's box on the plan (mm): its centre, its own axes as unit vectors, and its half sizes. */
export interface PiecePlanBox {
  centre: [number, number];
  /** The piece's own x (its width) on the plan. */
  axisX: [number, number];
  /** The piece's own y (its depth, towards its front) on the plan: x turned 90° clockwise. */
  axisY: [number, number];
  halfWidthMm: number;
  halfDepthMm: number;
}

/** A rotation in degrees folded into [0, 360), with −0 written as 0. */
export function normaliseRotationDeg(rotationDeg: number): number {
  const folded = ((rotationDeg % 360) + 360) % 360;
  // 359.9999999999 left by floating point is a full turn, not a hair short of one.
  return 360 - folded < FULL_TURN_TOLERANCE_DEG ? 0 : folded;
}

/** Plan direction (unit, mm space) of a piece's own +x and +y after turning it by rotationDeg clockwise seen from above. */
export function pieceAxes(rotationDeg: number): { across: [number, number]; front: [number, number] } {
  const r = (rotationDeg * Math.PI) / 180;
  const cos = Math.cos(r);
  const sin = Math.sin(r);
  return { across: [cos, sin], front: [-sin, cos] };
}

/** A box on the plan (mm) of the given sizes round `centre`, its own x along unit vector axisX and its own y that turned 90° clockwise. */
export function planBoxAt(
  centre: readonly [number, number],
  axisX: readonly [number, number],
  sizeXMm: number,
  sizeYMm: number,
): PiecePlanBox {
  return {
    centre: [centre[0], centre[1]],
    axisX: [axisX[0], axisX[1]],
    axisY: [-axisX[1], axisX[0]],
    halfWidthMm: sizeXMm / 2,
    halfDepthMm: sizeYMm / 2,
  };
}

/** A piece's box on the plan (mm). */
export function piecePlanBox(piece: PiecePose): PiecePlanBox {
  return planBoxAt([piece.x, piece.y], pieceAxes(piece.rotation).across, piece.width, piece.depth);
}

/** The four corners of a box's footprint in plan mm, in order round: (−x,−y) (+x,−y) (+x,+y) (−x,+y) in its own axes, back-left first. */
export function boxCornersMm(box: PiecePlanBox): [number, number][] {
  const { centre, axisX, axisY, halfWidthMm: hx, halfDepthMm: hy } = box;
  const corner = (u: number, v: number): [number, number] => [
    centre[0] + axisX[0] * u + axisY[0] * v,
    centre[1] + axisX[1] * u + axisY[1] * v,
  ];
  return [corner(-hx, -hy), corner(hx, -hy), corner(hx, hy), corner(-hx, hy)];
}

/** The four corners of a piece's footprint in plan mm, back-left first, going round. */
export function pieceFootprintMm(piece: PiecePose): [number, number][] {
  return boxCornersMm(piecePlanBox(piece));
}

/** The axis-aligned box round a piece's footprint, plan mm. */
export function pieceBoundsMm(piece: PiecePose): PlanBounds {
  const corners = pieceFootprintMm(piece);
  const xs = corners.map((c) => c[0]);
  const ys = corners.map((c) => c[1]);
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}

/**
 * Whether people walk over the piece: a rug by its kind, or anything no taller than
 * FLAT_MAX_HEIGHT_MM lying on the floor. It lies under furniture and leaves the floor free.
 */
export function isWalkedOver(piece: PieceReach): boolean {
  return piece.kind === 'rug' || (piece.elevation === 0 && piece.height <= FLAT_MAX_HEIGHT_MM);
}

/** Whether people walk under the piece: its underside is at or above HEAD_CLEARANCE_MM. */
export function isWalkedUnder(piece: PieceReach): boolean {
  return piece.elevation >= HEAD_CLEARANCE_MM;
}

/** Whether a person on the floor has to go round the piece: neither walked over nor walked under. */
export function blocksWalking(piece: PieceReach): boolean {
  return !isWalkedOver(piece) && !isWalkedUnder(piece);
}
