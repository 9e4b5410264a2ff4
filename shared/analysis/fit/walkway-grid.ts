// The walkway check's routes on the floor grid: the widest routes from the ways in, and the
// narrowest cell on a route (the widths they go by are walkway-widths.ts's). Plan mm, x right, y down; cells
// as in floor-grid.ts. Which pieces need a route and what a finding says live in walkway.ts.
import { FREE, int32, scratch, type FloorGrid } from './floor-grid';
import type { Widths } from './walkway-widths';

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
 * Widest routes from the way-in cells over free cells, four neighbours each (diagonal steps could
 * slip between two blocked cells meeting at a corner): a Dijkstra search that always extends the
 * route with the widest bottleneck so far, so each cell ends with the widest route that reaches it.
 * Keys only fall as the search goes on, so a cell taken at its own key is settled: a later key
 * cannot beat it, and no separate record of settled cells is needed.
 *
 * Cells waiting are filed by bottleneck width in whole millimetres up to limitMm (anything wider is
 * as good as the walkway), the last filed under a width taken first; a route never widens as it
 * goes on, so the search only moves down the widths and each step is constant time.
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
  // Written where a route reaches (the way-in cells first), and read only there.
  const parent = scratch('parent', int32, cells);
  const wayIn = scratch('way-in', int32, cells);
  const { exactKeyMm, gateMm } = widths;
  // The waiting cells: for each width, the entry filed last under it; each entry its cell and the entry filed before it.
  const heads = new Int32Array(limitMm + 1).fill(-1);
  let entryCell = scratch('queue-cells', int32, Math.max(cells, 16));
  let entryNext = scratch('queue-next', int32, Math.max(cells, 16));
  let entries = 0;
  const file = (cell: number, keyMm: number): void => {
    if (entries === entryCell.length) {
      const grownCells = new Int32Array(entries * 2);
      grownCells.set(entryCell);
      entryCell = grownCells;
      const grownNext = new Int32Array(entries * 2);
      grownNext.set(entryNext);
      entryNext = grownNext;
    }
    entryCell[entries] = cell;
    entryNext[entries] = heads[keyMm]!;
    heads[keyMm] = entries++;
  };
  for (const { cell, opening } of sources) {
    const widthMm = widths.at(cell);
    const key = Math.floor(widthMm < limitMm ? widthMm : limitMm);
    if (key <= bottleneckMm[cell]!) continue;
    bottleneckMm[cell] = key;
    parent[cell] = -1;
    wayIn[cell] = opening;
    file(cell, key);
  }
  for (let keyMm = limitMm; keyMm >= 0; keyMm--) {
    while (heads[keyMm]! >= 0) {
      const entry = heads[keyMm]!;
      heads[keyMm] = entryNext[entry]!;
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
        if (through > known) {
          bottleneckMm[next] = through;
          parent[next] = cell;
          if (entries === entryCell.length) file(next, through);
          else {
            entryCell[entries] = next;
            entryNext[entries] = heads[through]!;
            heads[through] = entries++;
          }
        }
      }
    }
  }
  const narrowest = scratch('narrowest', int32, cells).fill(-1);
  const start = scratch('start', int32, cells);
  return { bottleneckMm, parent, wayIn, narrowest, start };
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
