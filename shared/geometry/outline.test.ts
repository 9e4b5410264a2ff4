// Tests for outlines from measured walks: rectangles, L shapes and splayed corners, how far a walk
// misses, closing it with the angles kept, typed corners, retraced walks and interior angles.
import { describe, expect, it } from 'vitest';
import { closeOutline, interiorAnglesDeg, outlineFromCorners, outlineFromWalk, walkFromOutline, type WalkStep } from './outline';
import { areaMm2, findSelfCrossings } from './polygon';

function expectCorners(actual: [number, number][], expected: [number, number][]): void {
  expect(actual.length).toBe(expected.length);
  actual.forEach((point, i) => {
    expect(point[0]).toBeCloseTo(expected[i][0], 6);
    expect(point[1]).toBeCloseTo(expected[i][1], 6);
  });
}

describe('outlineFromWalk', () => {
  it('walks a rectangle with the default right-angle right turns', () => {
    const walk = outlineFromWalk([{ lengthMm: 4200 }, { lengthMm: 3600 }, { lengthMm: 4200 }, { lengthMm: 3600 }]);
    expectCorners(walk.corners, [
      [0, 0],
      [4200, 0],
      [4200, 3600],
      [0, 3600],
    ]);
    expect(walk.closure.gapMm).toBeCloseTo(0, 9);
    expect(walk.closure.angleErrorDeg).toBeCloseTo(0, 9);
  });

  it('walks an L shape with one left turn at the inner corner', () => {
    const steps: WalkStep[] = [
      { lengthMm: 5000 },
      { lengthMm: 2500 },
      { lengthMm: 2000, turn: 'left' },
      { lengthMm: 1500 },
      { lengthMm: 3000 },
      { lengthMm: 4000 },
    ];
    const walk = outlineFromWalk(steps);
    expectCorners(walk.corners, [
      [0, 0],
      [5000, 0],
      [5000, 2500],
      [3000, 2500],
      [3000, 4000],
      [0, 4000],
    ]);
    expect(walk.closure.gapMm).toBeCloseTo(0, 6);
  });

  it('walks a room with a splayed corner at 45°', () => {
    const splay = 1000;
    const side = splay / Math.SQRT2;
    const steps: WalkStep[] = [
      { lengthMm: 4000 - side, turnDeg: 45 },
      { lengthMm: splay, turnDeg: 45 },
      { lengthMm: 3000 - side },
      { lengthMm: 4000 },
      { lengthMm: 3000 },
    ];
    const walk = outlineFromWalk(steps);
    expect(walk.closure.gapMm).toBeCloseTo(0, 6);
    expect(areaMm2(walk.corners)).toBeCloseTo(12_000_000 - (side * side) / 2, 3);
  });

  it('reports how far an imperfect walk misses, and by what angle', () => {
    const walk = outlineFromWalk([{ lengthMm: 4200 }, { lengthMm: 3600 }, { lengthMm: 4190 }, { lengthMm: 3590, turnDeg: 89 }]);
    expect(walk.closure.dxMm).toBeCloseTo(-10, 6);
    expect(walk.closure.dyMm).toBeCloseTo(-10, 6);
    expect(walk.closure.gapMm).toBeCloseTo(Math.SQRT2 * 10, 6);
    expect(walk.closure.angleErrorDeg).toBeCloseTo(-1, 9);
  });

  it('starts from a given corner and heading', () => {
    const walk = outlineFromWalk([{ lengthMm: 1000 }, { lengthMm: 1000 }, { lengthMm: 1000 }, { lengthMm: 1000 }], {
      x: 500,
      y: 500,
      headingDeg: 90,
    });
    expectCorners(walk.corners, [
      [500, 500],
      [500, 1500],
      [-500, 1500],
      [-500, 500],
    ]);
  });
});

describe('closeOutline', () => {
  it('stretches the last two walls and keeps the right angles', () => {
    const closed = closeOutline([{ lengthMm: 4200 }, { lengthMm: 3600 }, { lengthMm: 4190 }, { lengthMm: 3590 }]);
    expect(closed.method).toBe('last-two-walls');
    expectCorners(closed.corners, [
      [0, 0],
      [4200, 0],
      [4200, 3600],
      [0, 3600],
    ]);
    expect(closed.changes).toEqual([
      { wall: 2, measuredMm: 4190, closedMm: expect.closeTo(4200, 6) },
      { wall: 3, measuredMm: 3590, closedMm: expect.closeTo(3600, 6) },
    ]);
  });

  it('falls back to running the last wall straight home when the last two are parallel', () => {
    // The west wall is measured in two parts (no turn between them), so the last two walls are parallel.
    const closed = closeOutline([
      { lengthMm: 4000 },
      { lengthMm: 3000 },
      { lengthMm: 4000 },
      { lengthMm: 1500, turnDeg: 0 },
      { lengthMm: 1490 },
    ]);
    expect(closed.method).toBe('last-wall');
    expect(closed.changes).toEqual([{ wall: 4, measuredMm: 1490, closedMm: expect.closeTo(1500, 6) }]);
    expectCorners(closed.corners, [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
      [0, 1500],
    ]);
  });
});

describe('corners and walks', () => {
  it('drops a repeated closing corner only', () => {
    expect(
      outlineFromCorners([
        [0, 0],
        [10, 0],
        [10, 10],
        [0, 0],
      ]),
    ).toEqual([
      [0, 0],
      [10, 0],
      [10, 10],
    ]);
    expect(
      outlineFromCorners([
        [0, 0],
        [10, 0],
        [10, 10],
      ]),
    ).toEqual([
      [0, 0],
      [10, 0],
      [10, 10],
    ]);
  });

  it('retraces an outline as a walk that rebuilds it, in either winding', () => {
    const lShape: [number, number][] = [
      [0, 0],
      [5000, 0],
      [5000, 2500],
      [3000, 2500],
      [3000, 4000],
      [0, 4000],
    ];
    for (const shape of [lShape, [...lShape].reverse()]) {
      const { start, steps } = walkFromOutline(shape);
      const rebuilt = outlineFromWalk(steps, start);
      expectCorners(rebuilt.corners, shape);
      expect(rebuilt.closure.gapMm).toBeCloseTo(0, 6);
    }
    expect(walkFromOutline(lShape).steps[2]).toEqual({ lengthMm: 2000, turnDeg: 90, turn: 'left' });
  });

  it('gives interior angles with the re-entrant corner above 180°, either winding', () => {
    const lShape: [number, number][] = [
      [0, 0],
      [5000, 0],
      [5000, 2500],
      [3000, 2500],
      [3000, 4000],
      [0, 4000],
    ];
    expect(interiorAnglesDeg(lShape).map((a) => Math.round(a))).toEqual([90, 90, 90, 270, 90, 90]);
    expect(interiorAnglesDeg([...lShape].reverse()).map((a) => Math.round(a))).toEqual([90, 90, 270, 90, 90, 90]);
    expect(findSelfCrossings(lShape)).toEqual([]);
  });
});
