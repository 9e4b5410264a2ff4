// Tests for polygon helpers: area, perimeter, winding and bounds, self-crossing walls (against
// segmentsTouch on random outlines), ear-clipping triangulation, and point in polygon.
import { describe, expect, it } from 'vitest';
import {
  MAX_REPORTED_CROSSINGS,
  areaMm2,
  boundsMm,
  findSelfCrossings,
  perimeterMm,
  pointInPolygon,
  segmentsTouch,
  signedAreaMm2,
  triangulatePolygon,
  windingOnPlan,
} from './polygon';
import { combOutline, starOutline } from './test-outlines';
import { cross, distance, dot, sub } from './vec';
import { POINT_TOLERANCE_MM } from './tolerances';
import type { Vec2 } from './vec';

const rectangle: Vec2[] = [
  [0, 0],
  [4200, 0],
  [4200, 3600],
  [0, 3600],
];
const lShape: Vec2[] = [
  [0, 0],
  [5000, 0],
  [5000, 2500],
  [3000, 2500],
  [3000, 4000],
  [0, 4000],
];

function triangleArea(points: readonly Vec2[], triangles: number[]): number {
  let total = 0;
  for (let k = 0; k < triangles.length; k += 3)
    total += Math.abs(signedAreaMm2([points[triangles[k]], points[triangles[k + 1]], points[triangles[k + 2]]]));
  return total;
}

describe('area, perimeter and winding', () => {
  it('measures a rectangle', () => {
    expect(areaMm2(rectangle)).toBe(15_120_000);
    expect(perimeterMm(rectangle)).toBe(15_600);
  });

  it('gives the same area either way round but tells the winding apart', () => {
    const reversed = [...lShape].reverse();
    expect(areaMm2(reversed)).toBe(areaMm2(lShape));
    expect(signedAreaMm2(reversed)).toBe(-signedAreaMm2(lShape));
    // right along the top, then down the page: clockwise as seen on the plan
    expect(windingOnPlan(lShape)).toBe('clockwise');
    expect(windingOnPlan(reversed)).toBe('counter-clockwise');
  });

  it('finds the bounds', () => {
    expect(boundsMm(lShape)).toEqual({ minX: 0, minY: 0, maxX: 5000, maxY: 4000 });
  });
});

describe('findSelfCrossings', () => {
  it('accepts simple outlines, L shapes and bays', () => {
    expect(findSelfCrossings(rectangle)).toEqual([]);
    expect(findSelfCrossings(lShape)).toEqual([]);
    expect(
      findSelfCrossings([
        [0, 0],
        [3000, 0],
        [3000, 1000],
        [3400, 1400],
        [3400, 2600],
        [3000, 3000],
        [3000, 4000],
        [0, 4000],
      ]),
    ).toEqual([]);
  });

  it('finds walls that cross in a bow tie', () => {
    expect(
      findSelfCrossings([
        [0, 0],
        [4000, 0],
        [0, 3000],
        [4000, 3000],
      ]),
    ).toEqual([{ wallA: 1, wallB: 3 }]);
  });

  it('finds a wall that doubles back along its neighbour', () => {
    expect(
      findSelfCrossings([
        [0, 0],
        [4000, 0],
        [2000, 0],
        [2000, 3000],
      ]).length,
    ).toBeGreaterThan(0);
  });

  it('finds a corner touching another wall', () => {
    expect(
      findSelfCrossings([
        [0, 0],
        [4000, 0],
        [4000, 3000],
        [2000, 0],
        [0, 3000],
      ]).length,
    ).toBeGreaterThan(0);
  });

  it('stops after a few crossings, even when every wall crosses nearly every other', () => {
    const star = starOutline(200);
    expect(star).toHaveLength(200);
    // Every pair, unlimited: the star really is the worst case for the list (thousands of pairs).
    expect(findSelfCrossings(star, Infinity).length).toBeGreaterThan(15_000);
    const reported = findSelfCrossings(star);
    expect(reported).toHaveLength(MAX_REPORTED_CROSSINGS);
    expect(MAX_REPORTED_CROSSINGS).toBe(20);
    expect(reported[0]).toEqual({ wallA: 0, wallB: 2 });
  });

  it('finds nothing in 200-corner combs, where every pair of walls must be looked at', () => {
    for (const comb of [combOutline(200), combOutline(200, { toothMm: 100, slantMm: 10_000 })]) {
      expect(comb).toHaveLength(200);
      expect(findSelfCrossings(comb)).toEqual([]);
    }
    // One tooth bent back across its neighbour is still found.
    const bent = combOutline(200);
    bent[5] = [-300, 5000];
    expect(findSelfCrossings(bent).length).toBeGreaterThan(0);
  });

  it('agrees pair for pair with segmentsTouch on random outlines', () => {
    // The plain definition: every pair tested with segmentsTouch, neighbours only when folded back.
    const reference = (points: readonly Vec2[]) => {
      const found: { wallA: number; wallB: number }[] = [];
      const n = points.length;
      for (let i = 0; i < n; i++) {
        for (let j = i + 1; j < n; j++) {
          const [a, b, c, d] = [points[i], points[(i + 1) % n], points[j], points[(j + 1) % n]];
          if (j === i + 1 || (i === 0 && j === n - 1)) {
            const [shared, awayA, awayB] = j === i + 1 ? [b, a, d] : [a, b, c];
            const u = sub(awayA, shared);
            const v = sub(awayB, shared);
            if (Math.abs(cross(u, v)) / Math.max(distance(awayA, shared), 1) < POINT_TOLERANCE_MM && dot(u, v) > 0)
              found.push({ wallA: i, wallB: j });
          } else if (segmentsTouch(a, b, c, d)) found.push({ wallA: i, wallB: j });
        }
      }
      return found;
    };
    let seed = 12345;
    // A small linear congruential generator (Numerical Recipes' constants), so the run repeats.
    const random = () => (seed = (seed * 1664525 + 1013904223) >>> 0) / 2 ** 32;
    for (let trial = 0; trial < 300; trial++) {
      const n = 4 + (trial % 9);
      // Whole 500 mm steps make collinear walls and touching corners common.
      const points: Vec2[] = Array.from({ length: n }, () => [Math.floor(random() * 9) * 500, Math.floor(random() * 9) * 500]);
      expect(findSelfCrossings(points, Infinity)).toEqual(reference(points));
    }
  });
});

describe('triangulatePolygon', () => {
  it('covers convex and re-entrant outlines exactly, in either winding', () => {
    for (const shape of [rectangle, lShape, [...lShape].reverse()]) {
      const triangles = triangulatePolygon(shape);
      expect(triangles.length).toBe((shape.length - 2) * 3);
      expect(triangleArea(shape, triangles)).toBeCloseTo(areaMm2(shape), 3);
    }
  });

  it('copes with a straight-through corner', () => {
    const withMidpoint: Vec2[] = [
      [0, 0],
      [2000, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ];
    expect(triangleArea(withMidpoint, triangulatePolygon(withMidpoint))).toBeCloseTo(12_000_000, 3);
  });

  it('keeps a bump-out whose corners line up with the long wall inside the room', () => {
    // 7.0 × 4.5 m plus a 2.6 × 1.5 m bay: 31.5 + 3.9 = 35.4 m² (derived).
    const bay: Vec2[] = [
      [0, 0],
      [7000, 0],
      [7000, 4500],
      [4800, 4500],
      [4800, 6000],
      [2200, 6000],
      [2200, 4500],
      [0, 4500],
    ];
    for (const shape of [bay, [...bay].reverse()]) {
      expect(triangleArea(shape, triangulatePolygon(shape))).toBeCloseTo(35_400_000, 0);
    }
  });

  it('covers a U shape', () => {
    const u: Vec2[] = [
      [0, 0],
      [1000, 0],
      [1000, 2000],
      [2000, 2000],
      [2000, 0],
      [3000, 0],
      [3000, 3000],
      [0, 3000],
    ];
    expect(triangleArea(u, triangulatePolygon(u))).toBeCloseTo(areaMm2(u), 3);
  });
});

describe('pointInPolygon', () => {
  const l: Vec2[] = [
    [0, 0],
    [6000, 0],
    [6000, 3000],
    [3000, 3000],
    [3000, 5000],
    [0, 5000],
  ];

  it('tells inside from outside of an L-shaped outline, drawn either way round', () => {
    for (const outline of [l, [...l].reverse()]) {
      expect(pointInPolygon([1000, 4000], outline)).toBe(true);
      expect(pointInPolygon([5000, 4000], outline)).toBe(false);
      expect(pointInPolygon([5000, 1000], outline)).toBe(true);
      expect(pointInPolygon([-1, 2500], outline)).toBe(false);
      expect(pointInPolygon([3001, 3001], outline)).toBe(false);
      expect(pointInPolygon([2999, 4999], outline)).toBe(true);
    }
  });

  it('finds nothing inside fewer than three corners', () => {
    expect(pointInPolygon([0, 0], [])).toBe(false);
    expect(
      pointInPolygon(
        [500, 0],
        [
          [0, 0],
          [1000, 0],
        ],
      ),
    ).toBe(false);
  });
});
