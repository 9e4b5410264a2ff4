// The clear width at every free cell of the floor grid, for the walkway check, and how it is kept
// from one check of a room to the next: a drag moves one piece, so only what is known near it (and
// at the cells whose nearest obstacle or straight runs it changed) is forgotten, to be measured again
// when asked. Plan mm, x right, y down; cells as in floor-grid.ts.
import {
  cellCentreMm,
  FREE,
  nearestInRow,
  nearestRowsInColumns,
  refreshRowNearest,
  rowWork,
  WALL,
  type FloorGrid,
} from './floor-grid';

/** Samples along a ray, in cells, starting at the next cell's centre: on a square room's grid they
 * land on cell centres, so a hit puts the edge half a step back. A whole-cell step may pass the
 * corner of an obstacle thinner than a cell on a slant; pieces are thicker than that. */
const RAY_STEP_CELLS = 1;
/** How much shorter than twice the distance to the nearest blocked centre a chord can be, in cells: 1 + √½ for the chord across, √2 for a diagonal run, rounded up. */
const CHORD_SHORTFALL_CELLS = 1.75;
/** Kept back from a skip ahead along a ray, in cells: twice the √½ cell a sample may stray from a centre, rounded up. */
const RAY_SKIP_MARGIN_CELLS = 1.5;
/**
 * When the floor that changed since the last check, with the reach of a ray round it, covers more
 * than this share of the grid, every width is measured afresh: sorting out what moved would cost more.
 */
const FRESH_SHARE = 0.5;

/** A box of cells: first and last column, first and last row. */
export type CellBox = [number, number, number, number];

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

/** A run's free cells from the counts towards its two ends (each doubled, plus 1 for a wall there; both count the cell itself), 0 with walls at both ends. */
function runCount(back: number, forth: number): number {
  return (back & forth & 1) === 1 ? 0 : (back >> 1) + (forth >> 1) - 1;
}

/** The shorter (mm) of a run so far and one of `count` cells along run direction k. */
function shorterRun(shortestMm: number, count: number, cellMm: number, k: number): number {
  if (count === 0) return shortestMm;
  const runMm = count * cellMm * RUN_STEP_CELLS[k]!;
  return runMm < shortestMm ? runMm : shortestMm;
}

/**
 * The clear width at each free cell: the shortest chord through it from obstacle to obstacle. One
 * chord runs from the nearest obstacle straight across (at a piece's face, the room in front of it;
 * between two pieces, the gap wherever in the gap the cell lies); four more run along x, y and the
 * diagonals, so the end of a recess reads as narrow as its middle. A chord with a wall at both ends
 * is the room's own shape (a doorway's reveals, an alcove): the designer cannot move it, so it does
 * not count.
 *
 * Widths are measured as the search asks for them, only as far as it asks, and kept; `update`
 * takes the next labels of the same room and forgets what they change. A width depends on the
 * cell's nearest blocked cell, its four straight runs and the cells its chord across passes (all
 * within the walkway width of it), nothing else; so what is kept is forgotten exactly where one of
 * those changed, and every answer reads as it would measured afresh.
 */
export class Widths {
  /** The floor grid the widths are of; its labels are the latest given. */
  readonly grid: FloorGrid;
  /**
   * At each free cell, a whole-mm width a route may have without being narrowed there: twice the
   * distance to the nearest obstacle, or what is known of the width at the cell (capped at the
   * walkway width rounded up) where that is more. The search enters a cell at its route's width
   * when this allows it, and asks cappedAt only where it does not.
   */
  readonly gateMm: Int32Array;
  /** The whole-mm width capped at the walkway width (rounded up) where it is known exactly; −1 where not. */
  readonly exactKeyMm: Int32Array;
  /** Distance (cells) from each cell's centre to the nearest blocked centre. */
  readonly distanceCells: Float64Array;
  private readonly limitMm: number;
  private readonly nx: number;
  private readonly ny: number;
  private readonly cellMm: number;
  private readonly cells: number;
  /** Exact width (mm) at each cell, NaN until measured. */
  private readonly widthMm: Float64Array;
  /**
   * Where the cell's width was looked for with a ray across (what is known of it depends on the
   * floor that ray passed), 1 + how far the ray's samples lie from the cell at most, in cells along
   * x or y (255: too far to say); 0 where no ray was cast.
   */
  private readonly rayReach: Uint8Array;
  private readonly columnRow: Int32Array;
  private readonly nearest: Int32Array;
  /**
   * Free cells in the run through each cell along each run direction; 0 where the run does not
   * count (walls at both ends). A run is at most a grid side long: 50 m of 25 mm cells and the
   * padding (ROOM_LIMITS.sideMm; cells are never finer), and twice that and one while being
   * counted, well inside 16 bits; a longer grid counts in 32.
   */
  private readonly runCells: (Uint16Array | Int32Array)[];
  private readonly shortestRunMm: Float64Array;
  private readonly rowWork: ReturnType<typeof rowWork>;
  /** Each row's first and last column whose column answers an update changed. */
  private readonly changedColumns: { from: Int32Array; to: Int32Array };
  /** In each row, no cell's distance (cells) to the nearest blocked centre is more than this. */
  private readonly rowFarthest: Float64Array;
  /** Cells whose widths an update forgets, each listed once (`listed` marks them). */
  private readonly toForget: Int32Array;
  private readonly listed: Uint8Array;
  private forgetCount = 0;
  /** Cells whose run counts an update changed, each listed once (`touchedMark` marks them). */
  private readonly touched: Int32Array;
  private readonly touchedMark: Uint8Array;
  private touchedCount = 0;
  /** The latest update's cells a route search may tell apart (changedCells). */
  private readonly searchTurned: Int32Array;
  private readonly searchChanged: Int32Array;
  private turnedCount = 0;
  private changedCount = 0;
  /** Counts the changes: one for the fresh start and one for every update since. */
  private changes = 0;
  /** Whether the latest change was an update (what it forgot is listed), not a fresh start. */
  private updated = false;
  /** The latest update's box of cells that turned free or blocked. */
  private turnedBox: CellBox = [0, -1, 0, -1];
  /** Set by `ray`: the blocked cell it met. */
  private rayHit = -1;
  /** Set by `ray`: how far along it (cells) its last sample lay, or might have. */
  private rayLength = 0;

  constructor(
    grid: FloorGrid,
    /** Widths at or beyond this (mm) are wide enough; they are not measured further. */
    private readonly enoughMm: number,
    /** Widths done with, whose arrays these may take over where they are large enough. */
    reuse?: Widths,
  ) {
    this.grid = { ...grid };
    this.limitMm = Math.ceil(enoughMm);
    const { nx, ny, cellMm } = grid;
    this.nx = nx;
    this.ny = ny;
    this.cellMm = cellMm;
    const cells = nx * ny;
    this.cells = cells;
    const take = <T extends Int32Array | Float64Array | Uint16Array | Uint8Array>(
      old: T | undefined,
      make: (n: number) => T,
    ): T => (old && old.length >= cells && old.constructor === make(0).constructor ? (old.subarray(0, cells) as T) : make(cells));
    this.gateMm = take(reuse?.gateMm, int32);
    this.exactKeyMm = take(reuse?.exactKeyMm, int32);
    this.distanceCells = take(reuse?.distanceCells, float64);
    this.widthMm = take(reuse?.widthMm, float64);
    this.rayReach = take(reuse?.rayReach, uint8);
    this.columnRow = take(reuse?.columnRow, int32);
    this.nearest = take(reuse?.nearest, int32);
    // A grid longer than the schema allows (some caller's own outline) counts in 32 bits.
    const long = 2 * Math.max(nx, ny) + 1 > 0xffff;
    this.runCells = RUN_DIRECTIONS.map((_, k) => take(reuse?.runCells[k], long ? int32 : uint16));
    this.shortestRunMm = take(reuse?.shortestRunMm, float64);
    this.rowWork = rowWork(nx);
    this.changedColumns = { from: new Int32Array(ny), to: new Int32Array(ny) };
    this.rowFarthest = new Float64Array(ny);
    this.toForget = take(reuse?.toForget, int32);
    this.searchTurned = take(reuse?.searchTurned, int32);
    this.searchChanged = take(reuse?.searchChanged, int32);
    this.listed = take(reuse?.listed, uint8).fill(0);
    this.touched = take(reuse?.touched, int32);
    this.touchedMark = take(reuse?.touchedMark, uint8).fill(0);
    this.measureAll();
  }

  /** How many times the widths have changed (a fresh start or an update), so a caller can tell whether it saw the latest. */
  get revision(): number {
    return this.changes;
  }

  /**
   * The cells the latest change touched, as views good until the next change; null when the latest
   * change was a fresh start, which touched every cell. `all`: whose width it forgot (among them
   * every cell that turned free or blocked). Of those, a route search may tell apart `turned`, the
   * cells that turned free or blocked, and `changed`, the others whose nearest obstacle's figure or
   * capped width may be other now (searchKey gives the new one); the rest are open by the walkway
   * width or more all round, before and after, which lets every route through alike.
   */
  changedCells(): { all: Int32Array; turned: Int32Array; changed: Int32Array } | null {
    if (!this.updated) return null;
    return {
      all: this.toForget.subarray(0, this.forgetCount),
      turned: this.searchTurned.subarray(0, this.turnedCount),
      changed: this.searchChanged.subarray(0, this.changedCount),
    };
  }

  /** The box of cells that turned free or blocked in the latest change ([0, −1, 0, −1] for none); null after a fresh start. */
  changedBox(): CellBox | null {
    return this.updated ? this.turnedBox : null;
  }

  /**
   * How a route search goes through a free cell, when it is as plainly as most: no wider than the
   * cell's width capped at the walkway width rounded up (the key given). −1 where the nearest
   * obstacle's figure lets routes through wider than that (the chord across came out a little
   * under it), so the cell may take a route more than once.
   */
  searchKey(cell: number): number {
    const widthMm = this.at(cell);
    const key = Math.floor(widthMm < this.limitMm ? widthMm : this.limitMm);
    return this.lowerGate(cell) <= key ? key : -1;
  }

  /** The distances and runs afresh from the grid's labels; every width unknown. */
  private measureAll(): void {
    this.changes++;
    this.updated = false;
    const { nx, ny, grid } = this;
    nearestRowsInColumns(grid, this.columnRow, 0, nx - 1, null);
    for (let j = 0; j < ny; j++)
      this.rowFarthest[j] = nearestInRow(grid, j, this.columnRow, this.distanceCells, this.nearest, null, this.rowWork);
    this.allRuns();
    // Nothing known yet of any width.
    this.widthMm.fill(NaN);
    this.exactKeyMm.fill(-1);
    this.rayReach.fill(0);
    const { gateMm, distanceCells, cellMm, limitMm } = this;
    for (let cell = 0; cell < gateMm.length; cell++) {
      const lowerMm = 2 * (distanceCells[cell]! - 0.5) * cellMm;
      gateMm[cell] = lowerMm >= limitMm ? limitMm : Math.floor(lowerMm);
    }
  }

  /** The gate from the nearest obstacle alone: twice its distance, in whole mm, capped at the walkway width rounded up. */
  private lowerGate(cell: number): number {
    const lowerMm = this.lowerBoundMm(cell);
    return lowerMm >= this.limitMm ? this.limitMm : Math.floor(lowerMm);
  }

  /**
   * Takes the next labels of the same room (a grid of the same frame) and forgets the widths they
   * change; only cells within `within` (a box of cells, all of the grid when left out) may have
   * turned free or blocked. Returns the labels array given before, for the caller to fill next time.
   */
  update(label: Int32Array, within?: CellBox): Int32Array {
    const before = this.grid.label;
    this.grid.label = label;
    const { nx, ny, cells } = this;
    const [a0, a1, b0, b1] = within ?? [0, nx - 1, 0, ny - 1];
    // The box of cells that turned free or blocked (walls stay where the room has them).
    let i0 = nx;
    let i1 = -1;
    let j0 = ny;
    let j1 = -1;
    for (let j = b0; j <= b1; j++) {
      for (let i = a0, cell = j * nx + a0; i <= a1; i++, cell++) {
        if (label[cell] === before[cell] || (label[cell] === FREE) === (before[cell] === FREE)) continue;
        if (i < i0) i0 = i;
        if (i > i1) i1 = i;
        if (j < j0) j0 = j;
        if (j > j1) j1 = j;
      }
    }
    this.turnedBox = [i0, i1, j0, j1];
    if (i1 < 0) {
      this.changes++;
      this.updated = true;
      this.forgetCount = 0;
      this.turnedCount = 0;
      this.changedCount = 0;
      return before;
    }
    // A ray across looks no further than the walkway width, rounded to cells, from a sample that
    // strays up to half a cell from the line: every cell whose ray may pass a changed cell.
    const reach = Math.ceil(this.enoughMm / this.cellMm) + 2;
    const r0 = Math.max(0, i0 - reach);
    const r1 = Math.min(nx - 1, i1 + reach);
    const s0 = Math.max(0, j0 - reach);
    const s1 = Math.min(ny - 1, j1 + reach);
    if ((r1 - r0 + 1) * (s1 - s0 + 1) > FRESH_SHARE * cells) {
      this.measureAll();
      return before;
    }
    this.changes++;
    this.updated = true;
    this.forgetCount = 0;
    this.updateNearest(i0, i1);
    this.updateRuns(i0, i1, j0, j1);
    const { rayReach } = this;
    for (let j = s0; j <= s1; j++) {
      const dj = j < j0 ? j0 - j : j > j1 ? j - j1 : 0;
      for (let i = r0, cell = j * nx + r0; i <= r1; i++, cell++) {
        const cast = rayReach[cell]!;
        if (cast === 0) continue;
        const di = i < i0 ? i0 - i : i > i1 ? i - i1 : 0;
        if (cast === 255 || (di > dj ? di : dj) < cast) this.list(cell);
      }
    }
    const { toForget, listed, gateMm, exactKeyMm, limitMm } = this;
    this.turnedCount = 0;
    this.changedCount = 0;
    for (let k = 0; k < this.forgetCount; k++) {
      const cell = toForget[k]!;
      listed[cell] = 0;
      const gateWas = gateMm[cell]!;
      this.widthMm[cell] = NaN;
      exactKeyMm[cell] = -1;
      this.rayReach[cell] = 0;
      gateMm[cell] = this.lowerGate(cell);
      if ((label[cell] === FREE) !== (before[cell] === FREE)) this.searchTurned[this.turnedCount++] = cell;
      else if (gateWas < limitMm || gateMm[cell]! < limitMm) this.searchChanged[this.changedCount++] = cell;
    }
    return before;
  }

  private list(cell: number): void {
    if (this.listed[cell] === 1) return;
    this.listed[cell] = 1;
    this.toForget[this.forgetCount++] = cell;
  }

  /** The distance transform again over the columns i0..i1, and in each row over the cells the columns whose answers changed there may now be nearest to; cells whose nearest blocked cell moved are listed. */
  private updateNearest(i0: number, i1: number): void {
    const { nx, ny, grid, columnRow, changedColumns: changed } = this;
    changed.from.fill(nx);
    changed.to.fill(-1);
    nearestRowsInColumns(grid, columnRow, i0, i1, changed);
    const { rowFarthest } = this;
    for (let j = 0; j < ny; j++) {
      const to = changed.to[j]!;
      if (to < 0) continue;
      const from = changed.from[j]!;
      const farthest = refreshRowNearest(
        grid,
        j,
        columnRow,
        from,
        to,
        this.distanceCells,
        this.nearest,
        rowFarthest[j]!,
        this.listCell,
      );
      if (farthest > rowFarthest[j]!) rowFarthest[j] = farthest;
    }
  }

  private readonly listCell = (cell: number): void => this.list(cell);

  /** The straight runs again along every line through the box i0..i1 × j0..j1 grown by a cell, as far as the runs that cross it reach; cells whose shortest run changed are listed. */
  private updateRuns(i0: number, i1: number, j0: number, j1: number): void {
    const { nx, ny } = this;
    const a0 = Math.max(0, i0 - 1);
    const a1 = Math.min(nx - 1, i1 + 1);
    const b0 = Math.max(0, j0 - 1);
    const b1 = Math.min(ny - 1, j1 + 1);
    this.touchedCount = 0;
    for (let j = b0; j <= b1; j++) this.runsAcross(0, j * nx + a0, j * nx + a1);
    for (let i = a0; i <= a1; i++) this.runsAcross(1, b0 * nx + i, b1 * nx + i);
    // Down-right diagonals by i − j, up-right ones by i + j, each from its first cell in the box to its last.
    for (let d = a0 - b1; d <= a1 - b0; d++) {
      const first = Math.max(a0, b0 + d);
      const last = Math.min(a1, b1 + d);
      this.runsAcross(2, (first - d) * nx + first, (last - d) * nx + last);
    }
    for (let s = a0 + b0; s <= a1 + b1; s++) {
      const first = Math.max(a0, s - b1);
      const last = Math.min(a1, s - b0);
      this.runsAcross(3, (s - first) * nx + first, (s - last) * nx + last);
    }
    const { touched, touchedMark } = this;
    for (let k = 0; k < this.touchedCount; k++) {
      const cell = touched[k]!;
      touchedMark[cell] = 0;
      const shortest = this.shortestOf(cell);
      if (shortest !== this.shortestRunMm[cell]) {
        this.shortestRunMm[cell] = shortest;
        this.list(cell);
      }
    }
  }

  /** The runs of direction k through the stretch of a line from cell `entry` to cell `exit`, whole: from the blocked cell before it to the one after. */
  private runsAcross(k: number, entry: number, exit: number): void {
    const [di, dj] = RUN_DIRECTIONS[k]!;
    const step = dj * this.nx + di;
    const label = this.grid.label;
    let from = entry;
    while (label[from] === FREE) from -= step;
    let to = exit;
    while (label[to] === FREE) to += step;
    this.runsAlong(k, from, (to - from) / step + 1);
  }

  /**
   * Every cell's runs and shortest run, in two sweeps over the grid in memory order: down the rows,
   * each free cell counts the free cells from one end of each of its runs to itself (one more than
   * its neighbour towards that end), noting whether that end is a wall; back up the rows, it counts
   * from the other end, and the two counts give the run's. Each count is kept doubled, plus 1 where
   * its end is a wall. What is known of each free cell's width is forgotten on the way.
   */
  private allRuns(): void {
    const { nx, ny, cellMm } = this;
    const label = this.grid.label;
    type Counts = Uint16Array | Int32Array;
    const [along, down, downRight, upRight] = this.runCells as [Counts, Counts, Counts, Counts];
    const shortest = this.shortestRunMm;
    const cells = nx * ny;
    // Blocked cells have no runs; free ones are all written below.
    for (const counts of this.runCells) counts.fill(0);
    shortest.fill(Infinity);
    // Down the rows: the ends to the left, above, above left and above right.
    for (let cell = 0; cell < cells; cell++) {
      if (label[cell] !== FREE) continue;
      // Padding keeps the grid's edge blocked, so a free cell's neighbours are all on the grid.
      let end = label[cell - 1]!;
      along[cell] = end === FREE ? along[cell - 1]! + 2 : end === WALL ? 3 : 2;
      end = label[cell - nx]!;
      down[cell] = end === FREE ? down[cell - nx]! + 2 : end === WALL ? 3 : 2;
      end = label[cell - nx - 1]!;
      downRight[cell] = end === FREE ? downRight[cell - nx - 1]! + 2 : end === WALL ? 3 : 2;
      end = label[cell - nx + 1]!;
      upRight[cell] = end === FREE ? upRight[cell - nx + 1]! + 2 : end === WALL ? 3 : 2;
    }
    // Back up the rows, the counts from the other ends held for this row and the one below.
    const stepMm0 = cellMm * RUN_STEP_CELLS[0]!;
    let row = new Int32Array(4 * nx);
    let below = new Int32Array(4 * nx);
    for (let j = ny - 1; j >= 0; j--) {
      const swap = row;
      row = below;
      below = swap;
      for (let i = nx - 1; i >= 0; i--) {
        const cell = j * nx + i;
        if (label[cell] !== FREE) continue;
        const at = 4 * i;
        let end = label[cell + 1]!;
        const right = end === FREE ? row[at + 4]! + 2 : end === WALL ? 3 : 2;
        end = label[cell + nx]!;
        const under = end === FREE ? below[at + 1]! + 2 : end === WALL ? 3 : 2;
        end = label[cell + nx + 1]!;
        const underRight = end === FREE ? below[at + 6]! + 2 : end === WALL ? 3 : 2;
        end = label[cell + nx - 1]!;
        const underLeft = end === FREE ? below[at - 1]! + 2 : end === WALL ? 3 : 2;
        row[at] = right;
        row[at + 1] = under;
        row[at + 2] = underRight;
        row[at + 3] = underLeft;
        // Free cells from each end to this one, this one counted twice; none where both ends are walls.
        const alongCount = runCount(along[cell]!, right);
        const downCount = runCount(down[cell]!, under);
        const downRightCount = runCount(downRight[cell]!, underRight);
        const upRightCount = runCount(upRight[cell]!, underLeft);
        along[cell] = alongCount;
        down[cell] = downCount;
        downRight[cell] = downRightCount;
        upRight[cell] = upRightCount;
        let shortestMm = alongCount > 0 ? alongCount * stepMm0 : Infinity;
        shortestMm = shorterRun(shortestMm, downCount, cellMm, 1);
        shortestMm = shorterRun(shortestMm, downRightCount, cellMm, 2);
        shortest[cell] = shorterRun(shortestMm, upRightCount, cellMm, 3);
      }
    }
  }

  /**
   * The runs along one line of direction k, `length` cells from `start`: each stretch of free cells
   * between two blocked ones gets its count of cells, or 0 with a wall at both ends; cells whose
   * count changed are listed in `touched`.
   */
  private runsAlong(k: number, start: number, length: number): void {
    const [di, dj] = RUN_DIRECTIONS[k]!;
    const step = dj * this.nx + di;
    const label = this.grid.label;
    const counts = this.runCells[k]!;
    let back = -1;
    for (let n = 0, cell = start; n < length; n++, cell += step) {
      if (label[cell] === FREE) continue;
      if (back >= 0 && cell !== back + step) {
        const count = label[back] === WALL && label[cell] === WALL ? 0 : (cell - back) / step - 1;
        for (let c = back + step; c !== cell; c += step) {
          if (counts[c] !== count) this.touch(c);
          counts[c] = count;
        }
      }
      if (counts[cell] !== 0) this.touch(cell);
      counts[cell] = 0;
      back = cell;
    }
  }

  private touch(cell: number): void {
    if (this.touchedMark[cell] === 1) return;
    this.touchedMark[cell] = 1;
    this.touched[this.touchedCount++] = cell;
  }

  /** The shortest of a cell's counted runs (mm), Infinity when none counts. */
  private shortestOf(cell: number): number {
    let shortest = Infinity;
    for (let k = 0; k < 4; k++) {
      const count = this.runCells[k]![cell]!;
      if (count === 0) continue;
      const runMm = count * this.cellMm * RUN_STEP_CELLS[k]!;
      if (runMm < shortest) shortest = runMm;
    }
    return shortest;
  }

  /**
   * The width at a free cell in whole mm, capped at keyMm (a whole number up to the walkway width
   * rounded up), for a cell whose gate is under keyMm and whose capped width is not known exactly:
   * measured only as far as the cap, and what that shows kept (the exact width when the look found
   * it, else that the width is more than the cap).
   */
  cappedAt(cell: number, keyMm: number): number {
    const widthMm = this.measure(cell, keyMm);
    if (widthMm === Infinity && this.exactKeyMm[cell]! < 0) {
      if (keyMm > this.gateMm[cell]!) this.gateMm[cell] = keyMm;
      return keyMm;
    }
    const key = this.exactKeyMm[cell]!;
    return key < keyMm ? key : keyMm;
  }

  /**
   * Whether the width at a cell whose exact width is not known is already known to be more than
   * widthMm, so it need not be measured to be compared: a gate above the nearest obstacle's figure
   * came from a look that found the width more than it; and with d the distance (cells) to the
   * nearest blocked centre, every chord is at least (2d − 1.71) cells long (a run's ends lie at
   * least d away on either side, less one step of at most √2 cells; the chord across reaches a
   * sample within √½ cell of a blocked centre, and both ends lose half a cell).
   */
  private knownWiderThan(cell: number, widthMm: number): boolean {
    const gate = this.gateMm[cell]!;
    if (gate > Math.floor(widthMm) && gate > this.lowerGate(cell)) return true;
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
   * Whether the clear width at a free cell is at most limitMm: from the exact width where it is
   * known; else false where it is known to be wider, without measuring it; else measured exactly
   * and kept, as the next check will likely ask again.
   */
  atMost(cell: number, limitMm: number): boolean {
    const known = this.widthMm[cell]!;
    if (known === known) return known <= limitMm;
    if (this.knownWiderThan(cell, limitMm)) return false;
    return this.measure(cell, Infinity) <= limitMm;
  }

  /**
   * Distance (mm) from cell (i, j)'s centre to the edge of the first blocked cell along (ux, uy),
   * looking no further than reachMm; the cell met is left in `rayHit`. Infinity when none is met.
   * The samples are those of a step of a cell at a time however far it skips: a shorter look meets
   * what a longer one would, if it meets anything.
   */
  private ray(i: number, j: number, ux: number, uy: number, reachMm: number): number {
    const { nx, ny, cellMm } = this;
    const label = this.grid.label;
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
        this.rayLength = t;
        return (t - RAY_STEP_CELLS / 2) * cellMm;
      }
      // Skip ahead through open floor: no blocked centre lies nearer than this cell's distance, and
      // a sample strays at most √½ cell from the centre it rounds to, on either end of the jump.
      const skip = Math.floor(distance[other]! - RAY_SKIP_MARGIN_CELLS);
      t += skip > RAY_STEP_CELLS ? skip : RAY_STEP_CELLS;
    }
    this.rayLength = reachCells;
    return Infinity;
  }

  private bothWalls(a: number, b: number): boolean {
    const label = this.grid.label;
    return label[a] === WALL && label[b] === WALL;
  }

  /** The chord across from the nearest obstacle: its length (mm), looking no further than reachMm; Infinity when none. Its far end is left in `rayHit`. */
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
   * The width, looked for no further than capMm: exact (and kept, with its capped key) whenever it
   * is at most the cap or the look was not cut short by it; otherwise Infinity, some figure above
   * the cap. The straight runs are known, so the chord across need only be looked for as far as it
   * could still be the shorter: a chord found past that is longer than a run anyway.
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
        const reach = Math.min(255, 1 + Math.ceil(this.rayLength + 0.5));
        if (reach > this.rayReach[cell]!) this.rayReach[cell] = reach;
        // Nothing met within the cap when the cap cut the look short: only "wider than the cap" is known.
        if (acrossMm === Infinity && capMm < reachMm) return Infinity;
        widthMm = acrossMm < runMm ? acrossMm : runMm;
      }
    }
    this.widthMm[cell] = widthMm;
    const key = Math.floor(widthMm < this.limitMm ? widthMm : this.limitMm);
    this.exactKeyMm[cell] = key;
    if (key > this.gateMm[cell]!) this.gateMm[cell] = key;
    return widthMm;
  }

  /** The obstacles at the two ends of a measured cell's chord and where they are (plan mm), or null if it is wide. */
  gap(cell: number): Gap | null {
    const { nx, cellMm } = this;
    const label = this.grid.label;
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

const int32 = (cells: number): Int32Array => new Int32Array(cells);
const float64 = (cells: number): Float64Array => new Float64Array(cells);
const uint16 = (cells: number): Uint16Array => new Uint16Array(cells);
const uint8 = (cells: number): Uint8Array => new Uint8Array(cells);
