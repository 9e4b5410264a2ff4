// Tests for snapping: piece footprints under rotation, snapping to the grid and to an angle step,
// to walls (flush, facing into the room, in an L) and to neighbouring pieces, and nudging.
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import type { Piece } from '../schemas/option';
import { pieceBoundsMm, pieceFootprintMm } from '../geometry/piece';
import {
  nudge,
  snapAngle,
  snapPieceToPieces,
  snapPieceToWalls,
  snapToGrid,
  NUDGE_STEP_MM,
  WALL_SNAP_TOLERANCE_MM,
} from './snapping';
import { lOutline } from '../../tests/fixtures/commands';

// 4200 × 3600 mm: wall 0 along the top (y = 0), 1 on the right, 2 along the bottom, 3 on the left.
const shell = roomShellSchema.parse({
  outline: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
});

function box(id: string, x: number, y: number, width: number, depth: number, rotation = 0, placed = true): Piece {
  return { id, name: id, x, y, width, depth, height: 800, rotation, elevation: 0, status: 'new', placed };
}

function expectPose(piece: Pick<Piece, 'x' | 'y' | 'rotation'>, x: number, y: number, rotation: number): void {
  expect(piece.x).toBeCloseTo(x, 6);
  expect(piece.y).toBeCloseTo(y, 6);
  expect(piece.rotation).toBeCloseTo(rotation, 9);
}

describe('piece footprint', () => {
  it('turns width and depth with the rotation (clockwise on the plan)', () => {
    // a 1000 × 500 box turned 90°: its width now runs down the page
    const bounds = pieceBoundsMm(box('a', 1000, 1000, 1000, 500, 90));
    expect(bounds.minX).toBeCloseTo(750, 9);
    expect(bounds.maxX).toBeCloseTo(1250, 9);
    expect(bounds.minY).toBeCloseTo(500, 9);
    expect(bounds.maxY).toBeCloseTo(1500, 9);
    // its back-left corner at rotation 0 is up and to the left of the centre
    expect(pieceFootprintMm(box('a', 0, 0, 1000, 500))[0]).toEqual([-500, -250]);
  });
});

describe('snapToGrid and snapAngle', () => {
  it('rounds a plan point to the grid', () => {
    expect(snapToGrid([1249, -151], 100)).toEqual([1200, -200]);
    expect(snapToGrid([1250, 49], 100)).toEqual([1300, 0]);
    expect(snapToGrid([1249, 7], 0)).toEqual([1249, 7]);
    expect(Object.is(snapToGrid([-20, 0], 100)[0], 0)).toBe(true);
  });

  it('rounds an angle to the step and folds it into [0, 360)', () => {
    expect(snapAngle(52)).toBe(45);
    expect(snapAngle(-7)).toBe(0);
    expect(snapAngle(-8)).toBe(345);
    expect(snapAngle(353)).toBe(0);
    expect(snapAngle(100, 90)).toBe(90);
  });
});

describe('snapPieceToWalls', () => {
  it('puts a piece near the top wall flush against it, facing into the room at rotation 0', () => {
    // footprint from y = 70 to 970: 70 mm off the top wall
    const snapped = snapPieceToWalls(box('sofa', 2100, 520, 2100, 900, 0), shell);
    expect(snapped.wall).toBe(0);
    expectPose(snapped.piece, 2100, 450, 0);
  });

  it('turns a piece by the bottom wall to 180 and one by the left wall to 270', () => {
    // bottom: footprint reaches y = 3550, 50 mm off the face at 3600
    const bottom = snapPieceToWalls(box('sofa', 2100, 3100, 2100, 900, 0), shell);
    expect(bottom.wall).toBe(2);
    expectPose(bottom.piece, 2100, 3150, 180);
    // left: a bookcase turned 90° is 300 mm across in x, from 80 to 380
    const left = snapPieceToWalls(box('books', 230, 1800, 800, 300, 90), shell);
    expect(left.wall).toBe(3);
    expectPose(left.piece, 150, 1800, 270);
  });

  it('turns a piece by the right wall to 90, so its front faces left into the room', () => {
    const right = snapPieceToWalls(box('desk', 3800, 1800, 1200, 600, 0), shell);
    // at rotation 0 the footprint reaches x = 4400, 200 mm into the wall: too far
    expect(right.wall).toBeNull();
    const near = snapPieceToWalls(box('desk', 3800, 1800, 1200, 600, 90), shell);
    // turned 90° it reaches x = 4100, 100 mm off the face at 4200
    expect(near.wall).toBe(1);
    expectPose(near.piece, 3900, 1800, 90);
  });

  it('pulls a piece pushed into a wall back out, and picks the nearest wall in a corner', () => {
    expectPose(snapPieceToWalls(box('sofa', 2100, 410, 2100, 900), shell).piece, 2100, 450, 0);
    // 30 mm off the left wall and 60 mm off the top: the left wall wins
    const corner = snapPieceToWalls(box('cube', 330, 360, 600, 600), shell);
    expect(corner.wall).toBe(3);
    expectPose(corner.piece, 300, 360, 270);
  });

  it('leaves a piece alone when no wall is within the tolerance', () => {
    const middle = box('table', 2100, 1800, 1200, 800);
    expect(snapPieceToWalls(middle, shell)).toEqual({ piece: middle, wall: null });
    expect(snapPieceToWalls(box('sofa', 2100, 520, 2100, 900), shell, 50).wall).toBeNull();
    expect(WALL_SNAP_TOLERANCE_MM).toBeGreaterThan(70);
  });

  it('snaps to the inner faces of an L-shaped room', () => {
    const l = roomShellSchema.parse({ outline: lOutline });
    // wall 2 runs from (5000, 2500) to (3000, 2500) with the room above it
    const snapped = snapPieceToWalls(box('chest', 4000, 2230, 800, 450), l);
    expect(snapped.wall).toBe(2);
    expectPose(snapped.piece, 4000, 2275, 180);
  });
});

describe('snapPieceToPieces', () => {
  const table = box('table', 1000, 1000, 1000, 500);

  it('butts a piece against a neighbour on one axis and lines up its edge on the other', () => {
    // table spans x 500–1500, y 750–1250; the stool spans x 1530–1930, y 830–1230
    const snapped = snapPieceToPieces(box('stool', 1730, 1030, 400, 400), [table]);
    expect(snapped.piece).toMatchObject({ x: 1700, y: 1050 });
    expect(snapped.x).toEqual({ pieceId: 'table', lineMm: 1500 });
    expect(snapped.y).toEqual({ pieceId: 'table', lineMm: 1250 });
  });

  it('ignores the piece itself, pieces in the holding area and edges beyond the tolerance', () => {
    const stool = box('stool', 1730, 1030, 400, 400);
    const result = snapPieceToPieces(stool, [{ ...stool, x: 1700 }, box('held', 1000, 1000, 1000, 500, 0, false)]);
    expect(result).toEqual({ piece: stool, x: null, y: null });
    expect(snapPieceToPieces(stool, [table], 20).x).toBeNull();
  });

  it('uses the plan box of a turned neighbour', () => {
    // turned 90°, the table spans x 750–1250
    const snapped = snapPieceToPieces(box('stool', 1480, 3000, 400, 400), [box('table', 1000, 1000, 1000, 500, 90)]);
    expect(snapped.piece.x).toBeCloseTo(1450, 9);
    expect(snapped.x?.lineMm).toBeCloseTo(1250, 9);
    expect(snapped.y).toBeNull();
  });
});

describe('nudge', () => {
  it('moves a piece by plan mm and keeps the rest', () => {
    expect(nudge(box('a', 100, 200, 10, 10), NUDGE_STEP_MM, -NUDGE_STEP_MM)).toMatchObject({ x: 110, y: 190, width: 10 });
  });
});
