// `narrow-walkway` and `unreachable`: can a person walk from a door or passage to where each piece is
// used (its front, or the sides reach.ts names), and how narrow is the tightest spot on the best
// route? Plan mm, x right, y down.
import { placeOpening } from '../../geometry/openings';
import {
  faceFrame,
  judgeReach,
  reachNeeds,
  unreachableMessage,
  withSeatGaps,
  type Face,
  type Patch,
  type ReachWay,
} from './reach';
import { layoutShellWalls } from '../../geometry/walls';
import { addScaled, type Vec2 } from '../../geometry/vec';
import type { Piece } from '../../schemas/option';
import type { RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { blocksWalking } from '../../geometry/piece';
import { pointInPolygon } from '../../geometry/polygon';
import { closestOnShape, closestPair, distanceToSegmentMm, type PieceBox } from './boxes';
import { cellAt, cellCentreMm, distanceField, FREE, rasteriseFloor, WALL, type FloorGrid } from './floor-grid';
import { capitalise, cmText, roundToCmMm, theName } from './messages';
import { itemAt } from '../../item-at';

/** Side of a floor cell (mm): fine enough to tell a 60 cm gap from a 62 cm one, coarse enough to check a room in a few milliseconds. */
export const WALKWAY_CELL_MM = 25;
/** How deep (mm) the patch of floor in front of a piece is where a person stands to use it: about a foot's length (common practice). */
export const FRONT_STRIP_MM = 300;
/** A front patch with fewer free cells than this is blocked: a sliver of a few square centimetres is no place to stand. */
export const MIN_FRONT_CELLS = 4;
/** A traced gap is replaced by the exact distance between its two sides when the two agree within this many cells. */
const SNAP_CELLS = 1.5;
/** Two ways of drawing a gap this close (mm) in length show the same gap. */
const SNAP_TOLERANCE_MM = 0.5;
/** The search's own mark for blocked cells: wider than any route, so never entered. */
const BLOCKED_KEY = 0x7fffffff;
/** Samples along a ray, in cells, starting at the next cell's centre: on a square room's grid they
 * land on cell centres, so a hit puts the edge half a step back. A whole-cell step may pass the
 * corner of an obstacle thinner than a cell on a slant; pieces are thicker than that. */
const RAY_STEP_CELLS = 1;
/** How much shorter than twice the distance to the nearest blocked centre a chord can be, in cells: 1 + √½ for the chord across, √2 for a diagonal run, rounded up. */
const CHORD_SHORTFALL_CELLS = 1.75;
/** Kept back from a skip ahead along a ray, in cells: twice the √½ cell a sample may stray from a centre, rounded up. */
const RAY_SKIP_MARGIN_CELLS = 1.5;

interface Gap {
  /** Obstacle labels either side: a box index, or WALL. */
  sides: [number, number];
  /** Plan points on each side (mm). */
  ends: [[number, number], [number, number]];
}

/**
 * Per-cell working arrays are kept from one check to the next for grids up to this many cells
 * (about 8 MB), so a drag that checks the same room again and again does not churn memory; larger
 * grids get arrays of their own that go when the check is done.
 */
const KEPT_SCRATCH_CELLS = 250_000;
const kept = new Map<string, Float64Array | Int32Array>();

/** A working array of `cells` entries under `name`, with whatever it held before: callers fill it. */
function scratch<T extends Float64Array | Int32Array>(name: string, make: (cells: number) => T, cells: number): T {
  const held = kept.get(name) as T | undefined;
  if (held && held.length >= cells) return held.subarray(0, cells) as T;
  const made = make(cells);
  if (cells <= KEPT_SCRATCH_CELLS) kept.set(name, made);
  return made;
}
const float64 = (cells: number) => new Float64Array(cells);
const int32 = (cells: number) => new Int32Array(cells);

/** Directions of the straight runs across the floor, in cells: along x, along y and both diagonals. */
const RUN_DIRECTIONS: readonly (readonly [number, number])[] = [
  [1, 0],
  [0, 1],
  [1, 1],
  [1, -1],
];
/** Length of one step of each run direction, in cells. */
const RUN_STEP_CELLS = RUN_DIRECTIONS.map(([di, dj]) => Math.hypot(di, dj));

/**
 * For every free cell, the shortest of its four straight runs (along x, y and both diagonals) from
 * blocked cell to blocked cell, in mm, leaving out runs with a wall at both ends (the room's own
 * shape); Infinity when none counts. Every run starts just past a blocked cell, so one sweep over
 * the blocked cells finds each run once, measures it and hands its length to the cells along it.
 */
function shortestRunsMm(grid: FloorGrid): Float64Array {
  const { nx, label, cellMm } = grid;
  const cells = label.length;
  const shortest = scratch('shortest', float64, cells).fill(Infinity);
  const steps = RUN_DIRECTIONS.map(([di, dj]) => dj * nx + di);
  for (let back = 0; back < cells; back++) {
    if (label[back] === FREE) continue;
    for (let k = 0; k < 4; k++) {
      const step = steps[k]!;
      const first = back + step;
      // Off the grid, or past its edge onto the blocked ring of the next row: no run starts here.
      if (first < 0 || first >= cells || label[first] !== FREE) continue;
      let ahead = first;
      while (label[ahead] === FREE) ahead += step;
      if (label[back] === WALL && label[ahead] === WALL) continue;
      // The free cells between the two ends, each a step long: their edges are the obstacles' edges.
      // Every direction moves one column a step except straight down, which moves a whole row.
      const count = k === 1 ? (ahead - back) / nx : (ahead % nx) - (back % nx);
      const runMm = (count - 1) * cellMm * RUN_STEP_CELLS[k]!;
      for (let cell = first; cell !== ahead; cell += step) if (runMm < shortest[cell]!) shortest[cell] = runMm;
    }
  }
  return shortest;
}

/**
 * The clear width at each free cell: the shortest chord through it from obstacle to obstacle. One
 * chord runs from the nearest obstacle straight across (at a piece's face, the room in front of it;
 * between two pieces, the gap wherever in the gap the cell lies); four more run along x, y and the
 * diagonals, so the end of a recess reads as narrow as its middle. A chord with a wall at both ends
 * is the room's own shape (a doorway's reveals, an alcove): the designer cannot move it, so it does
 * not count. Widths are found on demand and kept; the search asks only as far as it needs.
 */
class Widths {
  /** Exact width (mm) at each cell, NaN until measured. */
  private readonly widthMm: Float64Array;
  /** Whole-mm width capped at the key it was first asked for, plus one; 0 until asked. */
  private readonly cappedMm: Int32Array;
  private readonly nearest: Int32Array;
  private readonly squaredCells: Float64Array;
  private readonly shortestRunMm: Float64Array;
  /** Set by `ray`: the blocked cell it met. */
  private rayHit = -1;

  constructor(
    private readonly grid: FloorGrid,
    /** Widths at or beyond this (mm) are wide enough; they are not measured further. */
    private readonly enoughMm: number,
  ) {
    const field = distanceField(grid);
    this.nearest = field.nearest;
    this.squaredCells = field.squaredCells;
    this.shortestRunMm = shortestRunsMm(grid);
    const cells = grid.nx * grid.ny;
    this.widthMm = scratch('width', float64, cells).fill(NaN);
    this.cappedMm = scratch('capped', int32, cells).fill(0);
  }

  /**
   * The width at a free cell in whole mm, capped at keyMm: as `at` gives it, but measured only as
   * far as the cap. The search asks with keys that only fall, so the first answer is kept and
   * serves every later, lower cap.
   */
  cappedAt(cell: number, keyMm: number): number {
    const known = this.cappedMm[cell]!;
    if (known > 0) return known - 1 < keyMm ? known - 1 : keyMm;
    const cellMm = this.grid.cellMm;
    const nearSideMm = (Math.sqrt(this.squaredCells[cell]!) - 0.5) * cellMm;
    let widthMm: number;
    if (2 * nearSideMm >= this.enoughMm) widthMm = 2 * nearSideMm;
    else {
      const runMm = this.shortestRunMm[cell]!;
      // A chord across found past the cap, like one past the shortest run, cannot change the answer.
      widthMm =
        runMm <= nearSideMm + cellMm / 2 ? runMm : Math.min(this.across(cell, Math.min(this.enoughMm, runMm, keyMm)), runMm);
    }
    const capped = Math.floor(Math.min(widthMm, keyMm));
    this.cappedMm[cell] = capped + 1;
    return capped;
  }

  /**
   * Whether the width at a cell is already known to be more than widthMm, so it need not be
   * measured exactly to be compared: the search's capped answer c means at least c; and with d the
   * distance (cells) to the nearest blocked centre, every chord is at least (2d − 1.71) cells long
   * (a run's ends lie at least d away on either side, less one step of at most √2 cells; the chord
   * across reaches a sample within √½ cell of a blocked centre, and both ends lose half a cell).
   */
  knownWiderThan(cell: number, widthMm: number): boolean {
    if (this.cappedMm[cell]! - 1 > Math.floor(widthMm)) return true;
    return (2 * Math.sqrt(this.squaredCells[cell]!) - CHORD_SHORTFALL_CELLS) * this.grid.cellMm > widthMm;
  }

  /** A cheap floor under the width at a free cell (mm): twice the distance to the nearest obstacle. */
  lowerBoundMm(cell: number): number {
    return 2 * (Math.sqrt(this.squaredCells[cell]!) - 0.5) * this.grid.cellMm;
  }

  /** Clear width (mm) at a free cell; Infinity where nothing movable bounds it within reach. */
  at(cell: number): number {
    const known = this.widthMm[cell]!;
    if (!Number.isNaN(known)) return known;
    const value = this.value(cell);
    this.widthMm[cell] = value;
    return value;
  }

  /**
   * Distance (mm) from cell (i, j)'s centre to the edge of the first blocked cell along (ux, uy),
   * looking no further than reachMm; the cell met is left in `rayHit`. Infinity when none is met.
   */
  private ray(i: number, j: number, ux: number, uy: number, reachMm: number): number {
    const { nx, ny, label, cellMm } = this.grid;
    const reachCells = reachMm / cellMm + 1;
    const squared = this.squaredCells;
    let t = RAY_STEP_CELLS;
    while (t <= reachCells) {
      // Cell coordinates: the blocked ring keeps them at zero or more, where |0 rounds like floor.
      const ci = (i + ux * t + 0.5) | 0;
      const cj = (j + uy * t + 0.5) | 0;
      // Padding keeps a blocked ring round the room, so a ray always meets one before the grid ends.
      const other = cj * nx + ci;
      if (ci < 0 || cj < 0 || ci >= nx || cj >= ny || label[other] !== FREE) {
        this.rayHit = other;
        return (t - RAY_STEP_CELLS / 2) * cellMm;
      }
      // Skip ahead through open floor: no blocked centre lies nearer than this cell's distance, and
      // a sample strays at most √½ cell from the centre it rounds to, on either end of the jump.
      t += Math.max(RAY_STEP_CELLS, Math.floor(Math.sqrt(squared[other]!) - RAY_SKIP_MARGIN_CELLS));
    }
    return Infinity;
  }

  private bothWalls(a: number, b: number): boolean {
    return this.grid.label[a] === WALL && this.grid.label[b] === WALL;
  }

  /** The chord across from the nearest obstacle: its length (mm) and far end, or Infinity. */
  private across(cell: number, reachMm: number): number {
    const { nx, cellMm } = this.grid;
    const nearestCell = this.nearest[cell]!;
    const d1 = Math.sqrt(this.squaredCells[cell]!);
    const nearSideMm = (d1 - 0.5) * cellMm;
    const i = cell % nx;
    const j = (cell - i) / nx;
    const farSideMm = this.ray(
      i,
      j,
      (i - (nearestCell % nx)) / d1,
      (j - Math.floor(nearestCell / nx)) / d1,
      reachMm - nearSideMm,
    );
    return farSideMm < Infinity && !this.bothWalls(nearestCell, this.rayHit) ? nearSideMm + farSideMm : Infinity;
  }

  /**
   * The width alone. The straight runs are known, so the chord across need only be looked for as
   * far as it could still be the shorter: a chord found past that is longer than a run anyway.
   */
  private value(cell: number): number {
    const nearSideMm = (Math.sqrt(this.squaredCells[cell]!) - 0.5) * this.grid.cellMm;
    if (2 * nearSideMm >= this.enoughMm) return 2 * nearSideMm;
    const runMm = this.shortestRunMm[cell]!;
    // The far side lies at least half a cell off, so a run that short already wins.
    if (runMm <= nearSideMm + this.grid.cellMm / 2) return runMm;
    return Math.min(this.across(cell, Math.min(this.enoughMm, runMm)), runMm);
  }

  /** The obstacles at the two ends of a measured cell's chord and where they are (plan mm), or null if it is wide. */
  gap(cell: number): Gap | null {
    const { nx, cellMm, label } = this.grid;
    const nearSideMm = (Math.sqrt(this.squaredCells[cell]!) - 0.5) * cellMm;
    if (!Number.isFinite(this.at(cell)) || 2 * nearSideMm >= this.enoughMm) return null;
    // The chord that gave the width: the one across first, then the runs in their order.
    let widthMm = this.across(cell, this.enoughMm);
    let endA = -1;
    let endB = -1;
    if (widthMm < Infinity) {
      endA = this.nearest[cell]!;
      endB = this.rayHit;
    }
    for (let k = 0; k < RUN_DIRECTIONS.length; k++) {
      const [di, dj] = RUN_DIRECTIONS[k]!;
      const step = dj * nx + di;
      let back = cell - step;
      while (label[back] === FREE) back -= step;
      let ahead = cell + step;
      while (label[ahead] === FREE) ahead += step;
      const steps = k === 1 ? (ahead - back) / nx : (ahead % nx) - (back % nx);
      const runMm = (steps - 1) * cellMm * RUN_STEP_CELLS[k]!;
      if (runMm < widthMm && !this.bothWalls(back, ahead)) {
        widthMm = runMm;
        endA = back;
        endB = ahead;
      }
    }
    if (endA < 0) return null;
    return {
      sides: [label[endA]!, label[endB]!],
      ends: [cellCentreMm(this.grid, endA), cellCentreMm(this.grid, endB)],
    };
  }
}

/**
 * Cells waiting to be searched, filed by bottleneck width in whole millimetres up to the walkway
 * width (anything wider is as good as the walkway). The widest is taken first; a route never widens
 * as it goes on, so the search only moves down the buckets and each step is constant time.
 */
class WidestFirst {
  private readonly heads: Int32Array;
  private cells = new Int32Array(4096);
  private next = new Int32Array(4096);
  private count = 0;
  private top: number;

  constructor(private readonly limitMm: number) {
    this.heads = new Int32Array(limitMm + 1).fill(-1);
    this.top = limitMm;
  }

  push(cell: number, keyMm: number): void {
    if (this.count === this.cells.length) {
      const cells = new Int32Array(this.count * 2);
      cells.set(this.cells);
      this.cells = cells;
      const next = new Int32Array(this.count * 2);
      next.set(this.next);
      this.next = next;
    }
    const entry = this.count++;
    this.cells[entry] = cell;
    this.next[entry] = this.heads[keyMm]!;
    this.heads[keyMm] = entry;
  }

  /** Takes the widest waiting cell, or −1 when none waits; its key (mm) is then `keyMm`. */
  pop(): number {
    while (this.top >= 0 && this.heads[this.top]! < 0) this.top--;
    if (this.top < 0) return -1;
    const entry = this.heads[this.top]!;
    this.heads[this.top] = this.next[entry]!;
    return this.cells[entry]!;
  }

  /** Key (mm) of the cell last taken. */
  get keyMm(): number {
    return this.top;
  }
}

interface Routes {
  /** Best bottleneck width (whole mm, at most the walkway width) from any way in to each free cell; −1 where no route reaches. */
  bottleneckMm: Int32Array;
  /** The cell each best route came from; −1 at a way in. */
  parent: Int32Array;
  /** For a way-in cell, the index of its opening; −1 elsewhere. */
  wayIn: Int32Array;
  /** Filled in by routeNarrowest as it is asked: the narrowest cell on the route from each cell; −1 until asked. */
  narrowest: Int32Array;
  /** Filled in by routeNarrowest beside `narrowest`: the way-in cell the route from each cell starts at. */
  start: Int32Array;
}

/**
 * Widest routes from the way-in cells over free cells, four neighbours each (diagonal steps could
 * slip between two blocked cells meeting at a corner): a Dijkstra search that always extends the
 * route with the widest bottleneck so far, so each cell ends with the widest route that reaches it.
 * Keys only fall as the search goes on, so a cell taken at its own key is settled: a later key
 * cannot beat it, and no separate record of settled cells is needed.
 */
function widestRoutes(
  grid: FloorGrid,
  widths: Widths,
  sources: readonly { cell: number; opening: number }[],
  limitMm: number,
): Routes {
  const cells = grid.nx * grid.ny;
  const { nx, label } = grid;
  const bottleneckMm = scratch('bottleneck', int32, cells);
  for (let cell = 0; cell < cells; cell++) bottleneckMm[cell] = label[cell] === FREE ? -1 : BLOCKED_KEY;
  const parent = scratch('parent', int32, cells).fill(-1);
  const wayIn = scratch('way-in', int32, cells).fill(-1);
  const queue = new WidestFirst(limitMm);
  for (const { cell, opening } of sources) {
    const key = Math.floor(Math.min(widths.at(cell), limitMm));
    if (key <= bottleneckMm[cell]!) continue;
    bottleneckMm[cell] = key;
    wayIn[cell] = opening;
    queue.push(cell, key);
  }
  for (let cell = queue.pop(); cell >= 0; cell = queue.pop()) {
    const keyMm = queue.keyMm;
    if (keyMm < bottleneckMm[cell]!) continue;
    // Padding keeps the grid's edge blocked, so a free cell's neighbours are all on the grid.
    for (let n = 0; n < 4; n++) {
      const next = n === 0 ? cell - 1 : n === 1 ? cell + 1 : n === 2 ? cell - nx : cell + nx;
      const known = bottleneckMm[next]!;
      if (known >= keyMm) continue;
      // Where even the nearest obstacle leaves room for the route so far, the cell cannot narrow it.
      const through = widths.lowerBoundMm(next) >= keyMm ? keyMm : widths.cappedAt(next, keyMm);
      if (through > known) {
        bottleneckMm[next] = through;
        parent[next] = cell;
        queue.push(next, through);
      }
    }
  }
  for (let cell = 0; cell < cells; cell++) if (bottleneckMm[cell] === BLOCKED_KEY) bottleneckMm[cell] = -1;
  const narrowest = scratch('narrowest', int32, cells).fill(-1);
  const start = scratch('start', int32, cells);
  return { bottleneckMm, parent, wayIn, narrowest, start };
}

/**
 * The narrowest cell (least exact width) on the best route from a cell back to its way in, the
 * nearest to the cell among equals; and, in `routes.start`, the way-in cell the route ends at. The
 * routes form a tree, so each cell's answer is its own or its parent's: every cell is worked out
 * once and kept, however many pieces' routes run through it. A cell known to be wider than the
 * narrowest beyond it is passed over without measuring its width exactly.
 */
function routeNarrowest(widths: Widths, routes: Routes): (cell: number) => number {
  const narrowest = routes.narrowest;
  const path: number[] = [];
  return (from: number): number => {
    path.length = 0;
    for (let cell = from; narrowest[cell]! < 0;) {
      path.push(cell);
      cell = routes.parent[cell]!;
      if (cell < 0) break;
    }
    // From the end nearest the way in back towards the asking cell, each parent already answered.
    for (let k = path.length - 1; k >= 0; k--) {
      const cell = path[k]!;
      const up = routes.parent[cell]!;
      if (up < 0) {
        narrowest[cell] = cell;
        routes.start[cell] = cell;
        continue;
      }
      routes.start[cell] = routes.start[up]!;
      const beyond = narrowest[up]!;
      const beyondMm = widths.at(beyond);
      narrowest[cell] = !widths.knownWiderThan(cell, beyondMm) && widths.at(cell) <= beyondMm ? cell : beyond;
    }
    return narrowest[from]!;
  };
}

/** Free cells in the patch of floor before one face of a box, FRONT_STRIP_MM deep. */
function faceCells(grid: FloorGrid, box: PieceBox, face: Face): Patch {
  const { along, out, halfAlongMm, halfOutMm } = faceFrame(box, face);
  const reachMm = halfOutMm + FRONT_STRIP_MM;
  const corners: Vec2[] = [
    addScaled(addScaled(box.centre, along, -halfAlongMm), out, halfOutMm),
    addScaled(addScaled(box.centre, along, halfAlongMm), out, halfOutMm),
    addScaled(addScaled(box.centre, along, halfAlongMm), out, reachMm),
    addScaled(addScaled(box.centre, along, -halfAlongMm), out, reachMm),
  ];
  const { nx, cellMm, originX, originY, label } = grid;
  const xs = corners.map((c) => c[0]);
  const ys = corners.map((c) => c[1]);
  const i0 = Math.max(0, Math.floor((Math.min(...xs) - originX) / cellMm));
  const i1 = Math.min(nx - 1, Math.floor((Math.max(...xs) - originX) / cellMm));
  const j0 = Math.max(0, Math.floor((Math.min(...ys) - originY) / cellMm));
  const j1 = Math.min(grid.ny - 1, Math.floor((Math.max(...ys) - originY) / cellMm));
  const found: Patch = { faceMm: 2 * halfAlongMm, cells: [], alongMm: [] };
  for (let j = j0; j <= j1; j++) {
    for (let i = i0; i <= i1; i++) {
      const cell = j * nx + i;
      if (label[cell] !== FREE) continue;
      const dx = originX + (i + 0.5) * cellMm - box.centre[0];
      const dy = originY + (j + 0.5) * cellMm - box.centre[1];
      const u = dx * along[0] + dy * along[1];
      const v = dx * out[0] + dy * out[1];
      if (Math.abs(u) <= halfAlongMm && v >= halfOutMm && v <= reachMm) {
        found.cells.push(cell);
        found.alongMm.push(u);
      }
    }
  }
  return found;
}

/** A plan point (mm) to a tenth of a millimetre, dropping arithmetic noise from reports. */
function roundPoint(p: Vec2): [number, number] {
  return [Math.round(p[0] * 10) / 10, Math.round(p[1] * 10) / 10];
}

/** The nearest wall (inside-face segment, plan mm) to a point outside the free floor. */
function nearestWall(outline: readonly Vec2[], p: Vec2): [Vec2, Vec2] {
  let best: [Vec2, Vec2] = [itemAt(outline, 0, 'corner'), itemAt(outline, 1 % outline.length, 'corner')];
  let bestMm = Infinity;
  for (let k = 0; k < outline.length; k++) {
    const a = outline[k]!;
    const b = outline[(k + 1) % outline.length]!;
    const d = distanceToSegmentMm(p, a, b);
    if (d < bestMm) {
      bestMm = d;
      best = [a, b];
    }
  }
  return best;
}

function sideShape(side: number, end: Vec2, obstacles: readonly PieceBox[], outline: readonly Vec2[]): readonly Vec2[] {
  return side === WALL ? nearestWall(outline, end) : itemAt(obstacles, side, 'obstacle').corners;
}

function sideName(side: number, obstacles: readonly PieceBox[]): string {
  return side === WALL ? 'the wall' : theName(itemAt(obstacles, side, 'obstacle').piece);
}

/**
 * `narrow-walkway` and `unreachable` for placed pieces (plan mm), with `walkwayMm` the clear width a
 * route needs. Routes start just inside every door and passage; a room with neither has no way in to
 * judge from, so it gets no walkway findings. Pieces walked over (rugs) or under (hung at or above
 * the head clearance) neither block a route nor need one (geometry/piece: blocksWalking). Where each
 * piece is reached from, and at what width, is reach.ts's: `walkwayMm` for most, less for some kinds.
 */
export function findWalkwayProblems(shell: RoomShell, boxes: readonly PieceBox[], walkwayMm: number): Finding[] {
  const ways = shell.openings.filter((o) => o.type !== 'window' && o.wall < shell.outline.length);
  if (ways.length === 0) return [];
  const outline = shell.outline;
  const obstacles = boxes.filter((box) => blocksWalking(box.piece));
  const { filled, owner } = withSeatGaps(obstacles);
  const grid = rasteriseFloor(outline, filled, WALKWAY_CELL_MM);
  const ownerOf = (side: number) => (side === WALL ? WALL : itemAt(owner, side, 'obstacle'));

  // The floor cells just inside each way in, sampled every half cell along its width.
  const walls = layoutShellWalls(shell);
  const sources: { cell: number; opening: number }[] = [];
  ways.forEach((way, opening) => {
    const wall = itemAt(walls, way.wall, 'wall');
    const placement = placeOpening(wall, way);
    const inward: Vec2 = [-wall.outward[0], -wall.outward[1]];
    for (let s = 0; s <= way.width; s += grid.cellMm / 2) {
      const cell = cellAt(grid, addScaled(addScaled(placement.insideStart, wall.direction, s), inward, grid.cellMm));
      if (cell >= 0 && grid.label[cell] === FREE) sources.push({ cell, opening });
    }
  });
  const limitMm = Math.ceil(walkwayMm);
  const widths = new Widths(grid, walkwayMm);
  const routes = widestRoutes(grid, widths, sources, limitMm);

  const findings: Finding[] = [];
  const narrowestOnRoute = routeNarrowest(widths, routes);
  obstacles.forEach((box, index) => {
    // A piece wholly outside the room is an outside-room finding; a route to it means nothing.
    if (!pointInPolygon(box.centre, outline)) return;
    const piece = box.piece;
    const needs = reachNeeds(box, boxes, walkwayMm);
    const patchOf = (way: ReachWay) => faceCells(grid, way.box ?? box, way.face);
    const verdict = judgeReach(needs, patchOf, routes.bottleneckMm, MIN_FRONT_CELLS, grid.cellMm);
    if (verdict === 'reached') return;
    if (verdict.short === null) {
      findings.push({
        kind: 'unreachable',
        pieces: [piece.id],
        openings: ways.map((w) => w.id).sort(),
        message: unreachableMessage(piece, verdict.need),
      });
      return;
    }
    const { cell: bestCell, bottleneckMm, requiredMm } = verdict.short;

    // The route's narrowest cell is where the bottleneck is; the route ends at a way in.
    const narrowest = narrowestOnRoute(bestCell);
    const opening = itemAt(ways, routes.wayIn[routes.start[bestCell]!]!, 'way in');
    const finding = describeGap(piece, index, narrowest, bottleneckMm, requiredMm);
    // The exact distance may show the grid's narrow spot to be wide enough after all.
    if ((finding.measuredMm ?? 0) < requiredMm) findings.push({ ...finding, openings: [opening.id] });
  });
  return findings;

  function describeGap(piece: Piece, index: number, cell: number, gridWidthMm: number, requiredMm: number): Finding {
    const at = cellCentreMm(grid, cell);
    const gap = widths.gap(cell);
    let widthMm = gridWidthMm;
    let between: Finding['between'];
    let words: string;
    const involved: string[] = [];
    if (gap) {
      const [sideA, sideB] = gap.sides;
      // The exact distance between the two sides, when it tells the same story as the grid.
      const shapeA = sideShape(sideA, gap.ends[0], filled, outline);
      const shapeB = sideShape(sideB, gap.ends[1], filled, outline);
      const exact = closestPair(shapeA, shapeB);
      if (Math.abs(exact.distanceMm - gridWidthMm) <= SNAP_CELLS * grid.cellMm) {
        widthMm = exact.distanceMm;
        // Parallel faces are closest all along; draw the gap through the narrow spot itself.
        const throughA = closestOnShape(at, shapeA);
        const throughB = closestOnShape(at, shapeB);
        const acrossMm = Math.hypot(throughA[0] - throughB[0], throughA[1] - throughB[1]);
        between = acrossMm - exact.distanceMm <= SNAP_TOLERANCE_MM ? [throughA, throughB] : [exact.from, exact.to];
      } else {
        between = [gap.ends[0], gap.ends[1]];
      }
      // Pieces before walls, and pieces in the designer's order; a filled gap goes by its seat.
      const [ownA, ownB] = [ownerOf(sideA), ownerOf(sideB)];
      const sides: [number, number] = [ownA, ownB];
      sides.sort((a, b) => (a === WALL ? 1 : b === WALL ? -1 : a - b));
      words = ` between ${sideName(sides[0], obstacles)} and ${sideName(sides[1], obstacles)}`;
      for (const side of sides) if (side !== WALL && side !== index) involved.push(itemAt(obstacles, side, 'obstacle').piece.id);
      if (ownA !== index && ownB !== index) words += ` to reach ${theName(piece)}`;
    } else {
      words = ` on the way to ${theName(piece)}`;
    }
    const measuredMm = roundToCmMm(widthMm);
    return {
      kind: 'narrow-walkway',
      pieces: [piece.id, ...new Set(involved)],
      openings: [],
      message: capitalise(`only ${cmText(measuredMm)} to pass${words}`),
      measuredMm,
      requiredMm: roundToCmMm(requiredMm),
      at: roundPoint(at),
      ...(between ? { between: [roundPoint(between[0]), roundPoint(between[1])] } : {}),
    };
  }
}
