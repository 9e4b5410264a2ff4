// Tests for the option comparison: free floor share (pieces one walks round, not rugs or wall
// shelves), the grid cap on very large rooms, and budget, new pieces and findings (seen ones apart) side by side.
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import { optionDocSchema } from '../schemas/option';
import { checkFit } from './fit';
import { findingKey } from './fit/finding-key';
import { FREE_FLOOR_CELL_MM, MAX_FREE_FLOOR_CELLS, compareOption, freeFloorCellMm, freeFloorShare } from './compare';
import { shell, library, defaults, piece } from './test-rooms';

describe('freeFloorShare and compareOption', () => {
  it('counts the floor under pieces one walks round, not rugs or wall shelves', () => {
    expect(freeFloorShare(shell, [])).toBe(1);
    const pieces = optionDocSchema.parse({
      pieces: [
        piece({ id: 'bed', x: 1000, y: 1000, width: 2000, depth: 2000, height: 500 }),
        piece({ id: 'rug', x: 3000, y: 1500, width: 1000, depth: 1000, height: 10 }),
        piece({ id: 'shelf', x: 3000, y: 300, width: 1000, depth: 300, height: 300, elevation: 2100 }),
        piece({ id: 'stored', x: 3000, y: 2500, width: 500, depth: 500, placed: false }),
      ],
    }).pieces;
    // 4 m² of 12 m² covered → two thirds free
    expect(freeFloorShare(shell, pieces)).toBeCloseTo(2 / 3, 2);
  });

  it('measures a 1,000 m² room on a grid of at most 250,000 cells, as exactly', () => {
    expect(freeFloorCellMm(shell.outline)).toBe(FREE_FLOOR_CELL_MM);
    const side = 31_600;
    const hall = roomShellSchema.parse({
      outline: [
        [0, 0],
        [side, 0],
        [side, side],
        [0, side],
      ],
    });
    const cell = freeFloorCellMm(hall.outline);
    expect(cell).toBe(64);
    expect((side / cell) ** 2).toBeLessThanOrEqual(MAX_FREE_FLOOR_CELLS);
    // A 10 m × 10 m platform in the middle: 100 m² of 998.56 m² covered (derived) → 89.99 % free.
    const platform = optionDocSchema.parse({
      pieces: [piece({ id: 'stage', x: side / 2, y: side / 2, width: 10_000, depth: 10_000, height: 500 })],
    }).pieces;
    expect(freeFloorShare(hall, platform)).toBeCloseTo(1 - 100 / 998.56, 3);
  });

  it('puts budget, new pieces, findings and free floor side by side', () => {
    const doc = optionDocSchema.parse({ pieces: [piece({ id: 'a', price: 100 }), piece({ id: 'b', price: 100 })] });
    // Both chairs at the same spot overlap: one finding.
    expect(compareOption(shell, doc, library, defaults)).toMatchObject({
      budget: 200,
      newPieceCount: 2,
      findingCount: 1,
      seenFindingCount: 0,
      unpricedCount: 0,
    });
    expect(compareOption(shell, doc, library, defaults).freeFloorPercent).toBeCloseTo(100 - (0.25 / 12) * 100, 0);
  });

  it('counts the findings marked as seen apart, and not a mark whose finding went away', () => {
    const pieces = [piece({ id: 'a' }), piece({ id: 'b' })];
    const [overlap] = checkFit(shell, optionDocSchema.parse({ pieces }).pieces);
    const at = '2026-12-03T14:00:00.000Z';
    const seen = [
      { key: findingKey(overlap!), note: 'a pair, on purpose', at },
      { key: findingKey({ kind: 'unreachable', pieces: ['gone'], openings: [] }), note: '', at },
    ];
    const doc = optionDocSchema.parse({ pieces, seen });
    expect(compareOption(shell, doc, library, defaults)).toMatchObject({ findingCount: 1, seenFindingCount: 1 });
  });
});
