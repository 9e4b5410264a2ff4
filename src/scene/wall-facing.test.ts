// Tests for which walls are faded in the Overview: the walls nearest the eye in a rectangular and an
// L-shaped room, and none when looking straight down.
import { describe, expect, it } from 'vitest';
import { buildRoomScene } from '../../shared/geometry/scene';
import { wallsFacingEye } from './wall-facing';
import { exampleShell, lShapedShell } from './test-rooms';

// Scene metres: x right, z down the plan, y up. The example room spans x 0–4.2, z 0–3.6.
const walls = buildRoomScene(exampleShell, { pieces: [] }).walls;
const centre: [number, number, number] = [2.1, 1.3, 1.8];
const height = 6;

describe('wallsFacingEye in a rectangular room', () => {
  it.each([
    ['above the top of the plan (wall 0 runs along it)', [2.1, height, -6], [0]],
    ['right of the plan', [10, height, 1.8], [1]],
    ['below the plan', [2.1, height, 10], [2]],
    ['left of the plan', [-6, height, 1.8], [3]],
  ] as const)('fades only the wall between the room and an eye %s', (_, eye, expected) => {
    expect(wallsFacingEye(walls, eye, centre)).toEqual(expected);
  });

  it('fades both near walls when the eye looks in over a corner', () => {
    expect(wallsFacingEye(walls, [9, height, 9], centre).sort()).toEqual([1, 2]);
  });

  it('fades nothing when the eye looks straight down', () => {
    expect(wallsFacingEye(walls, [2.1, 15, 1.8], centre)).toEqual([]);
  });
});

describe('wallsFacingEye in an L-shaped room', () => {
  const lWalls = buildRoomScene(lShapedShell, { pieces: [] }).walls;
  const lCentre: [number, number, number] = [3.1, 1.35, 2.8];

  it('from below the plan, fades the bottom wall and the cut-away corner wall that also faces down the plan', () => {
    expect(wallsFacingEye(lWalls, [3.1, height, 14], lCentre).sort()).toEqual([2, 4]);
  });

  it('from the right, fades the right wall and the cut-away corner wall that also faces right', () => {
    expect(wallsFacingEye(lWalls, [16, height, 2.8], lCentre).sort()).toEqual([1, 3]);
  });
});
