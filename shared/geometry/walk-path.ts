// Finding a way across a room on foot: a shortest path on a fine grid of standing places (plan mm),
// round open door leaves and pieces, straightened where a straight line is free; null when the
// clicked floor cannot be reached.
import { BODY_RADIUS_MM, clearanceMm, walkLine, type WalkObstacles } from './walk';
import { boundsMm } from './polygon';
import type { Vec2 } from './vec';

/** Standing places are tried on a grid this fine (mm): fine enough for a 600 mm gap between pieces. */
export const PATH_GRID_MM = 100;
/** Past the outline the grid goes this far (mm), for the thresholds of doors and passages. */
const PATH_MARGIN_MM = 1000;
/** The most grid places a search looks at: bounded work even in a very large room. */
const MAX_CELLS = 200_000;

const key = (i: number, j: number, nx: number) => j * nx + i;

/**
 * The way a body of `radiusMm` walks from `from` to `to` (plan mm): the points to pass through,
 * ending at `to`, or null when `to` has no room for the body or cannot be reached from `from`.
 */
export function findWalkPath(
  obstacles: WalkObstacles,
  from: Vec2,
  to: Vec2,
  radiusMm = BODY_RADIUS_MM,
): [number, number][] | null {
  if (clearanceMm(obstacles, to) < radiusMm - 0.5) return null;
  const straight = walkLine(obstacles, from, to, radiusMm);
  if (straight[0] === to[0] && straight[1] === to[1]) return [[to[0], to[1]]];
  const b = boundsMm(obstacles.outline);
  const x0 = b.minX - PATH_MARGIN_MM;
  const y0 = b.minY - PATH_MARGIN_MM;
  const nx = Math.ceil((b.maxX - b.minX + 2 * PATH_MARGIN_MM) / PATH_GRID_MM) + 1;
  const ny = Math.ceil((b.maxY - b.minY + 2 * PATH_MARGIN_MM) / PATH_GRID_MM) + 1;
  if (nx * ny > MAX_CELLS) return null;
  const at = (i: number, j: number): [number, number] => [x0 + i * PATH_GRID_MM, y0 + j * PATH_GRID_MM];
  const freeCache = new Map<number, boolean>();
  const free = (i: number, j: number) => {
    if (i < 0 || j < 0 || i >= nx || j >= ny) return false;
    const k = key(i, j, nx);
    let f = freeCache.get(k);
    if (f === undefined) {
      f = clearanceMm(obstacles, at(i, j)) >= radiusMm;
      freeCache.set(k, f);
    }
    return f;
  };
  // Grid places a straight step away from an end, nearest first.
  const near = (p: Vec2): number[] => {
    const ci = Math.round((p[0] - x0) / PATH_GRID_MM);
    const cj = Math.round((p[1] - y0) / PATH_GRID_MM);
    const found: { k: number; d: number }[] = [];
    for (let dj = -3; dj <= 3; dj++)
      for (let di = -3; di <= 3; di++) {
        const i = ci + di;
        const j = cj + dj;
        if (!free(i, j)) continue;
        const c = at(i, j);
        const reached = walkLine(obstacles, p, c, radiusMm);
        if (reached[0] === c[0] && reached[1] === c[1]) found.push({ k: key(i, j, nx), d: Math.hypot(c[0] - p[0], c[1] - p[1]) });
      }
    return found.sort((a, c) => a.d - c.d).map((f) => f.k);
  };
  const starts = near(from);
  const goals = new Set(near(to));
  if (starts.length === 0 || goals.size === 0) return null;
  // Breadth-first over the eight neighbours, diagonals costed at √2 (shortest first, from a sorted frontier).
  const cost = new Map<number, number>();
  const came = new Map<number, number>();
  const frontier: number[] = [];
  for (const s of starts) {
    const c = at(s % nx, Math.floor(s / nx));
    cost.set(s, Math.hypot(c[0] - from[0], c[1] - from[1]));
    frontier.push(s);
  }
  let goal: number | null = null;
  while (frontier.length > 0) {
    frontier.sort((a, c) => cost.get(a)! - cost.get(c)!);
    const k = frontier.shift()!;
    if (goals.has(k)) {
      goal = k;
      break;
    }
    const i = k % nx;
    const j = Math.floor(k / nx);
    for (const [di, dj] of [
      [1, 0],
      [-1, 0],
      [0, 1],
      [0, -1],
      [1, 1],
      [1, -1],
      [-1, 1],
      [-1, -1],
    ] as const) {
      if (!free(i + di, j + dj)) continue;
      if (di !== 0 && dj !== 0 && (!free(i + di, j) || !free(i, j + dj))) continue;
      const n = key(i + di, j + dj, nx);
      const c = cost.get(k)! + (di !== 0 && dj !== 0 ? Math.SQRT2 : 1) * PATH_GRID_MM;
      if (c >= (cost.get(n) ?? Infinity)) continue;
      if (!cost.has(n)) frontier.push(n);
      cost.set(n, c);
      came.set(n, k);
    }
    if (cost.size > MAX_CELLS) return null;
  }
  if (goal === null) return null;
  const cells: [number, number][] = [];
  for (let k: number | undefined = goal; k !== undefined; k = came.get(k)) cells.unshift(at(k % nx, Math.floor(k / nx)));
  const points: [number, number][] = [[from[0], from[1]], ...cells, [to[0], to[1]]];
  // Straighten: from each point, go to the furthest later one a straight line reaches.
  const path: [number, number][] = [];
  let here = 0;
  while (here < points.length - 1) {
    let next = points.length - 1;
    for (; next > here + 1; next--) {
      const r = walkLine(obstacles, points[here]!, points[next]!, radiusMm);
      if (r[0] === points[next]![0] && r[1] === points[next]![1]) break;
    }
    path.push(points[next]!);
    here = next;
  }
  return path;
}
