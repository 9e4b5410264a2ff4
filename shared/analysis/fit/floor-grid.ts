// The room's free floor as a grid of square cells, and the exact Euclidean distance from every cell
// to the nearest blocked one. Plan mm, x right, y down; cell (i, j) has its centre at
// (originX + (i + ½)·cellMm, originY + (j + ½)·cellMm) and index j·nx + i.
import { boundsMm } from '../../geometry/polygon';
import type { Vec2 } from '../../geometry/vec';
import type { PieceBox } from './boxes';

/** A cell label: free floor. */
export const FREE = -1;
/** A cell label: outside the outline (a wall or beyond). Labels 0 and up name an obstacle box by its index. */
export const WALL = -2;
/** Blocked cells kept round the outline's bounds, so every row and column meets a wall. */
const PAD_CELLS = 2;
/**
 * The most cells one grid may have. A check's time and memory grow with its cells (about 40 bytes
 * each for the walkway check), so an outsized room must not make one check allocate without bound:
 * past this the cell is made coarser instead. 500,000 cells of 25 mm cover a room of about
 * 17.6 m × 17.6 m (310 m²), larger than any room of a home, so real rooms keep their cell.
 */
export const MAX_GRID_CELLS = 500_000;

function cellCount(widthMm: number, heightMm: number, cellMm: number): number {
  return (Math.ceil(widthMm / cellMm) + 2 * PAD_CELLS) * (Math.ceil(heightMm / cellMm) + 2 * PAD_CELLS);
}

/**
 * The cell (mm) a grid over bounds of widthMm × heightMm uses: cellMm, or the smallest whole
 * millimetre coarser than it that keeps the grid within MAX_GRID_CELLS.
 */
export function gridCellMm(widthMm: number, heightMm: number, cellMm: number): number {
  if (cellCount(widthMm, heightMm, cellMm) <= MAX_GRID_CELLS) return cellMm;
  const fits = (c: number): boolean => cellCount(widthMm, heightMm, c) <= MAX_GRID_CELLS;
  // Cells only get fewer as the cell grows: double until it fits, then halve the gap to the least
  // whole millimetre that does. Bounds that no cell fits (not finite) are refused, never looped on.
  let lo = cellMm;
  let hi = Math.max(cellMm, Math.ceil(Math.sqrt((widthMm * heightMm) / MAX_GRID_CELLS)));
  for (let k = 0; k < 64 && !fits(hi); k++) {
    lo = hi;
    hi *= 2;
  }
  if (!fits(hi)) throw new RangeError('The room is too large to check on a grid');
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (fits(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

export interface FloorGrid {
  cellMm: number;
  nx: number;
  ny: number;
  originX: number;
  originY: number;
  /** FREE, WALL, or the index of the obstacle box covering the cell's centre. */
  label: Int32Array;
}

/** Centre of cell `index` in plan mm. */
export function cellCentreMm(grid: FloorGrid, index: number): [number, number] {
  const i = index % grid.nx;
  const j = (index - i) / grid.nx;
  return [grid.originX + (i + 0.5) * grid.cellMm, grid.originY + (j + 0.5) * grid.cellMm];
}

/** Index of the cell holding plan point p (mm), or −1 off the grid. */
export function cellAt(grid: FloorGrid, p: Vec2): number {
  const i = Math.floor((p[0] - grid.originX) / grid.cellMm);
  const j = Math.floor((p[1] - grid.originY) / grid.cellMm);
  if (i < 0 || j < 0 || i >= grid.nx || j >= grid.ny) return -1;
  return j * grid.nx + i;
}

/** Where a grid lies and how fine it is: as FloorGrid, without the labels. */
export type GridFrame = Omit<FloorGrid, 'label'>;

/**
 * The frame of the grid over an outline's bounds (plan mm) with cells of requestedCellMm, coarser
 * where the room would need more than MAX_GRID_CELLS, and PAD_CELLS of blocked cells all round.
 */
export function gridFrame(outline: readonly Vec2[], requestedCellMm: number): GridFrame {
  const bounds = boundsMm(outline);
  const cellMm = gridCellMm(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY, requestedCellMm);
  return {
    cellMm,
    nx: Math.ceil((bounds.maxX - bounds.minX) / cellMm) + 2 * PAD_CELLS,
    ny: Math.ceil((bounds.maxY - bounds.minY) / cellMm) + 2 * PAD_CELLS,
    originX: bounds.minX - PAD_CELLS * cellMm,
    originY: bounds.minY - PAD_CELLS * cellMm,
  };
}

/** Labels every cell of a frame WALL, then FREE where its centre is inside the outline (plan mm). */
export function rasteriseOutline(outline: readonly Vec2[], frame: GridFrame, label: Int32Array): void {
  const { nx, ny, cellMm, originX, originY } = frame;
  label.fill(WALL);
  // Scanlines through the cell centres: fill between pairs of outline crossings (even-odd).
  const crossings: number[] = [];
  for (let j = 0; j < ny; j++) {
    const y = originY + (j + 0.5) * cellMm;
    crossings.length = 0;
    for (let k = 0; k < outline.length; k++) {
      const a = outline[k]!;
      const b = outline[(k + 1) % outline.length]!;
      if (a[1] > y !== b[1] > y) crossings.push(a[0] + ((y - a[1]) * (b[0] - a[0])) / (b[1] - a[1]));
    }
    crossings.sort((p, q) => p - q);
    for (let k = 0; k + 1 < crossings.length; k += 2) {
      const from = Math.max(0, Math.ceil((crossings[k]! - originX) / cellMm - 0.5));
      const to = Math.min(nx - 1, Math.floor((crossings[k + 1]! - originX) / cellMm - 0.5));
      label.fill(FREE, j * nx + from, j * nx + to + 1);
    }
  }
}

/**
 * Labels the free cells whose centre lies in an obstacle box with the box's index; the first box to
 * cover a cell names it. With `within` (first and last column, first and last row), only cells there.
 */
export function rasteriseObstacles(
  frame: GridFrame,
  obstacles: readonly PieceBox[],
  label: Int32Array,
  within?: readonly [number, number, number, number],
): void {
  const { nx, ny, cellMm, originX, originY } = frame;
  const [a0, a1, b0, b1] = within ?? [0, nx - 1, 0, ny - 1];
  obstacles.forEach((box, index) => {
    const b = boundsMm(box.corners);
    const i0 = Math.max(a0, Math.floor((b.minX - originX) / cellMm));
    const i1 = Math.min(a1, Math.floor((b.maxX - originX) / cellMm));
    const j0 = Math.max(b0, Math.floor((b.minY - originY) / cellMm));
    const j1 = Math.min(b1, Math.floor((b.maxY - originY) / cellMm));
    const [ax, ay] = box.axisX;
    for (let j = j0; j <= j1; j++) {
      const dy = originY + (j + 0.5) * cellMm - box.centre[1];
      for (let i = i0; i <= i1; i++) {
        const cell = j * nx + i;
        if (label[cell] !== FREE) continue;
        const dx = originX + (i + 0.5) * cellMm - box.centre[0];
        // Coordinates in the box's own axes (axisY is axisX turned a quarter clockwise).
        const u = dx * ax + dy * ay;
        const v = -dx * ay + dy * ax;
        if (Math.abs(u) <= box.halfWidthMm && Math.abs(v) <= box.halfDepthMm) label[cell] = index;
      }
    }
  });
}

/**
 * Rasterises an outline (plan mm) and obstacle boxes onto cells of cellMm (coarser where the room
 * would need more than MAX_GRID_CELLS; the grid's cellMm says which): a cell is free when its
 * centre is inside the outline and in no obstacle. The first box to cover a cell names it.
 */
export function rasteriseFloor(outline: readonly Vec2[], obstacles: readonly PieceBox[], requestedCellMm: number): FloorGrid {
  const frame = gridFrame(outline, requestedCellMm);
  const label = new Int32Array(frame.nx * frame.ny);
  rasteriseOutline(outline, frame, label);
  rasteriseObstacles(frame, obstacles, label);
  return { ...frame, label };
}

/**
 * Per-cell working arrays are kept from one check to the next for grids up to this many cells, so a
 * drag that checks the same room again and again does not churn memory; larger grids get arrays of
 * their own that go when the check is done. A kept array is handed out again by the next call under
 * its name, so a check uses what it asks for before the next check starts (checks run one at a time
 * on a thread). The walkway check keeps its grid, widths and search (walkway-floor.ts,
 * walkway-grid.ts) for grids up to the same size.
 */
export const KEPT_SCRATCH_CELLS = 250_000;
const kept = new Map<string, Float64Array | Int32Array>();

/** A working array of `cells` entries under `name`, with whatever it held before: callers fill it. */
export function scratch<T extends Float64Array | Int32Array>(name: string, make: (cells: number) => T, cells: number): T {
  const held = kept.get(name) as T | undefined;
  if (held && held.length >= cells) return held.subarray(0, cells) as T;
  const made = make(cells);
  if (cells <= KEPT_SCRATCH_CELLS) kept.set(name, made);
  return made;
}
export const float64 = (cells: number): Float64Array => new Float64Array(cells);
export const int32 = (cells: number): Int32Array => new Int32Array(cells);

/**
 * Squared distance (in cells²) from every cell's centre to the nearest blocked cell's centre, its
 * square root (cells), and which blocked cell that is. The arrays are working arrays (`scratch`):
 * the next distance field reuses them.
 */
export interface DistanceField {
  squaredCells: Float64Array;
  /** √squaredCells, worked out once here for every later use. */
  cells: Float64Array;
  nearest: Int32Array;
}

/**
 * The column pass of the distance transform over columns i0..i1: for each of their cells, the row
 * of the nearest blocked cell straight up or down the column (the upper one of two as near; −1 when
 * the column has none, never so on a padded grid). The columns are swept at once, a row at a time,
 * so the arrays are read in the order they lie in memory. With `changed`, each row's first and
 * last column whose answer changed go in changed.from and changed.to (left as they are in a row
 * where none did: the caller fills them with nx and −1).
 */
export function nearestRowsInColumns(
  grid: FloorGrid,
  columnRow: Int32Array,
  i0: number,
  i1: number,
  changed: { from: Int32Array; to: Int32Array } | null,
): void {
  const { nx, ny, label } = grid;
  const width = i1 - i0 + 1;
  // The nearest blocked row at or above each cell; kept apart when the answers before are to be compared.
  const above = changed ? scratch('column-above', int32, width * ny) : columnRow;
  const stride = changed ? width : nx;
  const offset = changed ? 0 : i0;
  const last = scratch('column-last', int32, width).fill(-1);
  for (let j = 0; j < ny; j++) {
    const row = j * nx + i0;
    const at = j * stride + offset;
    for (let c = 0; c < width; c++) {
      if (label[row + c] !== FREE) last[c] = j;
      above[at + c] = last[c]!;
    }
  }
  const next = last.fill(-1);
  for (let j = ny - 1; j >= 0; j--) {
    const row = j * nx + i0;
    const at = j * stride + offset;
    for (let c = 0; c < width; c++) {
      const cell = row + c;
      if (label[cell] !== FREE) next[c] = j;
      const below = next[c]!;
      const up = above[at + c]!;
      const nearestRow = up < 0 || (below >= 0 && below - j < j - up) ? below : up;
      if (changed && columnRow[cell] !== nearestRow) {
        if (i0 + c < changed.from[j]!) changed.from[j] = i0 + c;
        changed.to[j] = i0 + c;
      }
      columnRow[cell] = nearestRow;
    }
  }
}

/**
 * The row pass of the distance transform for row j (Felzenszwalb and Huttenlocher's lower envelope
 * of parabolas (x − q)² + column distance² over the columns q): each cell's nearest blocked cell,
 * its distance (cells) and, given `squared`, its square. `sites` and `bounds` are working arrays of
 * at least nx and nx + 1 entries, `rise` of nx. Answers the row's farthest distance (cells).
 */
export function nearestInRow(
  grid: FloorGrid,
  j: number,
  columnRow: Int32Array,
  root: Float64Array,
  nearest: Int32Array,
  squared: Float64Array | null,
  work: { sites: Int32Array; bounds: Float64Array; rise: Float64Array },
): number {
  const { nx } = grid;
  const { sites, bounds, rise } = work;
  const row = j * nx;
  let k = -1;
  for (let q = 0; q < nx; q++) {
    const rowQ = columnRow[row + q]!;
    if (rowQ < 0) continue;
    // A blocked cell between two blocked ones is nearest to no other cell (a neighbour is nearer), only to itself.
    if (rowQ === j && q > 0 && q < nx - 1 && columnRow[row + q - 1] === j && columnRow[row + q + 1] === j) continue;
    const riseQ = (rowQ - j) * (rowQ - j);
    rise[q] = riseQ;
    const fq = riseQ + q * q;
    let s = -Infinity;
    while (k >= 0) {
      const p = sites[k]!;
      s = (fq - (rise[p]! + p * p)) / (2 * (q - p));
      if (s > bounds[k]!) break;
      k--;
    }
    k++;
    sites[k] = q;
    bounds[k] = k === 0 ? -Infinity : s;
    bounds[k + 1] = Infinity;
  }
  if (k < 0) {
    // No blocked cell in any column: nothing is near (a grid without its padding).
    squared?.fill(Infinity, row, row + nx);
    root.fill(Infinity, row, row + nx);
    nearest.fill(-1, row, row + nx);
    return Infinity;
  }
  let at = 0;
  let farthest = 0;
  for (let x = 0; x < nx; x++) {
    while (bounds[at + 1]! < x) at++;
    if (columnRow[row + x] === j) {
      // A blocked cell is its own nearest.
      if (squared) squared[row + x] = 0;
      root[row + x] = 0;
      nearest[row + x] = row + x;
      continue;
    }
    const q = sites[at]!;
    const squaredCells = (x - q) * (x - q) + rise[q]!;
    if (squared) squared[row + x] = squaredCells;
    const distance = Math.sqrt(squaredCells);
    root[row + x] = distance;
    if (distance > farthest) farthest = distance;
    nearest[row + x] = columnRow[row + q]! * nx + q;
  }
  return farthest;
}

/** Working arrays for nearestInRow on a grid nx cells wide. */
export function rowWork(nx: number): { sites: Int32Array; bounds: Float64Array; rise: Float64Array } {
  return { sites: new Int32Array(nx), bounds: new Float64Array(nx + 1), rise: new Float64Array(nx) };
}

/**
 * Exact Euclidean distance transform of the blocked cells (Felzenszwalb and Huttenlocher's lower
 * envelope of parabolas, one pass down the columns and one along the rows), keeping the nearest
 * blocked cell so a gap can be traced to what bounds it. Linear in the number of cells.
 */
export function distanceField(grid: FloorGrid): DistanceField {
  const { nx, ny } = grid;
  const cells = nx * ny;
  const columnRow = scratch('column-row', int32, cells);
  nearestRowsInColumns(grid, columnRow, 0, nx - 1, null);
  const squaredCells = scratch('squared-cells', float64, cells);
  const root = scratch('distance-cells', float64, cells);
  const nearest = scratch('nearest', int32, cells);
  const work = rowWork(nx);
  for (let j = 0; j < ny; j++) nearestInRow(grid, j, columnRow, root, nearest, squaredCells, work);
  return { squaredCells, cells: root, nearest };
}

/**
 * Brings row j of a distance transform up to date after the column answers (columnRow) of columns
 * i0..i1 changed: root and nearest hold the row's answers from before, none farther than
 * farthestCells, and onChanged hears of every cell whose nearest blocked cell is now another.
 * Answers the farthest distance (cells) among the new answers. The row pass picks, at each cell,
 * the leftmost of the columns nearest to it (two parabolas meet at a rational point, which floating
 * point tells apart from its neighbours and rounds alike whichever way it is worked out); so a cell
 * whose nearest lay outside those columns, none of which now comes as near, keeps its answer, and
 * any other takes the leftmost nearest column among those within its distance.
 */
export function refreshRowNearest(
  grid: FloorGrid,
  j: number,
  columnRow: Int32Array,
  i0: number,
  i1: number,
  root: Float64Array,
  nearest: Int32Array,
  farthestCells: number,
  onChanged: (cell: number) => void,
): number {
  const { nx } = grid;
  const row = j * nx;
  let farthest = 0;
  // A cell farther from the changed columns than any old answer reaches kept its nearest.
  const reach = Math.ceil(farthestCells);
  for (let x = Math.max(0, i0 - reach), lastX = Math.min(nx - 1, i1 + reach); x <= lastX; x++) {
    const was = nearest[row + x]!;
    const wasColumn = was % nx;
    const wasRow = (was - wasColumn) / nx;
    const wasSquared = (x - wasColumn) * (x - wasColumn) + (wasRow - j) * (wasRow - j);
    const fromChanged = wasColumn >= i0 && wasColumn <= i1;
    if (!fromChanged) {
      const off = x < i0 ? i0 - x : x > i1 ? x - i1 : 0;
      if (off * off > wasSquared) continue;
    }
    // The nearest the changed columns now come: if no nearer than the old answer, it stands; else it
    // bounds the search. Only columns within the old answer's distance can be nearer.
    let bound = Infinity;
    let q0 = i0;
    let q1 = i1;
    if (!fromChanged) {
      const within = Math.floor(Math.sqrt(wasSquared));
      q0 = Math.max(i0, x - within);
      q1 = Math.min(i1, x + within);
    }
    for (let q = q0; q <= q1; q++) {
      const rowQ = columnRow[row + q]!;
      if (rowQ < 0) continue;
      const squared = (x - q) * (x - q) + (rowQ - j) * (rowQ - j);
      if (squared < bound) bound = squared;
    }
    if (!fromChanged && bound > wasSquared) continue;
    const span = Math.floor(Math.sqrt(bound));
    let best = -1;
    let bestSquared = Infinity;
    for (let q = Math.max(0, x - span), last = Math.min(nx - 1, x + span); q <= last; q++) {
      const rowQ = columnRow[row + q]!;
      if (rowQ < 0) continue;
      const squared = (x - q) * (x - q) + (rowQ - j) * (rowQ - j);
      if (squared < bestSquared) {
        bestSquared = squared;
        best = rowQ * nx + q;
      }
    }
    if (best === was) continue;
    nearest[row + x] = best;
    const distance = Math.sqrt(bestSquared);
    root[row + x] = distance;
    if (distance > farthest) farthest = distance;
    onChanged(row + x);
  }
  return farthest;
}
