// The walkway check's computing core on the floor grid: the clear width at each free cell, the
// widest routes from the ways in, and the narrowest cell on a route. Plan mm, x right, y down; cells
// as in floor-grid.ts. Which pieces need a route and what a finding says live in walkway.ts.
import { cellCentreMm, distanceField, float64, FREE, int32, scratch, WALL, type FloorGrid } from './floor-grid';

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

export interface Gap {
  /** Obstacle labels either side: a box index, or WALL. */
  sides: [number, number];
  /** Plan points on each side (mm). */
  ends: [[number, number], [number, number]];
}

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
export class Widths {
  /** Exact width (mm) at each cell, NaN until measured. */
  private readonly widthMm: Float64Array;
  /** Whole-mm width capped at the key it was first asked for, plus one; 0 until asked. */
  private readonly cappedMm: Int32Array;
  private readonly nearest: Int32Array;
  /** Distance (cells) from each cell's centre to the nearest blocked centre. */
  private readonly distanceCells: Float64Array;
  private readonly shortestRunMm: Float64Array;
  private readonly label: Int32Array;
  private readonly nx: number;
  private readonly ny: number;
  private readonly cellMm: number;
  /** Set by `ray`: the blocked cell it met. */
  private rayHit = -1;

  constructor(
    private readonly grid: FloorGrid,
    /** Widths at or beyond this (mm) are wide enough; they are not measured further. */
    private readonly enoughMm: number,
  ) {
    const field = distanceField(grid);
    this.nearest = field.nearest;
    this.distanceCells = field.cells;
    this.shortestRunMm = shortestRunsMm(grid);
    this.label = grid.label;
    this.nx = grid.nx;
    this.ny = grid.ny;
    this.cellMm = grid.cellMm;
    const cells = grid.nx * grid.ny;
    this.widthMm = scratch('width', float64, cells).fill(NaN);
    this.cappedMm = scratch('capped', int32, cells).fill(0);
  }

  /**
   * The width at a free cell in whole mm, capped at keyMm: as `at` gives it, but measured only as
   * far as the cap. The search asks with keys that only fall, so the first answer is kept and
   * serves every later, lower cap; when the measure under the cap gave the exact width, that is
   * kept for `at` too.
   */
  cappedAt(cell: number, keyMm: number): number {
    const known = this.cappedMm[cell]!;
    if (known > 0) return known - 1 < keyMm ? known - 1 : keyMm;
    const widthMm = this.measure(cell, keyMm);
    const capped = Math.floor(widthMm < keyMm ? widthMm : keyMm);
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
    return (2 * this.distanceCells[cell]! - CHORD_SHORTFALL_CELLS) * this.cellMm > widthMm;
  }

  /** A cheap floor under the width at a free cell (mm): twice the distance to the nearest obstacle. */
  lowerBoundMm(cell: number): number {
    return 2 * (this.distanceCells[cell]! - 0.5) * this.cellMm;
  }

  /** Clear width (mm) at a free cell; Infinity where nothing movable bounds it within reach. */
  at(cell: number): number {
    const known = this.widthMm[cell]!;
    if (known === known) return known;
    return this.measure(cell, Infinity);
  }

  /**
   * Whether the clear width at a free cell is at most limitMm: as `at(cell) <= limitMm`, but the
   * chord across is looked for only as far as the limit (a chord found is the same however far one
   * looks, and one past the limit is too long to matter).
   */
  atMost(cell: number, limitMm: number): boolean {
    const known = this.widthMm[cell]!;
    if (known === known) return known <= limitMm;
    return this.measure(cell, limitMm) <= limitMm;
  }

  /**
   * Distance (mm) from cell (i, j)'s centre to the edge of the first blocked cell along (ux, uy),
   * looking no further than reachMm; the cell met is left in `rayHit`. Infinity when none is met.
   * The samples are the same however far it looks: a shorter look meets what a longer one would,
   * if it meets anything.
   */
  private ray(i: number, j: number, ux: number, uy: number, reachMm: number): number {
    const { nx, ny, label, cellMm } = this;
    const reachCells = reachMm / cellMm + 1;
    const distance = this.distanceCells;
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
      const skip = Math.floor(distance[other]! - RAY_SKIP_MARGIN_CELLS);
      t += skip > RAY_STEP_CELLS ? skip : RAY_STEP_CELLS;
    }
    return Infinity;
  }

  private bothWalls(a: number, b: number): boolean {
    return this.label[a] === WALL && this.label[b] === WALL;
  }

  /** The chord across from the nearest obstacle: its length (mm) and far end, or Infinity. */
  private across(cell: number, reachMm: number): number {
    const { nx, cellMm } = this;
    const nearestCell = this.nearest[cell]!;
    const d1 = this.distanceCells[cell]!;
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
   * Whether the nearest blocked cell is in the cell's own row or column. Then the chord across runs
   * along that row or column from the nearest blocked cell, sampling its cell centres one by one:
   * it is the straight run there, to the same blocked cell and the same length (both are whole and
   * half cells, exact in floating point), so it can never be shorter than the shortest run.
   */
  private inLineWithNearest(cell: number): boolean {
    const nearestCell = this.nearest[cell]!;
    const nx = this.nx;
    return nearestCell % nx === cell % nx || Math.floor(nearestCell / nx) === Math.floor(cell / nx);
  }

  /**
   * The width, looked for no further than capMm: exact (and kept) whenever it is at most the cap or
   * the look was not cut short by it; otherwise some figure above the cap. The straight runs are
   * known, so the chord across need only be looked for as far as it could still be the shorter: a
   * chord found past that is longer than a run anyway.
   */
  private measure(cell: number, capMm: number): number {
    const cellMm = this.cellMm;
    const nearSideMm = (this.distanceCells[cell]! - 0.5) * cellMm;
    let widthMm: number;
    if (2 * nearSideMm >= this.enoughMm) widthMm = 2 * nearSideMm;
    else {
      const runMm = this.shortestRunMm[cell]!;
      // The far side lies at least half a cell off, so a run that short already wins.
      if (runMm <= nearSideMm + cellMm / 2 || this.inLineWithNearest(cell)) widthMm = runMm;
      else {
        const reachMm = Math.min(this.enoughMm, runMm);
        const acrossMm = this.across(cell, reachMm < capMm ? reachMm : capMm);
        // Nothing met within the cap when the cap cut the look short: only "wider than the cap" is known.
        if (acrossMm === Infinity && capMm < reachMm) return Infinity;
        widthMm = acrossMm < runMm ? acrossMm : runMm;
      }
    }
    this.widthMm[cell] = widthMm;
    return widthMm;
  }

  /** The obstacles at the two ends of a measured cell's chord and where they are (plan mm), or null if it is wide. */
  gap(cell: number): Gap | null {
    const { nx, cellMm, label } = this;
    const nearSideMm = (this.distanceCells[cell]! - 0.5) * cellMm;
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
  private cells: Int32Array;
  private next: Int32Array;
  private count = 0;
  private top: number;

  /** A queue for keys up to limitMm, with room to begin with for `room` entries (about one a free cell is usual). */
  constructor(limitMm: number, room: number) {
    this.heads = new Int32Array(limitMm + 1).fill(-1);
    this.top = limitMm;
    this.cells = scratch('queue-cells', int32, Math.max(room, 16));
    this.next = scratch('queue-next', int32, Math.max(room, 16));
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

export interface Routes {
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
export function widestRoutes(
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
  const queue = new WidestFirst(limitMm, cells);
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
export function routeNarrowest(widths: Widths, routes: Routes): (cell: number) => number {
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
      narrowest[cell] = !widths.knownWiderThan(cell, beyondMm) && widths.atMost(cell, beyondMm) ? cell : beyond;
    }
    return narrowest[from]!;
  };
}
