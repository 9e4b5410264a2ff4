// Tests for finding a way across a room on foot: round an open door leaf, round a sofa, and a
// pocket of floor that cannot be reached.
import { describe, expect, it } from 'vitest';
import { pieceFromCatalogue } from '../catalogue/catalogue';
import { roomShellSchema } from '../schemas/room';
import { BODY_RADIUS_MM, walkLine, walkObstacles, type WalkObstacles } from './walk';
import { findWalkPath } from './walk-path';
import type { Vec2 } from './vec';

const R = BODY_RADIUS_MM;
const shell = roomShellSchema.parse({
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  openings: [{ id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
});

// Every leg of the path is a straight line the body walks end to end.
function expectWalkable(obstacles: WalkObstacles, from: Vec2, path: [number, number][]) {
  let here = from;
  for (const p of path) {
    expect(walkLine(obstacles, here, p)).toEqual(p);
    here = p;
  }
}

describe('finding a way across a room', () => {
  it('goes straight where nothing is in the way', () => {
    const obstacles = walkObstacles(shell, []);
    expect(findWalkPath(obstacles, [2000, 2500], [3000, 1000])).toEqual([[3000, 1000]]);
  });

  it('goes round the open door leaf instead of stopping at it', () => {
    // A door hinged at x 1500: the leaf stands from (1500, 0) to (1500, 820); from its left to its right side.
    const hingedMid = { ...shell, openings: [{ ...shell.openings[0]!, offset: 1500 }] };
    const obstacles = walkObstacles(hingedMid, []);
    const from: Vec2 = [1000, 400];
    const to: Vec2 = [2000, 400];
    expect(walkLine(obstacles, from, to)[0]).toBeLessThan(1500);
    const path = findWalkPath(obstacles, from, to)!;
    expect(path.at(-1)).toEqual(to);
    expect(path.length).toBeGreaterThan(1);
    // Round the leaf's tip, below it.
    expect(Math.max(...path.map((p) => p[1]))).toBeGreaterThan(820 + R);
    expectWalkable(obstacles, from, path);
  });

  it('goes round a sofa in the middle of the room', () => {
    const sofa = pieceFromCatalogue('sofa-3-seat', 'sofa', [2000, 1500]);
    const obstacles = walkObstacles(shell, [sofa]);
    const from: Vec2 = [2000, 2700];
    const to: Vec2 = [2000, 600];
    const path = findWalkPath(obstacles, from, to)!;
    expect(path.at(-1)).toEqual(to);
    expect(path.length).toBeGreaterThan(1);
    expectWalkable(obstacles, from, path);
  });

  it('says a pocket walled in by pieces cannot be reached, nor a point inside a piece', () => {
    // A corner closed off by two chests end to end from wall to wall.
    const a = { ...pieceFromCatalogue('sofa-3-seat', 'a', [0, 0]), x: 3000, y: 500, width: 2000, depth: 200, rotation: 0 };
    const b = { ...a, id: 'b', x: 2500, y: 250, width: 200, depth: 700 };
    const obstacles = walkObstacles(shell, [a, b]);
    expect(findWalkPath(obstacles, [1000, 2000], [3500, 250])).toBeNull();
    expect(findWalkPath(obstacles, [1000, 2000], [3000, 500])).toBeNull();
  });
});
