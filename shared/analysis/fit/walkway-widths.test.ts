// Tests for the widths kept from one walkway check to the next: after each step of a drag, the
// widths brought up to date must read exactly as widths measured afresh from the same floor.
import { describe, expect, it } from 'vitest';
import { placedBoxes, type PieceBox } from './boxes';
import { FREE, rasteriseFloor } from './floor-grid';
import { withSeatGaps } from './reach';
import { pieceInput, plan } from './test-plans';
import { findWalkwayProblems, WALKWAY_CELL_MM } from './walkway';
import { widestRoutes } from './walkway-grid';
import { floorWidths, forgetKeptWidths } from './walkway-floor';
import { Widths } from './walkway-widths';
import { blocksWalking } from '../../geometry/piece';
import type { Piece, PieceInput } from '../../schemas/option';
import type { RoomShellInput } from '../../schemas/room';
import { largeRoom, typicalFurnishedRoom } from '../../../scripts/bench/typical-room';

/** A repeatable stream of numbers in [0, 1) (a linear congruential generator, common practice). */
function stream(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

const obstaclesOf = (pieces: readonly Piece[]): PieceBox[] =>
  withSeatGaps(placedBoxes(pieces).filter((box) => blocksWalking(box.piece))).filled;

/** Ways in for the search: free cells along the top and bottom of the grid, a few rows in. */
function waysIn(widths: Widths): { cell: number; opening: number }[] {
  const { nx, ny, label } = widths.grid;
  const sources: { cell: number; opening: number }[] = [];
  for (const [j, opening] of [
    [3, 0],
    [ny - 4, 1],
  ] as const)
    for (let i = 0; i < nx; i += 3) if (label[j * nx + i] === FREE) sources.push({ cell: j * nx + i, opening });
  return sources;
}

/**
 * Kept widths beside widths made afresh from the same floor: the cells where the distance, the
 * exact width or the widest routes' bottleneck or (where a route reaches) way back differ, or where the kept gate lets a
 * route through wider than the cell allows.
 */
function differingCells(kept: Widths, walkwayMm: number): { free: number; differing: number[] } {
  const limitMm = Math.ceil(walkwayMm);
  const fresh = new Widths({ ...kept.grid, label: Int32Array.from(kept.grid.label) }, walkwayMm);
  const sources = waysIn(fresh);
  const keptRoutes = widestRoutes(kept.grid, kept, sources, limitMm);
  const keptRoute = { bottleneck: Int32Array.from(keptRoutes.bottleneckMm), parent: Int32Array.from(keptRoutes.parent) };
  const freshRoutes = widestRoutes(fresh.grid, fresh, sources, limitMm, false);
  const label = kept.grid.label;
  let free = 0;
  const differing: number[] = [];
  for (let cell = 0; cell < label.length; cell++) {
    if (kept.distanceCells[cell] !== fresh.distanceCells[cell]) differing.push(cell);
    else if (label[cell] === FREE) {
      free++;
      const widthMm = fresh.at(cell);
      const key = Math.floor(Math.min(widthMm, limitMm));
      const gateAllows = Math.max(key, Math.min(limitMm, Math.floor(fresh.lowerBoundMm(cell))));
      if (
        !Object.is(kept.at(cell), widthMm) ||
        kept.gateMm[cell]! > gateAllows ||
        keptRoute.bottleneck[cell] !== freshRoutes.bottleneckMm[cell] ||
        (freshRoutes.bottleneckMm[cell]! >= 0 && keptRoute.parent[cell] !== freshRoutes.parent[cell])
      )
        differing.push(cell);
    }
  }
  return { free, differing };
}

/** A drag: piece `index` moved in small steps, now and then turned, its widths checked at every step. */
function drag(shell: Parameters<typeof findWalkwayProblems>[0], pieces: Piece[], index: number, seed: number, walkwayMm: number) {
  const rand = stream(seed);
  forgetKeptWidths();
  let layout = pieces;
  for (let step = 0; step < 14; step++) {
    const piece = layout[index]!;
    const moved: Piece = {
      ...piece,
      x: piece.x + (rand() - 0.5) * 160,
      y: piece.y + (rand() - 0.5) * 160,
      rotation: step % 5 === 4 ? (piece.rotation + 10) % 360 : piece.rotation,
    };
    layout = layout.map((p, i) => (i === index ? moved : p));
    const obstacles = obstaclesOf(layout);
    const widths = floorWidths(shell.outline, obstacles, WALKWAY_CELL_MM, walkwayMm);
    // The labels drawn again where the piece moved read as the whole floor drawn afresh.
    const drawn = rasteriseFloor(shell.outline, obstacles, WALKWAY_CELL_MM).label;
    expect(
      widths.grid.label.every((label, cell) => label === drawn[cell]),
      `labels at step ${step}`,
    ).toBe(true);
    const { free, differing } = differingCells(widths, walkwayMm);
    expect(free).toBeGreaterThan(0);
    expect(differing, `step ${step}`).toEqual([]);
  }
  return layout;
}

describe('widths kept between checks', () => {
  it('read as widths measured afresh at every step of drags in the typical furnished room', () => {
    const { shell, option } = typicalFurnishedRoom();
    for (const [index, seed] of [
      [3, 1],
      [19, 2],
      [26, 3],
    ] as const)
      drag(shell, option.pieces, index, seed, 900);
    drag(shell, option.pieces, 11, 4, 750.5);
  }, 60_000);

  it('read as widths measured afresh in the large room, a piece dragged among 200', () => {
    const { shell, pieces } = largeRoom();
    drag(shell, pieces, 110, 5, 900);
  }, 60_000);

  it('give the findings a fresh check gives, when a piece is dragged across a gap and out again', () => {
    const room: RoomShellInput = {
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 4000],
        [0, 4000],
      ],
      openings: [{ id: 'd1', type: 'door', wall: 0, offset: 2800, width: 820, height: 2040, hinge: 'start', swing: 'out' }],
    };
    const base: PieceInput[] = [
      pieceInput({ id: 'bed', name: 'Bed', kind: 'bed', x: 1000, y: 2200, width: 1400, depth: 2000, height: 500, rotation: 270 }),
      pieceInput({
        id: 'chest',
        name: 'Chest',
        kind: 'chest-of-drawers',
        x: 3310,
        y: 2000,
        width: 1380,
        depth: 500,
        height: 800,
      }),
      pieceInput({ id: 'stool', name: 'Stool', x: 2300, y: 600, width: 400, depth: 400, height: 450 }),
    ];
    let sawFinding = false;
    for (let step = 0; step <= 20; step++) {
      // The stool walks down through the gap between the bed and the chest, then on past it.
      const pieces = base.map((p) => (p.id === 'stool' ? { ...p, y: 600 + step * 110 } : p));
      const { room: shell, option } = plan(room, pieces);
      const boxes = placedBoxes(option.pieces);
      const kept = findWalkwayProblems(shell, boxes, 900);
      forgetKeptWidths();
      const fresh = findWalkwayProblems(shell, boxes, 900);
      expect(kept).toEqual(fresh);
      // The fresh check's widths are kept for the next step.
      sawFinding ||= fresh.some((f) => f.pieces.includes('stool'));
    }
    expect(sawFinding).toBe(true);
  });
});
