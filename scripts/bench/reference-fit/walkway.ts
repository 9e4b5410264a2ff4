// The fit check as it stood before the speed work, frozen: the bench times it beside today's and
// tests/reference/fit-reference.test.ts checks both give the same findings. Do not edit.
// `narrow-walkway` and `unreachable`: can a person walk from a door or passage to the front of each
// piece, and how narrow is the tightest spot on the best route? Plan mm, x right, y down.
import { placeOpening } from '../../../shared/geometry/openings';
import { reachWidthMm } from '../../../shared/analysis/fit/clearances';
import { layoutShellWalls } from '../../../shared/geometry/walls';
import { addScaled, type Vec2 } from '../../../shared/geometry/vec';
import type { Piece } from '../../../shared/schemas/option';
import type { RoomShell } from '../../../shared/schemas/room';
import type { Finding } from '../../../shared/analysis/fit/finding';
import { closestOnShape, closestPair, distanceToSegmentMm, type PieceBox } from '../../../shared/analysis/fit/boxes';
import { blocksWalking } from '../../../shared/geometry/piece';
import { pointInPolygon } from '../../../shared/geometry/polygon';
import { cellAt, cellCentreMm, distanceField, FREE, rasteriseFloor, WALL, type FloorGrid } from './floor-grid';
import { capitalise, cmText, roundToCmMm, theName } from '../../../shared/analysis/fit/messages';

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
/** Samples along a ray, in cells, starting at the next cell's centre: on a square room's grid they
 * land on cell centres, so a hit puts the edge half a step back. A whole-cell step may pass the
 * corner of an obstacle thinner than a cell on a slant; pieces are thicker than that. */
const RAY_STEP_CELLS = 1;
/** Kept back from a skip ahead along a ray, in cells: twice the √½ cell a sample may stray from a centre, rounded up. */
const RAY_SKIP_MARGIN_CELLS = 1.5;

interface Gap {
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
 * The clear width at each free cell: the shortest chord through it from obstacle to obstacle. One
 * chord runs from the nearest obstacle straight across (at a piece's face, the room in front of it;
 * between two pieces, the gap wherever in the gap the cell lies); four more run along x, y and the
 * diagonals, so the end of a recess reads as narrow as its middle. Those four are counted once for
 * the whole grid. A chord with a wall at both ends is the room's own shape (a doorway's reveals, an
 * alcove): the designer cannot move it, so it does not count. Widths are found on demand and kept.
 */
class Widths {
  private readonly widthMm: Float64Array;
  /** The cells at the two ends of the chord that gave each width (−1 before it is measured). */
  private readonly endA: Int32Array;
  private readonly endB: Int32Array;
  private readonly nearest: Int32Array;
  private readonly squaredCells: Float64Array;
  /** Per run direction, the blocked cell ending each free cell's run behind it and ahead of it. */
  private readonly runBack: Int32Array[];
  private readonly runAhead: Int32Array[];
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
    const cells = grid.nx * grid.ny;
    this.widthMm = new Float64Array(cells).fill(NaN);
    this.endA = new Int32Array(cells).fill(-1);
    this.endB = new Int32Array(cells).fill(-1);
    this.runBack = RUN_DIRECTIONS.map(([di, dj]) => this.runEnds(-di, -dj));
    this.runAhead = RUN_DIRECTIONS.map(([di, dj]) => this.runEnds(di, dj));
  }

  /**
   * For every free cell, the first blocked cell met stepping (di, dj) from it. Cells are visited so
   * that the neighbour in that direction is settled first; the blocked ring round the grid ends every run.
   */
  private runEnds(di: number, dj: number): Int32Array {
    const { nx, ny, label } = this.grid;
    const ends = new Int32Array(nx * ny).fill(-1);
    const step = dj * nx + di;
    for (let jj = 0; jj < ny; jj++) {
      const j = dj > 0 ? ny - 1 - jj : jj;
      for (let ii = 0; ii < nx; ii++) {
        const i = di > 0 ? nx - 1 - ii : ii;
        const cell = j * nx + i;
        if (label[cell] !== FREE) continue;
        const next = cell + step;
        ends[cell] = label[next] !== FREE ? next : ends[next];
      }
    }
    return ends;
  }

  /** A cheap floor under the width at a free cell (mm): twice the distance to the nearest obstacle. */
  lowerBoundMm(cell: number): number {
    return 2 * (Math.sqrt(this.squaredCells[cell]) - 0.5) * this.grid.cellMm;
  }

  /** Clear width (mm) at a free cell; Infinity where nothing movable bounds it within reach. */
  at(cell: number): number {
    const known = this.widthMm[cell];
    if (!Number.isNaN(known)) return known;
    const value = this.measure(cell);
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
      t += Math.max(RAY_STEP_CELLS, Math.floor(Math.sqrt(squared[other]) - RAY_SKIP_MARGIN_CELLS));
    }
    return Infinity;
  }

  private bothWalls(a: number, b: number): boolean {
    return this.grid.label[a] === WALL && this.grid.label[b] === WALL;
  }

  private measure(cell: number): number {
    const { nx, cellMm } = this.grid;
    const nearestCell = this.nearest[cell];
    const d1 = Math.sqrt(this.squaredCells[cell]);
    // Cell centres stand half a cell, on average, off the obstacle's true edge.
    const nearSideMm = (d1 - 0.5) * cellMm;
    if (2 * nearSideMm >= this.enoughMm) return 2 * nearSideMm;
    const i = cell % nx;
    const j = (cell - i) / nx;
    let widthMm = Infinity;
    const farSideMm = this.ray(
      i,
      j,
      (i - (nearestCell % nx)) / d1,
      (j - Math.floor(nearestCell / nx)) / d1,
      this.enoughMm - nearSideMm,
    );
    if (farSideMm < Infinity && !this.bothWalls(nearestCell, this.rayHit)) {
      widthMm = nearSideMm + farSideMm;
      this.endA[cell] = nearestCell;
      this.endB[cell] = this.rayHit;
    }
    for (let k = 0; k < RUN_DIRECTIONS.length; k++) {
      const back = this.runBack[k][cell];
      const ahead = this.runAhead[k][cell];
      // The free cells between the two ends, each a step long: their edges are the obstacles' edges.
      // Every direction moves one column a step except straight down, which moves a whole row.
      const steps = k === 1 ? (ahead - back) / nx : (ahead % nx) - (back % nx);
      const runMm = (steps - 1) * cellMm * RUN_STEP_CELLS[k];
      if (runMm < widthMm && !this.bothWalls(back, ahead)) {
        widthMm = runMm;
        this.endA[cell] = back;
        this.endB[cell] = ahead;
      }
    }
    return widthMm;
  }

  /** The obstacles at the two ends of a measured cell's chord and where they are (plan mm), or null if it is wide. */
  gap(cell: number): Gap | null {
    if (!Number.isFinite(this.at(cell)) || this.endA[cell] < 0) return null;
    const a = this.endA[cell];
    const b = this.endB[cell];
    return {
      sides: [this.grid.label[a], this.grid.label[b]],
      ends: [cellCentreMm(this.grid, a), cellCentreMm(this.grid, b)],
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
    this.next[entry] = this.heads[keyMm];
    this.heads[keyMm] = entry;
  }

  /** Takes the widest waiting cell, or −1 when none waits; its key (mm) is then `keyMm`. */
  pop(): number {
    while (this.top >= 0 && this.heads[this.top] < 0) this.top--;
    if (this.top < 0) return -1;
    const entry = this.heads[this.top];
    this.heads[this.top] = this.next[entry];
    return this.cells[entry];
  }

  /** Key (mm) of the cell last taken. */
  get keyMm(): number {
    return this.top;
  }
}

interface Routes {
  /** Best bottleneck width (whole mm, at most the walkway width) from any way in to each cell; −1 where no route reaches. */
  bottleneckMm: Int32Array;
  /** The cell each best route came from; −1 at a way in. */
  parent: Int32Array;
  /** For a way-in cell, the index of its opening; −1 elsewhere. */
  wayIn: Int32Array;
}

/**
 * Widest routes from the way-in cells over free cells, four neighbours each (diagonal steps could
 * slip between two blocked cells meeting at a corner): a Dijkstra search that always extends the
 * route with the widest bottleneck so far, so each cell ends with the widest route that reaches it.
 */
function widestRoutes(
  grid: FloorGrid,
  widths: Widths,
  sources: readonly { cell: number; opening: number }[],
  limitMm: number,
): Routes {
  const cells = grid.nx * grid.ny;
  const bottleneckMm = new Int32Array(cells).fill(-1);
  const parent = new Int32Array(cells).fill(-1);
  const wayIn = new Int32Array(cells).fill(-1);
  const done = new Uint8Array(cells);
  const queue = new WidestFirst(limitMm);
  const keyOf = (widthMm: number): number => Math.floor(Math.min(widthMm, limitMm));
  for (const { cell, opening } of sources) {
    const key = keyOf(widths.at(cell));
    if (key <= bottleneckMm[cell]) continue;
    bottleneckMm[cell] = key;
    wayIn[cell] = opening;
    queue.push(cell, key);
  }
  const { nx, label } = grid;
  const steps = [-1, 1, -nx, nx];
  for (let cell = queue.pop(); cell >= 0; cell = queue.pop()) {
    const keyMm = queue.keyMm;
    if (done[cell] || keyMm < bottleneckMm[cell]) continue;
    done[cell] = 1;
    for (const step of steps) {
      // Padding keeps the grid's edge blocked, so a free cell's neighbours are all on the grid.
      const next = cell + step;
      if (label[next] !== FREE || done[next] || bottleneckMm[next] >= keyMm) continue;
      // Where even the nearest obstacle leaves room for the route so far, the cell cannot narrow it.
      const through = widths.lowerBoundMm(next) >= keyMm ? keyMm : Math.min(keyMm, keyOf(widths.at(next)));
      if (through > bottleneckMm[next]) {
        bottleneckMm[next] = through;
        parent[next] = cell;
        queue.push(next, through);
      }
    }
  }
  return { bottleneckMm, parent, wayIn };
}

/** Free cells in the patch of floor in front of a box's front face (its own +y). */
function frontCells(grid: FloorGrid, box: PieceBox): number[] {
  const reachMm = box.halfDepthMm + FRONT_STRIP_MM;
  const corners: Vec2[] = [
    addScaled(addScaled(box.centre, box.axisX, -box.halfWidthMm), box.axisY, box.halfDepthMm),
    addScaled(addScaled(box.centre, box.axisX, box.halfWidthMm), box.axisY, box.halfDepthMm),
    addScaled(addScaled(box.centre, box.axisX, box.halfWidthMm), box.axisY, reachMm),
    addScaled(addScaled(box.centre, box.axisX, -box.halfWidthMm), box.axisY, reachMm),
  ];
  const { nx, cellMm, originX, originY, label } = grid;
  const xs = corners.map((c) => c[0]);
  const ys = corners.map((c) => c[1]);
  const i0 = Math.max(0, Math.floor((Math.min(...xs) - originX) / cellMm));
  const i1 = Math.min(nx - 1, Math.floor((Math.max(...xs) - originX) / cellMm));
  const j0 = Math.max(0, Math.floor((Math.min(...ys) - originY) / cellMm));
  const j1 = Math.min(grid.ny - 1, Math.floor((Math.max(...ys) - originY) / cellMm));
  const found: number[] = [];
  for (let j = j0; j <= j1; j++) {
    for (let i = i0; i <= i1; i++) {
      const cell = j * nx + i;
      if (label[cell] !== FREE) continue;
      const dx = originX + (i + 0.5) * cellMm - box.centre[0];
      const dy = originY + (j + 0.5) * cellMm - box.centre[1];
      const u = dx * box.axisX[0] + dy * box.axisX[1];
      const v = dx * box.axisY[0] + dy * box.axisY[1];
      if (Math.abs(u) <= box.halfWidthMm && v >= box.halfDepthMm && v <= reachMm) found.push(cell);
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
  let best: [Vec2, Vec2] = [outline[0], outline[1 % outline.length]];
  let bestMm = Infinity;
  for (let k = 0; k < outline.length; k++) {
    const a = outline[k];
    const b = outline[(k + 1) % outline.length];
    const d = distanceToSegmentMm(p, a, b);
    if (d < bestMm) {
      bestMm = d;
      best = [a, b];
    }
  }
  return best;
}

function sideShape(side: number, end: Vec2, obstacles: readonly PieceBox[], outline: readonly Vec2[]): readonly Vec2[] {
  return side === WALL ? nearestWall(outline, end) : obstacles[side].corners;
}

function sideName(side: number, obstacles: readonly PieceBox[]): string {
  return side === WALL ? 'the wall' : theName(obstacles[side].piece);
}

/**
 * `narrow-walkway` and `unreachable` for placed pieces (plan mm), with `walkwayMm` the clear width a
 * route needs. Routes start just inside every door and passage; a room with neither has no way in to
 * judge from, so it gets no walkway findings. Rugs and pieces mounted overhead neither block a route
 * nor need one (they are reached over whatever stands below).
 */
export function findWalkwayProblems(shell: RoomShell, boxes: readonly PieceBox[], walkwayMm: number): Finding[] {
  const ways = shell.openings.filter((o) => o.type !== 'window' && o.wall < shell.outline.length);
  if (ways.length === 0) return [];
  const outline = shell.outline;
  const obstacles = boxes.filter((box) => blocksWalking(box.piece));
  const grid = rasteriseFloor(outline, obstacles, WALKWAY_CELL_MM);
  const widths = new Widths(grid, walkwayMm);

  // The floor cells just inside each way in, sampled every half cell along its width.
  const walls = layoutShellWalls(shell);
  const sources: { cell: number; opening: number }[] = [];
  ways.forEach((way, opening) => {
    const wall = walls[way.wall];
    const placement = placeOpening(wall, way);
    const inward: Vec2 = [-wall.outward[0], -wall.outward[1]];
    for (let s = 0; s <= way.width; s += grid.cellMm / 2) {
      const cell = cellAt(grid, addScaled(addScaled(placement.insideStart, wall.direction, s), inward, grid.cellMm));
      if (cell >= 0 && grid.label[cell] === FREE) sources.push({ cell, opening });
    }
  });
  const routes = widestRoutes(grid, widths, sources, Math.ceil(walkwayMm));

  const findings: Finding[] = [];
  obstacles.forEach((box, index) => {
    // A piece wholly outside the room is an outside-room finding; a route to it means nothing.
    if (!pointInPolygon(box.centre, outline)) return;
    const front = frontCells(grid, box);
    let bestCell = -1;
    let bottleneckMm = -1;
    for (const cell of front) {
      if (routes.bottleneckMm[cell] > bottleneckMm) {
        bottleneckMm = routes.bottleneckMm[cell];
        bestCell = cell;
      }
    }
    const piece = box.piece;
    const requiredMm = reachWidthMm(piece, walkwayMm);
    if (front.length < MIN_FRONT_CELLS || bottleneckMm < 0) {
      findings.push({
        kind: 'unreachable',
        pieces: [piece.id],
        openings: ways.map((w) => w.id).sort(),
        message: `The front of ${theName(piece)} cannot be reached from any door`,
      });
      return;
    }
    if (roundToCmMm(bottleneckMm) >= requiredMm) return;

    // Walk the route back to its way in; its narrowest cell is where the bottleneck is.
    let narrowest = bestCell;
    let cell = bestCell;
    while (routes.parent[cell] >= 0) {
      if (widths.at(cell) < widths.at(narrowest)) narrowest = cell;
      cell = routes.parent[cell];
    }
    if (widths.at(cell) < widths.at(narrowest)) narrowest = cell;
    const opening = ways[routes.wayIn[cell]];
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
      const shapeA = sideShape(sideA, gap.ends[0], obstacles, outline);
      const shapeB = sideShape(sideB, gap.ends[1], obstacles, outline);
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
      // Pieces before walls, and pieces in the designer's order.
      const sides = [sideA, sideB].sort((a, b) => (a === WALL ? 1 : b === WALL ? -1 : a - b));
      words = ` between ${sideName(sides[0], obstacles)} and ${sideName(sides[1], obstacles)}`;
      for (const side of sides) if (side !== WALL && side !== index) involved.push(obstacles[side].piece.id);
      if (sideA !== index && sideB !== index) words += ` to reach ${theName(piece)}`;
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
