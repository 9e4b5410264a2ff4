// Tests for laying out walls round an outline: outward growth in either winding, mitres at square,
// re-entrant and 45° corners, steps between thicknesses, sharp corners cut square, per-wall overrides.
import { describe, expect, it } from 'vitest';
import { areaMm2 } from './polygon';
import { layoutShellWalls, layoutWalls, outerRingMm, wallThicknessMm } from './walls';
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

function expectPoint(actual: Vec2, expected: Vec2): void {
  expect(actual[0]).toBeCloseTo(expected[0], 6);
  expect(actual[1]).toBeCloseTo(expected[1], 6);
}

describe('layoutWalls', () => {
  it('grows walls outward with square mitres at a rectangle', () => {
    const walls = layoutWalls(rectangle, [100, 100, 100, 100]);
    expectPoint(walls[0].outerStart, [-100, -100]);
    expectPoint(walls[0].outerEnd, [4300, -100]);
    expectPoint(walls[2].outerStart, [4300, 3700]);
    expect(walls[0].outward).toEqual([0, -1]);
    expect(walls[0].outerFromMm).toBeCloseTo(-100, 9);
    expect(walls[0].outerToMm).toBeCloseTo(4300, 9);
    expect(walls.every((w) => w.startJoin === null)).toBe(true);
  });

  it('grows outward whichever way the outline winds, keeping wall indices', () => {
    const reversed = [...rectangle].reverse();
    const walls = layoutWalls(reversed, [100, 100, 100, 100]);
    // wall 0 now runs along the bottom from (0, 3600) to (4200, 3600); outward is +y (down the page)
    expect(walls[0].start).toEqual([0, 3600]);
    expectPoint(walls[0].outward, [0, 1]);
    expectPoint(walls[0].outerStart, [-100, 3700]);
    expect(areaMm2(outerRingMm(walls))).toBeCloseTo(4400 * 3800, 3);
  });

  it('meets walls of different thickness at the crossing of their outside lines', () => {
    const walls = layoutWalls(rectangle, [200, 100, 100, 300]);
    // wall 3 (left, 300 thick) meets wall 0 (top, 200 thick) at (−300, −200)
    expectPoint(walls[0].outerStart, [-300, -200]);
    expectPoint(walls[3].outerEnd, [-300, -200]);
    expectPoint(walls[0].outerEnd, [4300, -200]);
  });

  it('pulls the outside corner in at a re-entrant corner', () => {
    const walls = layoutWalls(
      lShape,
      lShape.map(() => 100),
    );
    // inner corner (3000, 2500): the outside faces meet at (3100, 2600)
    expectPoint(walls[2].outerEnd, [3100, 2600]);
    expectPoint(walls[3].outerStart, [3100, 2600]);
    expect(walls[3].outerFromMm).toBeCloseTo(100, 9);
  });

  it('mitres a 45° bay corner at thickness / cos(22.5°) from the inside corner', () => {
    const bay: Vec2[] = [
      [0, 0],
      [3000, 0],
      [3000, 1000],
      [3400, 1400],
      [3400, 2600],
      [3000, 3000],
      [3000, 4000],
      [0, 4000],
    ];
    const walls = layoutWalls(
      bay,
      bay.map(() => 100),
    );
    const corner = bay[3];
    const mitre = walls[3].outerStart;
    expect(Math.hypot(mitre[0] - corner[0], mitre[1] - corner[1])).toBeCloseTo(100 / Math.cos(Math.PI / 8), 6);
  });

  it('continues straight through a corner between collinear walls of equal thickness', () => {
    const withMidpoint: Vec2[] = [
      [0, 0],
      [2000, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ];
    const walls = layoutWalls(withMidpoint, [100, 100, 100, 100, 100]);
    expectPoint(walls[1].outerStart, [2000, -100]);
    expect(walls[1].startJoin).toBeNull();
  });

  it('steps square between collinear walls of different thickness', () => {
    const withMidpoint: Vec2[] = [
      [0, 0],
      [2000, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ];
    const walls = layoutWalls(withMidpoint, [100, 250, 100, 100, 100]);
    expect(walls[1].startJoin).not.toBeNull();
    expectPoint(walls[0].outerEnd, [2000, -100]);
    expectPoint(walls[1].outerStart, [2000, -250]);
    // the step face is seen from the thinner wall's side, looking along −x
    expectPoint(walls[1].startJoin!.normal, [-1, 0]);
  });

  it('cuts a very sharp corner square instead of a long spike', () => {
    const sharp: Vec2[] = [
      [0, 0],
      [5000, 0],
      [0, 300],
    ];
    const walls = layoutWalls(sharp, [100, 100, 100]);
    const join = walls[1].startJoin;
    expect(join).not.toBeNull();
    const reach = Math.hypot(walls[1].outerStart[0] - 5000, walls[1].outerStart[1]);
    expect(reach).toBeCloseTo(100, 6);
  });
});

describe('wall thickness of a shell', () => {
  it('uses a per-wall override and falls back to the room thickness', () => {
    const shell = {
      outline: rectangle.map((p): [number, number] => [p[0], p[1]]),
      wallThickness: 120,
      wallThicknesses: [null, 250],
    };
    expect(wallThicknessMm(shell, 0)).toBe(120);
    expect(wallThicknessMm(shell, 1)).toBe(250);
    expect(wallThicknessMm(shell, 3)).toBe(120);
    expect(layoutShellWalls(shell)[1].thicknessMm).toBe(250);
  });
});
