// The walkway check's floor grid and widths kept from one check of a room to the next: the room's
// labels alone, drawn once, and the last check's obstacle boxes, so the next check draws again only
// where boxes moved and tells the widths where to look. Plan mm; cells as in floor-grid.ts.
import type { Vec2 } from '../../geometry/vec';
import { boundsMm } from '../../geometry/polygon';
import type { PieceBox } from './boxes';
import { gridFrame, KEPT_SCRATCH_CELLS, rasteriseObstacles, rasteriseOutline, type GridFrame } from './floor-grid';
import { Widths, type CellBox } from './walkway-widths';

/**
 * The widths last made, with the room they are of (its key), the outline's labels alone, a spare
 * labels array, and where each obstacle box was (BOX_FIELDS numbers a box).
 */
let kept: { key: string; outline: Int32Array; spare: Int32Array; widths: Widths; boxes: Float64Array } | null = null;

/** A box's centre, x axis and half sizes, then its bounds (min x, min y, max x, max y), plan mm. */
const BOX_FIELDS = 10;

function boxFields(obstacles: readonly PieceBox[]): Float64Array {
  const fields = new Float64Array(obstacles.length * BOX_FIELDS);
  obstacles.forEach((box, index) => {
    const b = boundsMm(box.corners);
    const at = index * BOX_FIELDS;
    fields[at] = box.centre[0];
    fields[at + 1] = box.centre[1];
    fields[at + 2] = box.axisX[0];
    fields[at + 3] = box.axisX[1];
    fields[at + 4] = box.halfWidthMm;
    fields[at + 5] = box.halfDepthMm;
    fields[at + 6] = b.minX;
    fields[at + 7] = b.minY;
    fields[at + 8] = b.maxX;
    fields[at + 9] = b.maxY;
  });
  return fields;
}

/** The box of cells the boxes that moved covered before or cover now, or undefined (all of the grid) when boxes came or went. */
function movedCells(frame: GridFrame, before: Float64Array, now: Float64Array): CellBox | undefined {
  if (before.length !== now.length) return undefined;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let at = 0; at < now.length; at += BOX_FIELDS) {
    let same = true;
    for (let f = 0; f < 6 && same; f++) same = before[at + f] === now[at + f];
    if (same) continue;
    for (const fields of [before, now]) {
      minX = Math.min(minX, fields[at + 6]!);
      minY = Math.min(minY, fields[at + 7]!);
      maxX = Math.max(maxX, fields[at + 8]!);
      maxY = Math.max(maxY, fields[at + 9]!);
    }
  }
  const { nx, ny, cellMm, originX, originY } = frame;
  if (minX > maxX) return [0, -1, 0, -1];
  return [
    Math.max(0, Math.floor((minX - originX) / cellMm)),
    Math.min(nx - 1, Math.floor((maxX - originX) / cellMm)),
    Math.max(0, Math.floor((minY - originY) / cellMm)),
    Math.min(ny - 1, Math.floor((maxY - originY) / cellMm)),
  ];
}

/**
 * The floor grid of an outline and obstacle boxes (plan mm, cells of requestedCellMm as
 * rasteriseFloor makes them) and the clear widths on it up to walkwayMm. The widths of the last
 * check are kept (for grids up to KEPT_SCRATCH_CELLS) and, for the same room and walkway width,
 * brought up to date instead of made afresh: what they answer is the same either way. The grid and
 * widths are good until the next call (checks run one at a time on a thread).
 */
export function floorWidths(
  outline: readonly Vec2[],
  obstacles: readonly PieceBox[],
  requestedCellMm: number,
  walkwayMm: number,
): Widths {
  const key = `${requestedCellMm} ${walkwayMm} ${outline.map(([x, y]) => `${x},${y}`).join(' ')}`;
  const boxes = boxFields(obstacles);
  if (kept?.key === key) {
    const { grid } = kept.widths;
    const label = kept.spare;
    const moved = movedCells(grid, kept.boxes, boxes);
    if (moved) {
      // The labels as they were, drawn again where boxes moved: the room's alone, then every box over it.
      label.set(grid.label);
      const [a0, a1, b0, b1] = moved;
      for (let j = b0; j <= b1; j++) label.set(kept.outline.subarray(j * grid.nx + a0, j * grid.nx + a1 + 1), j * grid.nx + a0);
      if (a0 <= a1) rasteriseObstacles(grid, obstacles, label, moved);
    } else {
      label.set(kept.outline);
      rasteriseObstacles(grid, obstacles, label);
    }
    kept.spare = kept.widths.update(label, moved);
    kept.boxes = boxes;
    return kept.widths;
  }
  const frame = gridFrame(outline, requestedCellMm);
  const cells = frame.nx * frame.ny;
  const before = kept;
  kept = null;
  const fits = (old: Int32Array | undefined) => (old && old.length >= cells ? old.subarray(0, cells) : new Int32Array(cells));
  const bare = fits(before?.outline);
  rasteriseOutline(outline, frame, bare);
  const label = fits(before?.widths.grid.label);
  label.set(bare);
  rasteriseObstacles(frame, obstacles, label);
  const widths = new Widths({ ...frame, label }, walkwayMm, before?.widths);
  if (cells <= KEPT_SCRATCH_CELLS) kept = { key, outline: bare, spare: fits(before?.spare), widths, boxes };
  return widths;
}

/** Forgets the kept widths, so the next check measures every width afresh (for benches and tests that time or compare that); their arrays stay for reuse. */
export function forgetKeptWidths(): void {
  if (kept) kept.key = '';
}
