import { describe, expect, it } from 'vitest';
import { areaMm2, boundsMm, findSelfCrossings, perimeterMm, signedAreaMm2, triangulatePolygon, windingOnPlan } from './polygon';
import type { Vec2 } from './vec';

const rectangle: Vec2[] = [[0, 0], [4200, 0], [4200, 3600], [0, 3600]];
const lShape: Vec2[] = [[0, 0], [5000, 0], [5000, 2500], [3000, 2500], [3000, 4000], [0, 4000]];

function triangleArea(points: readonly Vec2[], triangles: number[]): number {
  let total = 0;
  for (let k = 0; k < triangles.length; k += 3) total += Math.abs(signedAreaMm2([points[triangles[k]], points[triangles[k + 1]], points[triangles[k + 2]]]));
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
    expect(findSelfCrossings([[0, 0], [3000, 0], [3000, 1000], [3400, 1400], [3400, 2600], [3000, 3000], [3000, 4000], [0, 4000]])).toEqual([]);
  });

  it('finds walls that cross in a bow tie', () => {
    expect(findSelfCrossings([[0, 0], [4000, 0], [0, 3000], [4000, 3000]])).toEqual([{ wallA: 1, wallB: 3 }]);
  });

  it('finds a wall that doubles back along its neighbour', () => {
    expect(findSelfCrossings([[0, 0], [4000, 0], [2000, 0], [2000, 3000]]).length).toBeGreaterThan(0);
  });

  it('finds a corner touching another wall', () => {
    expect(findSelfCrossings([[0, 0], [4000, 0], [4000, 3000], [2000, 0], [0, 3000]]).length).toBeGreaterThan(0);
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
    const withMidpoint: Vec2[] = [[0, 0], [2000, 0], [4000, 0], [4000, 3000], [0, 3000]];
    expect(triangleArea(withMidpoint, triangulatePolygon(withMidpoint))).toBeCloseTo(12_000_000, 3);
  });

  it('keeps a bump-out whose corners line up with the long wall inside the room', () => {
    // 7.0 × 4.5 m plus a 2.6 × 1.5 m bay: 31.5 + 3.9 = 35.4 m² (derived).
    const bay: Vec2[] = [[0, 0], [7000, 0], [7000, 4500], [4800, 4500], [4800, 6000], [2200, 6000], [2200, 4500], [0, 4500]];
    for (const shape of [bay, [...bay].reverse()]) {
      expect(triangleArea(shape, triangulatePolygon(shape))).toBeCloseTo(35_400_000, 0);
    }
  });

  it('covers a U shape', () => {
    const u: Vec2[] = [[0, 0], [1000, 0], [1000, 2000], [2000, 2000], [2000, 0], [3000, 0], [3000, 3000], [0, 3000]];
    expect(triangleArea(u, triangulatePolygon(u))).toBeCloseTo(areaMm2(u), 3);
  });
});
