import { describe, expect, it } from 'vitest';
import { pieceBox } from './boxes';
import { cellAt, cellCentreMm, distanceField, FREE, rasteriseFloor, WALL } from './floor-grid';
import { pieceInput } from './test-plans';
import { pieceSchema } from '../../schemas/option';

describe('floor grid', () => {
  const lShape: [number, number][] = [[0, 0], [2000, 0], [2000, 1000], [1000, 1000], [1000, 2000], [0, 2000]];

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
    const box = pieceBox(pieceSchema.parse(pieceInput({ id: 'shelf', x: 1000, y: 500, width: 800, depth: 200, height: 900, rotation: 90 })));
    const grid = rasteriseFloor(lShape, [box], 50);
    expect(grid.label[cellAt(grid, [1000, 150])]).toBe(0);
    expect(grid.label[cellAt(grid, [1000, 950])]).toBe(FREE);
    expect(grid.label[cellAt(grid, [700, 500])]).toBe(FREE);
  });

  it('gives the exact Euclidean distance to the nearest blocked cell, as a brute-force search does', () => {
    const box = pieceBox(pieceSchema.parse(pieceInput({ id: 'table', x: 600, y: 700, width: 500, depth: 300, height: 700, rotation: 30 })));
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
