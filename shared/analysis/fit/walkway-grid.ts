// The walkway check's routes on the floor grid: the widest routes from the ways in, and the
// narrowest cell on a route (the widths they go by are walkway-widths.ts's). Plan mm, x right, y down; cells
// as in floor-grid.ts. Which pieces need a route and what a finding says live in walkway.ts.
import { FREE, KEPT_SCRATCH_CELLS, type FloorGrid } from './floor-grid';
import type { Widths } from './walkway-widths';

/** A search takes up the last one where it left off only if at least this share of its takes stand. */
const REWIND_LEAST_SHARE = 0.25;
/** The search's own mark for blocked cells: wider than any route, so never entered. */
const BLOCKED_KEY = 0x7fffffff;
export interface Routes {
  /** Best bottleneck width (whole mm, at most the walkway width) from any way in to each free cell; −1 where no route reaches (a blocked cell holds a width no route has). */
  bottleneckMm: Int32Array;
  /** The cell each best route came from, −1 at a way in; at cells a route reaches. */
  parent: Int32Array;
  /** For a way-in cell, the index of its opening. */
  wayIn: Int32Array;
  /** Filled in by routeNarrowest as it is asked: the narrowest cell on the route from each cell; −1 until asked. */
  narrowest: Int32Array;
  /** Filled in by routeNarrowest beside `narrowest`: the way-in cell the route from each cell starts at. */
  start: Int32Array;
}

/**
 * A search's record, kept so the next search on the same widths can take it up where the floor
 * changed: every cell filed (an entry: its cell, width, the entry filed before it under the same
 * width, the take during which it was filed, and when it was taken itself) and every take, in order.
 */
class SearchLog {
  readonly routes: Routes;
  /** Each cell's latest entry; −1 for a cell not filed. */
  readonly cellEntry: Int32Array;
  /** 1 at the way-in cells. */
  readonly wayInCell: Uint8Array;
  entryCell: Int32Array;
  entryKey: Int32Array;
  entryNext: Int32Array;
  /** The take during which the entry was filed; −1 for a way-in cell's. */
  entryFiledAt: Int32Array;
  /** The cell's entry before this one; −1 for its first. */
  entryPrevious: Int32Array;
  /** When the entry was taken (its take's number): written when it is, every entry being taken before a search ends; −1 for one waiting again after a rewind. */
  entryTaken: Int32Array;
  entries = 0;
  /** The entry each take took, in order. */
  takenEntry: Int32Array;
  taken = 0;
  heads: Int32Array = new Int32Array(0);
  /** What the record was made on: the widths and their revision, the walkway width rounded up, the ways in. */
  widths: Widths | null = null;
  revision = -1;
  limitMm = -1;
  sources: Int32Array = new Int32Array(0);

  constructor(readonly cells: number) {
    this.routes = {
      bottleneckMm: new Int32Array(cells),
      parent: new Int32Array(cells),
      wayIn: new Int32Array(cells),
      narrowest: new Int32Array(cells),
      start: new Int32Array(cells),
    };
    this.cellEntry = new Int32Array(cells);
    this.wayInCell = new Uint8Array(cells);
    const room = Math.max(cells, 16);
    this.entryCell = new Int32Array(room);
    this.entryKey = new Int32Array(room);
    this.entryNext = new Int32Array(room);
    this.entryFiledAt = new Int32Array(room);
    this.entryPrevious = new Int32Array(room);
    this.entryTaken = new Int32Array(room);
    this.takenEntry = new Int32Array(room);
  }

  /** Doubles the room for entries and takes. */
  grow(): void {
    const twice = (a: Int32Array): Int32Array => {
      const grown = new Int32Array(a.length * 2);
      grown.set(a);
      return grown;
    };
    this.entryCell = twice(this.entryCell);
    this.entryKey = twice(this.entryKey);
    this.entryNext = twice(this.entryNext);
    this.entryFiledAt = twice(this.entryFiledAt);
    this.entryPrevious = twice(this.entryPrevious);
    this.entryTaken = twice(this.entryTaken);
    this.takenEntry = twice(this.takenEntry);
  }

  /** Files a cell under a width, reached during take `filedAt` (−1 for a way in). */
  file(cell: number, keyMm: number, filedAt: number): void {
    if (this.entries === this.entryCell.length) this.grow();
    const entry = this.entries++;
    this.entryCell[entry] = cell;
    this.entryKey[entry] = keyMm;
    this.entryNext[entry] = this.heads[keyMm]!;
    this.entryFiledAt[entry] = filedAt;
    this.entryPrevious[entry] = this.cellEntry[cell]!;
    this.heads[keyMm] = entry;
    this.cellEntry[cell] = entry;
  }

  /** Whether the ways in are those of the record, cell for cell and opening for opening. */
  sameSources(sources: readonly { cell: number; opening: number }[]): boolean {
    if (this.sources.length !== 2 * sources.length) return false;
    return sources.every((s, k) => this.sources[2 * k] === s.cell && this.sources[2 * k + 1] === s.opening);
  }

  /**
   * The first take that read anything a cell holds (its label, width or gate): a cell's are read
   * only when one of its four neighbours is taken; a way in's when the search starts (0). The
   * number of takes when none did.
   */
  firstTakeReadingCell(cell: number, nx: number): number {
    if (this.wayInCell[cell] === 1) return 0;
    let first = this.taken;
    for (let n = 0; n < 4; n++) {
      const next = n === 0 ? cell - 1 : n === 1 ? cell + 1 : n === 2 ? cell - nx : cell + nx;
      const entry = this.cellEntry[next]!;
      // A cell's latest entry is its widest: the one taken while it mattered.
      const takenAt = entry >= 0 ? this.entryTaken[entry]! : -1;
      if (takenAt >= 0 && takenAt < first) first = takenAt;
    }
    return first;
  }

  /**
   * Whether a cell first read at take `readAt` (0 for a way in) would be filed now as it was: it
   * was filed once only, at the width a search afresh would file it at now (the width of the take
   * that first read it, or its own capped width if less; a way in's own), and a search goes through
   * it plainly (Widths.searchKey). Later reads of such a cell change nothing, so a search that does
   * the same up to that take goes on doing the same with it.
   */
  filesAlike(cell: number, readAt: number, widths: Widths): boolean {
    const entry = this.cellEntry[cell]!;
    if (entry < 0 || this.entryPrevious[entry]! >= 0) return false;
    const key = widths.searchKey(cell);
    if (key < 0) return false;
    if (this.wayInCell[cell] === 1) return this.entryFiledAt[entry] === -1 && this.entryKey[entry] === key;
    if (this.entryFiledAt[entry] !== readAt) return false;
    const readKey = this.entryKey[this.takenEntry[readAt]!]!;
    return this.entryKey[entry] === Math.min(readKey, key);
  }

  /** The first take that read anything any of the cells hold. */
  firstTakeReading(cells: Int32Array, nx: number): number {
    let first = this.taken;
    for (const cell of cells) first = Math.min(first, this.firstTakeReadingCell(cell, nx));
    return first;
  }
}

/**
 * The first take that goes otherwise now the widths' latest update changed some cells: the first
 * to read a cell that turned free or blocked; and of the other changed cells, in the order they were
 * first read, the first that a search would now file otherwise than this one did (filesAlike). 0
 * when that is before leastTake.
 */
function firstTakeChanged(
  log: SearchLog,
  widths: Widths,
  changed: { turned: Int32Array; changed: Int32Array },
  nx: number,
  /** Any take before this one is answered as 0, from the start. */
  leastTake: number,
): number {
  let first = log.firstTakeReading(changed.turned, nx);
  if (first < leastTake) return 0;
  // Each read cell as take × cells + cell, so a numeric sort puts them in the order read.
  const codes = new Float64Array(changed.changed.length);
  let count = 0;
  for (const cell of changed.changed) {
    const at = log.firstTakeReadingCell(cell, nx);
    if (at < first) codes[count++] = at * log.cells + cell;
  }
  const read = codes.subarray(0, count).sort();
  for (const code of read) {
    const at = Math.floor(code / log.cells);
    if (at >= first) break;
    // In the order read: once one before leastTake goes otherwise, the search starts afresh anyway.
    if (first < leastTake) break;
    if (!log.filesAlike(code - at * log.cells, at, widths)) first = at;
  }
  return first < leastTake ? 0 : first;
}

/** The search last made, kept for the next one (for grids up to KEPT_SCRATCH_CELLS). */
let kept: SearchLog | null = null;

/** A blocked cell's key, or a free one's before any route reaches it. */
const unreached = (label: Int32Array, cell: number): number => (label[cell] === FREE ? -1 : BLOCKED_KEY);

/**
 * Widest routes from the way-in cells over free cells, four neighbours each (diagonal steps could
 * slip between two blocked cells meeting at a corner): a Dijkstra search that always extends the
 * route with the widest bottleneck so far, so each cell ends with the widest route that reaches it.
 * Keys only fall as the search goes on, so a cell taken at its own key is settled: a later key
 * cannot beat it, and no separate record of settled cells is needed.
 *
 * Cells waiting are filed by bottleneck width in whole millimetres up to limitMm (anything wider is
 * as good as the walkway), the last filed under a width taken first; a route never widens as it
 * goes on, so the search only moves down the widths and each step is constant time.
 *
 * The search is kept, take by take. The next search on the same widths, one update later, with
 * the same ways in, goes as this one did until the first take the update makes go otherwise
 * (firstTakeChanged): it starts there, from the state this one had then, and so ends as a search
 * afresh would. What routeNarrowest worked out on routes taken before the first take that read any
 * changed cell is kept. The routes are good until the next search.
 */
export function widestRoutes(
  grid: FloorGrid,
  widths: Widths,
  sources: readonly { cell: number; opening: number }[],
  limitMm: number,
  /** False for a search afresh that leaves the kept one as it is (a test's comparison). */
  keep = true,
): Routes {
  const cells = grid.nx * grid.ny;
  const { nx, label } = grid;
  const log = keep && kept?.cells === cells ? kept : new SearchLog(cells);
  if (keep) kept = cells <= KEPT_SCRATCH_CELLS ? log : null;
  const changed = widths.changedCells();
  const follows =
    log.widths === widths &&
    log.revision === widths.revision - 1 &&
    log.limitMm === limitMm &&
    changed &&
    log.sameSources(sources);
  // Going back to near the start would undo nearly everything, one entry at a time: start afresh instead.
  const from = follows ? firstTakeChanged(log, widths, changed, nx, REWIND_LEAST_SHARE * log.taken) : 0;
  if (from === 0) {
    startSearch(log, label, widths, sources, limitMm);
    search(log, nx, widths, limitMm);
  } else {
    // Narrowest cells worked out on routes through a cell whose width changed are forgotten.
    const { narrowest } = log.routes;
    const firstReading = log.firstTakeReading(changed!.all, nx);
    // Nearly all of them: all at once.
    if (firstReading < log.taken / 4) narrowest.fill(-1);
    else for (let t = firstReading; t < log.taken; t++) narrowest[log.entryCell[log.takenEntry[t]!]!] = -1;
    if (from < log.taken) {
      const keyThen = log.entryKey[log.takenEntry[from]!]!;
      rewind(log, label, changed!.turned, from);
      search(log, nx, widths, keyThen);
    } else {
      // No take goes otherwise: the routes stand; the cells that turned free or blocked, none reached, read their new labels.
      for (const cell of changed!.turned) if (log.cellEntry[cell]! < 0) log.routes.bottleneckMm[cell] = unreached(label, cell);
    }
  }
  log.widths = widths;
  log.revision = widths.revision;
  log.limitMm = limitMm;
  return log.routes;
}

/** A search afresh: nothing reached, the ways in filed. */
function startSearch(
  log: SearchLog,
  label: Int32Array,
  widths: Widths,
  sources: readonly { cell: number; opening: number }[],
  limitMm: number,
): void {
  const { bottleneckMm, parent, wayIn, narrowest } = log.routes;
  for (let cell = 0; cell < log.cells; cell++) bottleneckMm[cell] = unreached(label, cell);
  log.cellEntry.fill(-1);
  log.wayInCell.fill(0);
  narrowest.fill(-1);
  log.heads = new Int32Array(limitMm + 1).fill(-1);
  log.entries = 0;
  log.taken = 0;
  for (const { cell, opening } of sources) {
    const widthMm = widths.at(cell);
    const key = Math.floor(widthMm < limitMm ? widthMm : limitMm);
    log.wayInCell[cell] = 1;
    if (key <= bottleneckMm[cell]!) continue;
    bottleneckMm[cell] = key;
    parent[cell] = -1;
    wayIn[cell] = opening;
    log.file(cell, key, -1);
  }
  log.sources = Int32Array.from(sources.flatMap((s) => [s.cell, s.opening]));
}

/**
 * Puts the search back as it stood just before take `from`: what was filed during or after it is
 * unfiled (its cells back to their state then), what was taken from it on waits again, and the
 * changed cells (none reached yet) read their new labels.
 */
function rewind(log: SearchLog, label: Int32Array, changed: Int32Array, from: number): void {
  const { bottleneckMm, parent } = log.routes;
  const { entryCell, entryKey, entryFiledAt, entryTaken, entryPrevious, cellEntry, takenEntry } = log;
  // Entries are filed in the order of the takes that filed them: the first filed during take `from` or later.
  let lo = 0;
  let hi = log.entries;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (entryFiledAt[mid]! < from) lo = mid + 1;
    else hi = mid;
  }
  const filed = lo;
  // Waiting then: the entries filed before it and taken from it on (every entry was taken in the
  // end); each width's latest is first in its line, the earlier ones behind it as they were.
  const heads = log.heads.fill(-1);
  for (let t = from; t < log.taken; t++) {
    const entry = takenEntry[t]!;
    if (entry >= filed) continue;
    entryTaken[entry] = -1;
    const key = entryKey[entry]!;
    if (entry > heads[key]!) heads[key] = entry;
  }
  // Cells filed from then on stand as their latest entry before it, or as not reached.
  for (let e = filed; e < log.entries; e++) {
    const cell = entryCell[e]!;
    let back = cellEntry[cell]!;
    while (back >= filed) back = entryPrevious[back]!;
    cellEntry[cell] = back;
    if (back < 0) bottleneckMm[cell] = unreached(label, cell);
    else {
      bottleneckMm[cell] = entryKey[back]!;
      const filedAt = entryFiledAt[back]!;
      parent[cell] = filedAt >= 0 ? entryCell[takenEntry[filedAt]!]! : -1;
    }
  }
  for (const cell of changed) bottleneckMm[cell] = unreached(label, cell);
  log.entries = filed;
  log.taken = from;
}

/** Takes and files from width `topMm` down, until nothing waits. */
function search(log: SearchLog, nx: number, widths: Widths, topMm: number): void {
  const { bottleneckMm, parent } = log.routes;
  const { exactKeyMm, gateMm } = widths;
  const { heads, cellEntry } = log;
  let { entryCell, entryKey, entryNext, entryFiledAt, entryPrevious, entryTaken, takenEntry, entries, taken } = log;
  for (let keyMm = topMm; keyMm >= 0; keyMm--) {
    while (heads[keyMm]! >= 0) {
      const entry = heads[keyMm]!;
      heads[keyMm] = entryNext[entry]!;
      const take = taken++;
      entryTaken[entry] = take;
      takenEntry[take] = entry;
      const cell = entryCell[entry]!;
      if (keyMm < bottleneckMm[cell]!) continue;
      // Padding keeps the grid's edge blocked, so a free cell's neighbours are all on the grid.
      for (let n = 0; n < 4; n++) {
        const next = n === 0 ? cell - 1 : n === 1 ? cell + 1 : n === 2 ? cell - nx : cell + nx;
        const known = bottleneckMm[next]!;
        if (known >= keyMm) continue;
        // Where the cell (or even its nearest obstacle) leaves room for the route so far, it cannot narrow it.
        let through = keyMm;
        if (gateMm[next]! < keyMm) {
          const exact = exactKeyMm[next]!;
          through = exact >= 0 ? exact : widths.cappedAt(next, keyMm);
        }
        if (through <= known) continue;
        bottleneckMm[next] = through;
        parent[next] = cell;
        if (entries === entryCell.length) {
          log.entries = entries;
          log.grow();
          ({ entryCell, entryKey, entryNext, entryFiledAt, entryPrevious, entryTaken, takenEntry } = log);
        }
        // Filed as SearchLog.file files it, here without the call.
        const filed = entries++;
        entryCell[filed] = next;
        entryKey[filed] = through;
        entryNext[filed] = heads[through]!;
        entryFiledAt[filed] = take;
        entryPrevious[filed] = cellEntry[next]!;
        heads[through] = filed;
        cellEntry[next] = filed;
      }
    }
  }
  log.entries = entries;
  log.taken = taken;
}

/**
 * The narrowest cell (least exact width) on the best route from a cell back to its way in, the
 * nearest to the cell among equals; and, in `routes.start`, the way-in cell the route ends at. The
 * routes form a tree, so each cell's answer is its own or its parent's: every cell is worked out
 * once and kept, however many pieces' routes run through it.
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
      narrowest[cell] = widths.atMost(cell, beyondMm) ? cell : beyond;
    }
    return narrowest[from]!;
  };
}
