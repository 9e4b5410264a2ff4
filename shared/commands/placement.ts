// Where a new or placed piece lands: on free floor inside the outline, as near as it can be to the
// point asked for (the middle of the view, or where it was dropped), never across a wall and never
// on another placed piece while there is room for it. Rugs (pieces walked over) leave the floor free:
// a table or a sofa lands on one.
import type { Piece } from '../schemas/option';
import type { RoomShell } from '../schemas/room';
import type { Vec2 } from '../geometry/vec';
import { pointInPolygon, segmentsTouch } from '../geometry/polygon';
import { isWalkedOver, pieceFootprintMm, type PiecePose } from '../geometry/piece';

/** The spacing of the spots tried (mm): fine enough to find gaps a piece fits in, coarse enough to stay instant. */
export const PLACEMENT_STEP_MM = 50;
/** A hair kept between a placed piece and a wall or another piece, so touching faces do not count as overlapping (mm). */
export const PLACEMENT_GAP_MM = 1;
/** At most this many spots are tried in each direction, so a vast outline stays quick. */
const MAX_STEPS_PER_AXIS = 400;

type Outline = RoomShell['outline'];

function edges(poly: readonly Vec2[]): [Vec2, Vec2][] {
  return poly.map((p, i) => [p, poly[(i + 1) % poly.length]!]);
}

/** True when the convex `box` lies wholly inside the outline: every corner inside, no wall crossing it. */
export function boxInsideOutline(outline: Outline, box: readonly Vec2[]): boolean {
  if (!box.every((c) => pointInPolygon(c, outline))) return false;
  const walls = edges(outline);
  return edges(box).every(([a, b]) => walls.every(([c, d]) => !segmentsTouch(a, b, c, d)));
}

// Separating axis test for two convex quadrilaterals.
function project(poly: readonly Vec2[], axis: Vec2): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const p of poly) {
    const d = p[0] * axis[0] + p[1] * axis[1];
    if (d < min) min = d;
    if (d > max) max = d;
  }
  return [min, max];
}

/** True when two convex footprints overlap by more than a hair. */
export function boxesOverlap(a: readonly Vec2[], b: readonly Vec2[]): boolean {
  for (const poly of [a, b]) {
    for (const [p, q] of edges(poly)) {
      const axis: Vec2 = [q[1] - p[1], p[0] - q[0]];
      const len = Math.hypot(axis[0], axis[1]);
      if (len === 0) continue;
      const n: Vec2 = [axis[0] / len, axis[1] / len];
      const [amin, amax] = project(a, n);
      const [bmin, bmax] = project(b, n);
      if (amax <= bmin + PLACEMENT_GAP_MM || bmax <= amin + PLACEMENT_GAP_MM) return false;
    }
  }
  return true;
}

/** The footprint grown by `by` mm on every side (so a gap is kept), for the wall test. */
function grown(pose: PiecePose, by: number): Vec2[] {
  return pieceFootprintMm({ ...pose, width: pose.width + 2 * by, depth: pose.depth + 2 * by });
}

export interface PlacementRequest {
  width: number;
  depth: number;
  rotation: number;
  /** The point to land near: the middle of the view, or the drop point (plan mm). */
  near: Vec2;
  /** The piece being placed, left out of the pieces it must avoid. */
  id?: string;
}

/**
 * The centre (plan mm) for a piece of this size and turn: the free spot inside the outline nearest
 * to `near`. With no free spot, the nearest spot inside the outline (it may overlap a piece); with
 * not even that (a piece larger than the room), the inside point nearest to `near`.
 */
export function findPlacement(
  shell: Pick<RoomShell, 'outline'>,
  pieces: readonly Piece[],
  request: PlacementRequest,
): [number, number] {
  const { outline } = shell;
  const others = pieces.filter((p) => p.placed && p.id !== request.id && !isWalkedOver(p)).map((p) => pieceFootprintMm(p));
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const step = Math.max(PLACEMENT_STEP_MM, (maxX - minX) / MAX_STEPS_PER_AXIS, (maxY - minY) / MAX_STEPS_PER_AXIS);
  const [nx, ny] = request.near;
  const pose = (x: number, y: number): PiecePose => ({
    x,
    y,
    width: request.width,
    depth: request.depth,
    rotation: request.rotation,
  });

  // Spots on a grid through the asked-for point itself, so a free `near` is kept exactly.
  const spots: { x: number; y: number; d: number }[] = [];
  const i0 = Math.floor((minX - nx) / step);
  const i1 = Math.ceil((maxX - nx) / step);
  const j0 = Math.floor((minY - ny) / step);
  const j1 = Math.ceil((maxY - ny) / step);
  for (let i = i0; i <= i1; i++) {
    for (let j = j0; j <= j1; j++) {
      const x = nx + i * step;
      const y = ny + j * step;
      spots.push({ x, y, d: (x - nx) ** 2 + (y - ny) ** 2 });
    }
  }
  spots.sort((a, b) => a.d - b.d);

  let insideOnly: [number, number] | null = null;
  for (const s of spots) {
    const p = pose(s.x, s.y);
    if (!boxInsideOutline(outline, grown(p, PLACEMENT_GAP_MM))) continue;
    const footprint = pieceFootprintMm(p);
    if (others.every((o) => !boxesOverlap(footprint, o))) return [s.x, s.y];
    insideOnly ??= [s.x, s.y];
  }
  if (insideOnly) return insideOnly;
  const point = spots.find((s) => pointInPolygon([s.x, s.y], outline));
  return point ? [point.x, point.y] : [nx, ny];
}
