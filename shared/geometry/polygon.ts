// Plan polygon helpers in mm: area, perimeter, winding, point in polygon, segment touching, the
// self-crossing walls of an outline, bounds and ear-clipping triangulation.
import { POINT_TOLERANCE_MM } from './tolerances';
import { cross, distance, sub, type Vec2 } from './vec';

/**
 * Shoelace area in mm² of plan points (mm). Positive when the corners run counter-clockwise in a
 * y-up frame, which on the y-down plan is clockwise as seen on the page.
 */
export function signedAreaMm2(points: readonly Vec2[]): number {
  let twice = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % n]!;
    twice += a[0] * b[1] - b[0] * a[1];
  }
  return twice / 2;
}

/** Enclosed area in mm² of plan points (mm), either winding. */
export function areaMm2(points: readonly Vec2[]): number {
  return Math.abs(signedAreaMm2(points));
}

/** Closed perimeter in mm of plan points (mm), last corner back to the first. */
export function perimeterMm(points: readonly Vec2[]): number {
  let total = 0;
  for (let i = 0; i < points.length; i++) total += distance(points[i]!, points[(i + 1) % points.length]!);
  return total;
}

export type Winding = 'clockwise' | 'counter-clockwise';

/** How the corners run as seen on the y-down plan page. */
export function windingOnPlan(points: readonly Vec2[]): Winding {
  return signedAreaMm2(points) >= 0 ? 'clockwise' : 'counter-clockwise';
}

/**
 * Whether plan point p (mm) lies inside a polygon: even–odd rule, either winding, holes by
 * self-overlap; a point exactly on an edge may fall either way. No allocation: safe in hot loops.
 */
export function pointInPolygon(p: Vec2, polygon: readonly Vec2[]): boolean {
  const px = p[0];
  const py = p[1];
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[i]!;
    const b = polygon[j]!;
    const yi = a[1];
    const yj = b[1];
    if (yi > py !== yj > py && px < ((b[0] - a[0]) * (py - yi)) / (yj - yi) + a[0]) inside = !inside;
  }
  return inside;
}

/** +1 when the outline runs clockwise on the plan, −1 otherwise; multiplies normals so either winding works. */
export function windingSign(points: readonly Vec2[]): 1 | -1 {
  return signedAreaMm2(points) >= 0 ? 1 : -1;
}

function orientation(a: Vec2, b: Vec2, c: Vec2): number {
  const value = cross(sub(b, a), sub(c, a));
  // Scale the tolerance by the segment length so it reads as a distance in mm.
  const scaleMm = Math.max(distance(a, b), 1);
  return Math.abs(value) / scaleMm < POINT_TOLERANCE_MM ? 0 : Math.sign(value);
}

function onSegment(a: Vec2, b: Vec2, p: Vec2): boolean {
  return (
    p[0] <= Math.max(a[0], b[0]) + POINT_TOLERANCE_MM &&
    p[0] >= Math.min(a[0], b[0]) - POINT_TOLERANCE_MM &&
    p[1] <= Math.max(a[1], b[1]) + POINT_TOLERANCE_MM &&
    p[1] >= Math.min(a[1], b[1]) - POINT_TOLERANCE_MM
  );
}

/** Whether plan segments ab and cd share any point (touching counts). */
export function segmentsTouch(a: Vec2, b: Vec2, c: Vec2, d: Vec2): boolean {
  const o1 = orientation(a, b, c);
  const o2 = orientation(a, b, d);
  const o3 = orientation(c, d, a);
  const o4 = orientation(c, d, b);
  if (o1 !== o2 && o3 !== o4 && o1 * o2 <= 0 && o3 * o4 <= 0) return true;
  return (
    (o1 === 0 && onSegment(a, b, c)) ||
    (o2 === 0 && onSegment(a, b, d)) ||
    (o3 === 0 && onSegment(c, d, a)) ||
    (o4 === 0 && onSegment(c, d, b))
  );
}

/** A pair of walls (by index) that cross or touch away from their shared corner. */
export interface WallCrossing {
  wallA: number;
  wallB: number;
}

/** The most crossings findSelfCrossings reports: enough to show where an outline goes wrong. */
export const MAX_REPORTED_CROSSINGS = 20;

// orientation() above on plain numbers, with the wall's scale worked out once.
function side(ax: number, ay: number, bx: number, by: number, scaleMm: number, px: number, py: number): number {
  const value = (bx - ax) * (py - ay) - (by - ay) * (px - ax);
  return Math.abs(value) / scaleMm < POINT_TOLERANCE_MM ? 0 : Math.sign(value);
}

// onSegment() above on plain numbers.
function within(ax: number, ay: number, bx: number, by: number, px: number, py: number): boolean {
  return (
    px <= Math.max(ax, bx) + POINT_TOLERANCE_MM &&
    px >= Math.min(ax, bx) - POINT_TOLERANCE_MM &&
    py <= Math.max(ay, by) + POINT_TOLERANCE_MM &&
    py >= Math.min(ay, by) - POINT_TOLERANCE_MM
  );
}

/** segmentsTouch() on plain numbers, given each wall's scale (its length, at least 1 mm). */
function wallsTouch(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  sab: number,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
  scd: number,
): boolean {
  const o1 = side(ax, ay, bx, by, sab, cx, cy);
  const o2 = side(ax, ay, bx, by, sab, dx, dy);
  const o3 = side(cx, cy, dx, dy, scd, ax, ay);
  const o4 = side(cx, cy, dx, dy, scd, bx, by);
  if (o1 !== o2 && o3 !== o4 && o1 * o2 <= 0 && o3 * o4 <= 0) return true;
  return (
    (o1 === 0 && within(ax, ay, bx, by, cx, cy)) ||
    (o2 === 0 && within(ax, ay, bx, by, dx, dy)) ||
    (o3 === 0 && within(cx, cy, dx, dy, ax, ay)) ||
    (o4 === 0 && within(cx, cy, dx, dy, bx, by))
  );
}

/**
 * Pairs of walls of a plan outline (mm) that cross each other, at most `limit` of them (the first
 * found, wall by wall); empty for a simple polygon. Every pair is tested as segmentsTouch does, on
 * plain numbers with each wall's length and box worked out once. Walls whose boxes lie more than
 * the point tolerance apart are passed over: they cannot share a point. (segmentsTouch, whose
 * side test is per infinite line, also calls two nearly collinear walls that do not overlap
 * "touching"; this does not.) The 200-corner cap stays under a millisecond either way.
 */
export function findSelfCrossings(points: readonly Vec2[], limit = MAX_REPORTED_CROSSINGS): WallCrossing[] {
  const n = points.length;
  const crossings: WallCrossing[] = [];
  const xs = new Float64Array(n + 1);
  const ys = new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) [xs[i], ys[i]] = points[i % n]!;
  const scales = new Float64Array(n);
  const lows = new Float64Array(2 * n);
  const highs = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    scales[i] = Math.max(Math.hypot(xs[i]! - xs[i + 1]!, ys[i]! - ys[i + 1]!), 1);
    lows[2 * i] = Math.min(xs[i]!, xs[i + 1]!) - POINT_TOLERANCE_MM;
    lows[2 * i + 1] = Math.min(ys[i]!, ys[i + 1]!) - POINT_TOLERANCE_MM;
    highs[2 * i] = Math.max(xs[i]!, xs[i + 1]!) + POINT_TOLERANCE_MM;
    highs[2 * i + 1] = Math.max(ys[i]!, ys[i + 1]!) + POINT_TOLERANCE_MM;
  }
  for (let i = 0; i < n; i++) {
    // A wall under 1 mm has a wider side tolerance than its box shows: test it against every wall.
    const shortI = Math.hypot(xs[i]! - xs[i + 1]!, ys[i]! - ys[i + 1]!) < 1;
    for (let j = i + 1; j < n; j++) {
      let touch: boolean;
      if (j === i + 1 || (i === 0 && j === n - 1)) {
        // Neighbours share a corner; they only cross when one doubles back along the other.
        const shared = j === i + 1 ? i + 1 : i;
        const awayA = j === i + 1 ? i : i + 1;
        const awayB = j === i + 1 ? j + 1 : j;
        const ux = xs[awayA]! - xs[shared]!;
        const uy = ys[awayA]! - ys[shared]!;
        const vx = xs[awayB]! - xs[shared]!;
        const vy = ys[awayB]! - ys[shared]!;
        touch = Math.abs(ux * vy - uy * vx) / Math.max(Math.hypot(ux, uy), 1) < POINT_TOLERANCE_MM && ux * vx + uy * vy > 0;
      } else if (
        !shortI &&
        scales[j]! > 1 &&
        (lows[2 * j]! > highs[2 * i]! + POINT_TOLERANCE_MM ||
          highs[2 * j]! < lows[2 * i]! - POINT_TOLERANCE_MM ||
          lows[2 * j + 1]! > highs[2 * i + 1]! + POINT_TOLERANCE_MM ||
          highs[2 * j + 1]! < lows[2 * i + 1]! - POINT_TOLERANCE_MM)
      ) {
        touch = false;
      } else {
        touch = wallsTouch(
          xs[i]!,
          ys[i]!,
          xs[i + 1]!,
          ys[i + 1]!,
          scales[i]!,
          xs[j]!,
          ys[j]!,
          xs[j + 1]!,
          ys[j + 1]!,
          scales[j]!,
        );
      }
      if (touch) {
        crossings.push({ wallA: i, wallB: j });
        if (crossings.length >= limit) return crossings;
      }
    }
  }
  return crossings;
}

/** Axis-aligned box of plan points, in their units. */
export interface Bounds2 {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Axis-aligned bounds of plan points (mm). */
export function boundsMm(points: readonly Vec2[]): Bounds2 {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

// Inside or on the edge: a corner lying exactly on a candidate ear's diagonal (a bump-out whose
// corners line up with a long wall) must block that ear, or the ear would cut outside the room.
function pointInOrOnTriangle(p: Vec2, a: Vec2, b: Vec2, c: Vec2): boolean {
  if ((p[0] === a[0] && p[1] === a[1]) || (p[0] === b[0] && p[1] === b[1]) || (p[0] === c[0] && p[1] === c[1])) return false;
  const d1 = cross(sub(b, a), sub(p, a));
  const d2 = cross(sub(c, b), sub(p, b));
  const d3 = cross(sub(a, c), sub(p, c));
  return d1 >= 0 && d2 >= 0 && d3 >= 0;
}

/**
 * Triangles (corner index triples) covering a simple plan polygon (any units), by ear clipping.
 * Each triple runs in the polygon's own winding. Rooms have few corners, so O(n³) is fine.
 */
export function triangulatePolygon(points: readonly Vec2[]): number[] {
  const n = points.length;
  if (n < 3) return [];
  const sign = signedAreaMm2(points) >= 0 ? 1 : -1;
  const remaining = Array.from({ length: n }, (_, i) => i);
  const triangles: number[] = [];
  // A point in "positive" orientation for the ear test regardless of the polygon's winding.
  const at = (i: number): Vec2 => [points[i]![0], sign * points[i]![1]];
  let guard = 0;
  while (remaining.length > 3 && guard < n * n) {
    guard++;
    let clipped = false;
    for (let k = 0; k < remaining.length; k++) {
      const ia = remaining[(k + remaining.length - 1) % remaining.length]!;
      const ib = remaining[k]!;
      const ic = remaining[(k + 1) % remaining.length]!;
      const a = at(ia);
      const b = at(ib);
      const c = at(ic);
      const turn = cross(sub(b, a), sub(c, b));
      if (turn < 0) continue;
      if (turn === 0) {
        // A straight-through corner adds no area; drop it so the ear search keeps moving.
        remaining.splice(k, 1);
        clipped = true;
        break;
      }
      let blocked = false;
      for (const other of remaining) {
        if (other === ia || other === ib || other === ic) continue;
        if (pointInOrOnTriangle(at(other), a, b, c)) {
          blocked = true;
          break;
        }
      }
      if (blocked) continue;
      triangles.push(ia, ib, ic);
      remaining.splice(k, 1);
      clipped = true;
      break;
    }
    if (!clipped) break;
  }
  if (remaining.length === 3) triangles.push(remaining[0]!, remaining[1]!, remaining[2]!);
  else if (remaining.length > 3) {
    // Not simple (validation should have refused it); a fan still gives the viewer something to draw.
    for (let k = 1; k + 1 < remaining.length; k++) triangles.push(remaining[0]!, remaining[k]!, remaining[k + 1]!);
  }
  return triangles;
}
