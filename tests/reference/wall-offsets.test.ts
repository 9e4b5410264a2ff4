// The walls' outer ring (the outline grown outward by the wall thickness) against offsetting by
// an outside library, clipper-lib.
import ClipperLib from 'clipper-lib';
import { describe, expect, it } from 'vitest';
import { areaMm2 } from '../../shared/geometry/polygon';
import { layoutWalls, outerRingMm } from '../../shared/geometry/walls';

type P = [number, number];
/** Clipper works in integers; micrometres keep its rounding far below a millimetre. */
const SCALE = 1000;

function clipperOuterRing(outline: P[], thicknessMm: number): P[] {
  // A high mitre limit so clipper mitres every corner these shapes have, as Parlour does.
  const offset = new ClipperLib.ClipperOffset(10, 0.25);
  offset.AddPath(
    outline.map(([x, y]) => ({ X: Math.round(x * SCALE), Y: Math.round(y * SCALE) })),
    ClipperLib.JoinType.jtMiter,
    ClipperLib.EndType.etClosedPolygon,
  );
  const solution: { X: number; Y: number }[][] = [];
  offset.Execute(solution, thicknessMm * SCALE);
  expect(solution).toHaveLength(1);
  return solution[0].map((p) => [p.X / SCALE, p.Y / SCALE]);
}

const shapes: Record<string, P[]> = {
  rectangle: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
  'L shape': [
    [0, 0],
    [5000, 0],
    [5000, 2500],
    [3000, 2500],
    [3000, 4000],
    [0, 4000],
  ],
  'U shape': [
    [0, 0],
    [1000, 0],
    [1000, 2000],
    [2000, 2000],
    [2000, 0],
    [3000, 0],
    [3000, 3000],
    [0, 3000],
  ],
  'bay window': [
    [0, 0],
    [3000, 0],
    [3000, 1000],
    [3400, 1400],
    [3400, 2600],
    [3000, 3000],
    [3000, 4000],
    [0, 4000],
  ],
  'splayed corner': [
    [0, 0],
    [3300, 0],
    [4000, 700],
    [4000, 3000],
    [0, 3000],
  ],
};

describe('outward wall growth against clipper-lib offsetting (ClipperOffset, jtMiter)', () => {
  for (const [name, outline] of Object.entries(shapes)) {
    for (const winding of ['as drawn', 'reversed'] as const) {
      it(`matches for the ${name} (${winding}) at 100 mm`, () => {
        const shape = winding === 'as drawn' ? outline : [...outline].reverse();
        const ours = outerRingMm(
          layoutWalls(
            shape,
            shape.map(() => 100),
          ),
        );
        const theirs = clipperOuterRing(shape, 100);
        expect(areaMm2(ours)).toBeCloseTo(areaMm2(theirs), 0);
        expect(ours).toHaveLength(theirs.length);
        for (const point of ours) {
          const nearest = Math.min(...theirs.map((q) => Math.hypot(q[0] - point[0], q[1] - point[1])));
          expect(nearest).toBeLessThan(0.01);
        }
      });
    }
  }
});
