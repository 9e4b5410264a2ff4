// Invented outlines (plan mm) at the corner cap, for the tests and the benchmark of the crossing check.
import type { PlanPoint } from '../schemas/room';

/**
 * A star polygon: `corners` points round a circle, each joined to the one `corners / 2 − 1` further
 * on, so every wall crosses nearly every other one (the worst case for a list of crossings).
 * `corners` must be even; the step is then odd and shares no factor with it.
 */
export function starOutline(corners: number, radiusMm = 15_000): PlanPoint[] {
  const step = corners / 2 - 1;
  return Array.from({ length: corners }, (_, j) => {
    const angle = (2 * Math.PI * ((j * step) % corners)) / corners;
    return [Math.round(radiusMm * Math.cos(angle)), Math.round(radiusMm * Math.sin(angle))];
  });
}

/**
 * A comb: a strip with (corners − 2) / 4 long teeth side by side, their tips `slantMm` to the right
 * of their roots. Nothing crosses, so a crossing check must look at every pair of walls (the worst
 * case for its time); slanted teeth wider than the comb put every tooth's walls in every other's
 * box, so no shortcut by boxes helps either. Corners left over sit evenly along the back wall.
 */
export function combOutline(corners: number, { toothMm = 400, lengthMm = 5_000, backMm = 1_000, slantMm = 0 } = {}): PlanPoint[] {
  const teeth = Math.floor((corners - 2) / 4);
  const points: PlanPoint[] = [];
  for (let t = 0; t < teeth; t++) {
    const x = t * 2 * toothMm;
    points.push([x, 0], [x + slantMm, lengthMm], [x + slantMm + toothMm, lengthMm], [x + toothMm, 0]);
  }
  const end = (2 * teeth - 1) * toothMm;
  const spare = corners - 4 * teeth - 2;
  points.push([end, -backMm]);
  for (let k = 1; k <= spare; k++) points.push([Math.round(end - (end * k) / (spare + 1)), -backMm]);
  points.push([0, -backMm]);
  return points;
}
