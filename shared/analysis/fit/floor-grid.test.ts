// Tests for the floor grid the walkway check runs on: rasterising an outline and its obstacles, the
// exact distance field (against a brute-force search), and the cap on grid cells for outsized rooms.
import { describe, expect, it } from 'vitest';
import { pieceBox } from './boxes';
import { cellAt, cellCentreMm, distanceField, FREE, gridCellMm, MAX_GRID_CELLS, rasteriseFloor, WALL } from './floor-grid';
import { findWalkwayProblems } from './walkway';
import { roomShellSchema } from '../../schemas/room';
import { pieceInput } from './test-plans';
import { pieceSchema } from '../../schemas/option';

describe('floor grid', () => {
  const lShape: [number, number][] = [
    [0, 0],
    [2000, 0],
    [2000, 1000],
    [1000, 1000],
    [1000, 2000],
    [0, 2000],
  ];

  it('marks the floor of an L free and its cut-out corner as wall', () => {
    const grid = rasteriseFloor(lShape, [], 100);
    expect(grid.label[cellAt(grid, [500, 1500])]).toBe(FREE);
    expect(grid.label[cellAt(grid, [1500, 500])]).toBe(FREE);
    expect(grid.label[cellAt(grid, [1500, 1500])]).toBe(WALL);
    expect(grid.label[cellAt(grid, [-50, 500])]).toBe(WALL);
    // 2 × 2 m less a 1 × 1 m corner = 3 m², 300 cells of 100 mm.
    expect(grid.label.filter((l) => l === FREE).length).toBe(300);
  });

  it('names the obstacle covering a cell, turned with its piece', () => {
    // 800 × 200 mm turned 90°: it covers x 900–1100, y 100–900.
    const box = pieceBox(
      pieceSchema.parse(pieceInput({ id: 'shelf', x: 1000, y: 500, width: 800, depth: 200, height: 900, rotation: 90 })),
    );
    const grid = rasteriseFloor(lShape, [box], 50);
    expect(grid.label[cellAt(grid, [1000, 150])]).toBe(0);
    expect(grid.label[cellAt(grid, [1000, 950])]).toBe(FREE);
    expect(grid.label[cellAt(grid, [700, 500])]).toBe(FREE);
  });

  it('gives the exact Euclidean distance to the nearest blocked cell, as a brute-force search does', () => {
    const box = pieceBox(
      pieceSchema.parse(pieceInput({ id: 'table', x: 600, y: 700, width: 500, depth: 300, height: 700, rotation: 30 })),
    );
    const grid = rasteriseFloor(lShape, [box], 50);
    const field = distanceField(grid);
    const blocked: [number, number][] = [];
    for (let cell = 0; cell < grid.label.length; cell++) if (grid.label[cell] !== FREE) blocked.push(cellCentreMm(grid, cell));
    for (let cell = 0; cell < grid.label.length; cell += 7) {
      const [x, y] = cellCentreMm(grid, cell);
      const bruteCells2 = Math.min(...blocked.map(([bx, by]) => ((bx - x) ** 2 + (by - y) ** 2) / 2500));
      expect(field.squaredCells[cell]).toBeCloseTo(bruteCells2, 9);
      const [nx, ny] = cellCentreMm(grid, field.nearest[cell]);
      expect(grid.label[field.nearest[cell]]).not.toBe(FREE);
      expect(((nx - x) ** 2 + (ny - y) ** 2) / 2500).toBeCloseTo(bruteCells2, 9);
    }
  });
});

describe('the cap on grid cells', () => {
  const square = (sideMm: number): [number, number][] => [
    [0, 0],
    [sideMm, 0],
    [sideMm, sideMm],
    [0, sideMm],
  ];
  const cells = (grid: { nx: number; ny: number }) => grid.nx * grid.ny;

  it('keeps the asked-for cell in any room of a home', () => {
    // 12 × 9 m at 25 mm: (480 + 4) × (360 + 4) cells, within the cap.
    const grid = rasteriseFloor(
      [
        [0, 0],
        [12000, 0],
        [12000, 9000],
        [0, 9000],
      ],
      [],
      25,
    );
    expect(grid.cellMm).toBe(25);
    expect(cells(grid)).toBe(484 * 364);
    expect(gridCellMm(12000, 9000, 25)).toBe(25);
  });

  it('makes the cell coarser, never the grid larger, for outsized rooms', () => {
    for (const sideMm of [20000, 50000, 100000, 1_000_000]) {
      const grid = rasteriseFloor(square(sideMm), [], 25);
      expect(cells(grid)).toBeLessThanOrEqual(MAX_GRID_CELLS);
      expect(grid.cellMm).toBeGreaterThan(25);
      // The smallest whole millimetre that fits: a millimetre finer would not.
      const finer = grid.cellMm - 1;
      expect((Math.ceil(sideMm / finer) + 4) ** 2).toBeGreaterThan(MAX_GRID_CELLS);
      expect(grid.label.filter((l) => l === FREE).length).toBeGreaterThan(0);
    }
    // 50 m square: 72 mm cells, (695 + 4)² = 488,601 (71 mm would give (705 + 4)² = 502,681).
    expect(gridCellMm(50000, 50000, 25)).toBe(72);
  });

  it('holds for long thin rooms too', () => {
    const grid = rasteriseFloor(
      [
        [0, 0],
        [400000, 0],
        [400000, 3000],
        [0, 3000],
      ],
      [],
      25,
    );
    expect(cells(grid)).toBeLessThanOrEqual(MAX_GRID_CELLS);
  });

  it('still checks a walkway in an outsized room, on the coarser cell', () => {
    // 50 m × 20 m: the largest floor the room schema allows (1,000 m²), 1.6 million cells at 25 mm.
    const room = roomShellSchema.parse({
      outline: [
        [0, 0],
        [50000, 0],
        [50000, 20000],
        [0, 20000],
      ],
      openings: [{ id: 'd1', type: 'door', wall: 0, offset: 1000, width: 900, height: 2040, hinge: 'start', swing: 'out' }],
    });
    // A chest facing a wall 100 mm away.
    const chest = pieceBox(
      pieceSchema.parse(pieceInput({ id: 'chest', x: 25000, y: 400, width: 1000, depth: 500, height: 800, rotation: 180 })),
    );
    const findings = findWalkwayProblems(room, [chest], 900);
    expect(findings.map((f) => f.kind)).toEqual(['narrow-walkway']);
  });
});
