// Plan geometry shared by the fit checks: a piece's footprint as a rotated rectangle, convex
// overlap by separating axes and closest points between convex shapes. All in
// plan mm (x right, y down).
import type { Piece } from '../../schemas/option';
import { blocksWalking, boxCornersMm, piecePlanBox } from '../../geometry/piece';
import { addScaled, cross, dot, sub, type Vec2 } from '../../geometry/vec';
import { itemAt } from '../../item-at';

// The walking rule lives in geometry/piece; kept readable from here for the schedule's walkway figure.
export { blocksWalking };

/** Two footprints or height ranges may share this much (mm) and still only touch: a tape reads to about 1 mm. */
export const TOUCH_TOLERANCE_MM = 1;
/** A placed piece's footprint in plan mm with its height range (mm above the floor). */
export interface PieceBox {
  piece: Piece;
  centre: [number, number];
  /** Unit vectors of the piece's own x (width) and y (depth, towards its front) on the plan. */
  axisX: [number, number];
  axisY: [number, number];
  halfWidthMm: number;
  halfDepthMm: number;
  /** Footprint corners round the box: (−x,−y) (+x,−y) (+x,+y) (−x,+y) in the piece's own axes. */
  corners: [number, number][];
  bottomMm: number;
  topMm: number;
}

/** A piece's box on the plan (mm) with its height range, from the one footprint in geometry/piece. */
export function pieceBox(piece: Piece): PieceBox {
  const box = piecePlanBox(piece);
  return {
    piece,
    ...box,
    corners: boxCornersMm(box),
    bottomMm: piece.elevation,
    topMm: piece.elevation + piece.height,
  };
}

/**
 * How far (mm) a piece's underside may sit from another's top and still stand on it: heights are
 * typed to the centimetre, so a lamp entered 5 mm into a table top stands on it (common practice).
 */
export const STACK_TOLERANCE_MM = 10;

/**
 * Whether `upper` stands on `lower`: its underside is lower's top within STACK_TOLERANCE_MM and its
 * footprint lies inside lower's (a lamp on a table, a television on a media unit). A wall-hung
 * piece above another, or one under another's overhang, does not: each is judged at its height.
 */
export function standsOn(upper: PieceBox, lower: PieceBox): boolean {
  if (upper === lower || upper.bottomMm <= 0 || Math.abs(upper.bottomMm - lower.topMm) > STACK_TOLERANCE_MM) return false;
  return upper.corners.every((corner) => {
    const d = sub(corner, lower.centre);
    return (
      Math.abs(dot(d, lower.axisX)) <= lower.halfWidthMm + TOUCH_TOLERANCE_MM &&
      Math.abs(dot(d, lower.axisY)) <= lower.halfDepthMm + TOUCH_TOLERANCE_MM
    );
  });
}

/** The piece a box stands on (standsOn), if any. */
export function standingOn(box: PieceBox, boxes: readonly PieceBox[]): PieceBox | undefined {
  return box.bottomMm > 0 ? boxes.find((lower) => standsOn(box, lower)) : undefined;
}

/** Boxes of the placed pieces only; pieces in the holding area take no part in the fit check. */
export function placedBoxes(pieces: readonly Piece[]): PieceBox[] {
  return pieces.filter((piece) => piece.placed).map(pieceBox);
}

function projectOnto(points: readonly Vec2[], axis: Vec2): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const p of points) {
    const s = dot(p, axis);
    if (s < min) min = s;
    if (s > max) max = s;
  }
  return [min, max];
}

function edgeNormals(points: readonly Vec2[]): [number, number][] {
  const normals: [number, number][] = [];
  for (let i = 0; i < points.length; i++) {
    const e = sub(points[(i + 1) % points.length]!, points[i]!);
    const l = Math.hypot(e[0], e[1]);
    if (l > 0) normals.push([-e[1] / l, e[0] / l]);
  }
  return normals;
}

/**
 * How deep two convex plan polygons (mm) run into each other: the smallest overlap of their
 * projections over every edge normal (separating axis test). Zero or less means they are apart or
 * only touch.
 */
export function convexPenetrationMm(a: readonly Vec2[], b: readonly Vec2[]): number {
  let least = Infinity;
  for (const axis of [...edgeNormals(a), ...edgeNormals(b)]) {
    const [minA, maxA] = projectOnto(a, axis);
    const [minB, maxB] = projectOnto(b, axis);
    const overlap = Math.min(maxA, maxB) - Math.max(minA, minB);
    if (overlap < least) least = overlap;
    if (least <= 0) return least;
  }
  return least;
}

/** Whether two convex plan polygons (mm) share more than a touch (TOUCH_TOLERANCE_MM). */
export function convexOverlap(a: readonly Vec2[], b: readonly Vec2[]): boolean {
  return convexPenetrationMm(a, b) > TOUCH_TOLERANCE_MM;
}

/**
 * Whether plan segment ab runs through a convex polygon (mm) by more than `toleranceMm`: the polygon
 * reaches past the segment's line on both sides, and they overlap along every edge normal of the
 * polygon. A segment lying along an edge, or just touching, does not.
 */
export function segmentCrossesConvex(a: Vec2, b: Vec2, polygon: readonly Vec2[], toleranceMm: number): boolean {
  const along = sub(b, a);
  const l = Math.hypot(along[0], along[1]);
  if (l === 0) return false;
  const normal: Vec2 = [-along[1] / l, along[0] / l];
  const line = dot(a, normal);
  const [min, max] = projectOnto(polygon, normal);
  if (min > line - toleranceMm || max < line + toleranceMm) return false;
  for (const axis of edgeNormals(polygon)) {
    const [minP, maxP] = projectOnto(polygon, axis);
    const [minS, maxS] = projectOnto([a, b], axis);
    if (Math.min(maxP, maxS) - Math.max(minP, minS) <= toleranceMm) return false;
  }
  return true;
}

/** The point of segment ab nearest to p (plan mm). */
export function closestOnSegment(p: Vec2, a: Vec2, b: Vec2): [number, number] {
  const ab = sub(b, a);
  const lengthSquared = dot(ab, ab);
  const t = lengthSquared === 0 ? 0 : Math.min(1, Math.max(0, dot(sub(p, a), ab) / lengthSquared));
  return addScaled(a, ab, t);
}

/** Distance (mm) from p to segment ab. */
export function distanceToSegmentMm(p: Vec2, a: Vec2, b: Vec2): number {
  const q = closestOnSegment(p, a, b);
  return Math.hypot(p[0] - q[0], p[1] - q[1]);
}

/** The point of a plan shape (closed polygon, or a segment given as two points; mm) nearest to p. */
export function closestOnShape(p: Vec2, shape: readonly Vec2[]): [number, number] {
  let best: [number, number] = [...itemAt(shape, 0, 'point')];
  let bestMm = Infinity;
  const edges = shape.length === 2 ? 1 : shape.length;
  for (let k = 0; k < edges; k++) {
    const q = closestOnSegment(p, shape[k]!, shape[(k + 1) % shape.length]!);
    const d = Math.hypot(p[0] - q[0], p[1] - q[1]);
    if (d < bestMm) {
      bestMm = d;
      best = q;
    }
  }
  return best;
}

/** A pair of plan points (mm), one on each shape, and how far apart they are. */
export interface ClosestPair {
  distanceMm: number;
  from: [number, number];
  to: [number, number];
}

/** The parameter (0 to 1) of the point of segment a→b nearest to p, as closestOnSegment works it out. */
function nearestAlong(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const abx = bx - ax;
  const aby = by - ay;
  const lengthSquared = abx * abx + aby * aby;
  return lengthSquared === 0 ? 0 : Math.min(1, Math.max(0, ((px - ax) * abx + (py - ay) * aby) / lengthSquared));
}

/**
 * Closest points between two plan shapes given as closed polygons or, with two points, a segment
 * (mm). Shapes that cross give distance 0. Boxes and walls have few edges, so all pairs are tried:
 * two edges cross when each one's ends lie strictly either side of the other's line; else each end
 * is tried against the other edge (the arithmetic of closestOnSegment, without making a point for
 * every try).
 */
export function closestPair(a: readonly Vec2[], b: readonly Vec2[]): ClosestPair {
  const first = itemAt(a, 0, 'point');
  const firstB = itemAt(b, 0, 'point');
  let bestMm = Infinity;
  let fromX = first[0];
  let fromY = first[1];
  let toX = firstB[0];
  let toY = firstB[1];
  const edgesA = a.length === 2 ? 1 : a.length;
  const edgesB = b.length === 2 ? 1 : b.length;
  for (let i = 0; i < edgesA; i++) {
    const [px, py] = a[i]!;
    const [qx, qy] = a[(i + 1) % a.length]!;
    for (let k = 0; k < edgesB; k++) {
      const [rx, ry] = b[k]!;
      const [sx, sy] = b[(k + 1) % b.length]!;
      // Which side of each edge's line the other's ends lie (cross products).
      const d1 = (qx - px) * (ry - py) - (qy - py) * (rx - px);
      const d2 = (qx - px) * (sy - py) - (qy - py) * (sx - px);
      const d3 = (sx - rx) * (py - ry) - (sy - ry) * (px - rx);
      const d4 = (sx - rx) * (qy - ry) - (sy - ry) * (qx - rx);
      if (d1 * d2 < 0 && d3 * d4 < 0) {
        const t =
          cross(sub([rx, ry], [px, py]), sub([sx, sy], [rx, ry])) / cross(sub([qx, qy], [px, py]), sub([sx, sy], [rx, ry]));
        const hit = addScaled([px, py], sub([qx, qy], [px, py]), t);
        return { distanceMm: 0, from: hit, to: hit };
      }
      // p and q against r→s, then r and s against p→q, in that order; each from shape a's point to shape b's.
      for (let end = 0; end < 4; end++) {
        const ex = end === 0 ? px : end === 1 ? qx : end === 2 ? rx : sx;
        const ey = end === 0 ? py : end === 1 ? qy : end === 2 ? ry : sy;
        let ax = ex;
        let ay = ey;
        let bx = ex;
        let by = ey;
        if (end < 2) {
          const t = nearestAlong(ex, ey, rx, ry, sx, sy);
          bx = rx + (sx - rx) * t;
          by = ry + (sy - ry) * t;
        } else {
          const t = nearestAlong(ex, ey, px, py, qx, qy);
          ax = px + (qx - px) * t;
          ay = py + (qy - py) * t;
        }
        const d = Math.hypot(ax - bx, ay - by);
        if (d < bestMm) {
          bestMm = d;
          fromX = ax;
          fromY = ay;
          toX = bx;
          toY = by;
        }
      }
    }
  }
  return { distanceMm: bestMm, from: [fromX, fromY], to: [toX, toY] };
}
