import type { Piece } from '../schemas/option';
import type { Vec2 } from '../geometry/vec';

/** The parts of a piece that fix where its box stands on the plan (mm, degrees clockwise seen from above). */
export type PiecePose = Pick<Piece, 'x' | 'y' | 'width' | 'depth' | 'rotation'>;

/** An axis-aligned box on the plan, mm. */
export interface PlanBounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Turns this close (degrees) to a full turn are taken as none. */
const FULL_TURN_TOLERANCE_DEG = 1e-9;

/** A rotation in degrees folded into [0, 360), with −0 written as 0. */
export function normaliseRotationDeg(rotationDeg: number): number {
  const folded = ((rotationDeg % 360) + 360) % 360;
  // 359.9999999999 left by floating point is a full turn, not a hair short of one.
  return 360 - folded < FULL_TURN_TOLERANCE_DEG ? 0 : folded;
}

/** Plan direction (unit, mm space) of a piece's own +x and +y after turning it by rotationDeg clockwise seen from above. */
export function pieceAxes(rotationDeg: number): { across: Vec2; front: Vec2 } {
  const r = (rotationDeg * Math.PI) / 180;
  const cos = Math.cos(r);
  const sin = Math.sin(r);
  return { across: [cos, sin], front: [-sin, cos] };
}

/** The four corners of a piece's footprint in plan mm, back-left first, going round. */
export function pieceFootprintMm(piece: PiecePose): [number, number][] {
  const { across, front } = pieceAxes(piece.rotation);
  const hw = piece.width / 2;
  const hd = piece.depth / 2;
  const local: [number, number][] = [
    [-hw, -hd],
    [hw, -hd],
    [hw, hd],
    [-hw, hd],
  ];
  return local.map(([u, v]): [number, number] => [
    piece.x + across[0] * u + front[0] * v,
    piece.y + across[1] * u + front[1] * v,
  ]);
}

/** The axis-aligned box round a piece's footprint, plan mm. */
export function pieceBoundsMm(piece: PiecePose): PlanBounds {
  const corners = pieceFootprintMm(piece);
  const xs = corners.map((c) => c[0]);
  const ys = corners.map((c) => c[1]);
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}
