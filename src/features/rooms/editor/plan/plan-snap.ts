// Where a drawn or dragged corner lands on the plan: on the 10 mm grid, at a 15° step from the
// previous corner, lined up with its neighbours; and how close a click closes a drawn outline.
import { snapAngle, snapToGrid } from '../../../../../shared/commands';
import type { RoomShell } from '../../../../../shared/schemas/room';

/** Corners snap to this grid while dragged or clicked (plan mm). */
export const CORNER_GRID_MM = 10;
/** A dragged corner lines up with a neighbour's x or y when this close. */
export const ALIGN_SNAP_MM = 80;
/** Clicking this close to the first corner closes a drawn outline. */
export const CLOSE_SNAP_MM = 200;

/** A clicked corner: on the 10 mm grid, and at a 15° step from the previous corner unless Shift is held. */
export function drawPoint(draft: readonly [number, number][], at: [number, number], free: boolean): [number, number] {
  const grid = snapToGrid(at, CORNER_GRID_MM) as [number, number];
  const last = draft[draft.length - 1];
  if (!last || free) return grid;
  const dx = at[0] - last[0];
  const dy = at[1] - last[1];
  const len = Math.round(Math.hypot(dx, dy) / CORNER_GRID_MM) * CORNER_GRID_MM;
  const angle = (snapAngle((Math.atan2(dy, dx) * 180) / Math.PI) * Math.PI) / 180;
  return [Math.round(last[0] + Math.cos(angle) * len), Math.round(last[1] + Math.sin(angle) * len)];
}

/** A dragged corner lines up with its neighbours' x or y when close, so walls stay square. */
export function alignToNeighbours(outline: RoomShell['outline'], index: number, p: [number, number]): [number, number] {
  const n = outline.length;
  const neighbours = [outline[(index + n - 1) % n], outline[(index + 1) % n]];
  let [x, y] = p;
  for (const q of neighbours) {
    if (Math.abs(q[0] - x) < ALIGN_SNAP_MM) x = q[0];
    if (Math.abs(q[1] - y) < ALIGN_SNAP_MM) y = q[1];
  }
  return [x, y];
}
