// Tests for the `overlap` finding: pieces pushed into one another, touching edge to edge, stacked in
// height, standing on one another, turned boxes, rugs, and pieces in the holding area.
import { describe, expect, it } from 'vitest';
import { placedBoxes, STACK_TOLERANCE_MM } from './boxes';
import { findOverlaps } from './overlap';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';

const overlaps = (pieces: PieceInput[]) => findOverlaps(placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
// Sofa 2000 × 900 centred at (2000, 1500): x 1000–3000, y 1050–1950.
const sofa = pieceInput({ id: 'sofa', name: 'Sofa', x: 2000, y: 1500, width: 2000, depth: 900, height: 850 });

describe('overlap', () => {
  it('reports an armchair pushed 525 mm into the sofa, naming both', () => {
    // Armchair 850 wide at x 2900: x 2475–3325.
    const armchair = pieceInput({ id: 'armchair', name: 'Armchair', x: 2900, y: 1500, width: 850, depth: 850, height: 800 });
    expect(overlaps([sofa, armchair])).toEqual([
      { kind: 'overlap', pieces: ['armchair', 'sofa'], openings: [], message: 'The armchair and the sofa overlap' },
    ]);
  });

  it('lets pieces touch edge to edge', () => {
    // x 3000–3850: touching the sofa's end.
    expect(overlaps([sofa, pieceInput({ id: 'table', x: 3425, y: 1500, width: 850, depth: 850, height: 500 })])).toEqual([]);
  });

  it('lets a wall cabinet hang above a sideboard, but not reach down into it', () => {
    const sideboard = pieceInput({ id: 'sideboard', x: 1000, y: 300, width: 1600, depth: 450, height: 850 });
    const cabinet = pieceInput({ id: 'cabinet', x: 1000, y: 225, width: 1600, depth: 350, height: 700, elevation: 1400 });
    expect(overlaps([sideboard, cabinet])).toEqual([]);
    expect(overlaps([sideboard, { ...cabinet, elevation: 800 }]).map((f) => f.pieces)).toEqual([['cabinet', 'sideboard']]);
  });

  it('lets a lamp stand on a side table, its base up to 10 mm into the top, but not stick out of it or sink deeper', () => {
    // Side table 500 × 500 × 550 at (500, 500): x 250–750; lamp 300 × 300 at its middle.
    const table = pieceInput({ id: 'table', kind: 'side-table', x: 500, y: 500, width: 500, depth: 500, height: 550 });
    const lamp = pieceInput({
      id: 'lamp',
      kind: 'table-lamp',
      x: 500,
      y: 500,
      width: 300,
      depth: 300,
      height: 450,
      elevation: 545,
    });
    expect(STACK_TOLERANCE_MM).toBe(10);
    expect(overlaps([table, lamp])).toEqual([]);
    expect(overlaps([table, { ...lamp, elevation: 540 }])).toEqual([]);
    expect(overlaps([table, { ...lamp, elevation: 530 }])).toHaveLength(1);
    // Half off the edge (x 700–1000) and sunk 5 mm: it does not stand on the table, so the 5 mm count.
    expect(overlaps([table, { ...lamp, x: 850 }])).toHaveLength(1);
  });

  it('never counts a rug', () => {
    expect(overlaps([sofa, pieceInput({ id: 'rug', x: 2000, y: 1500, width: 3000, depth: 2000, height: 15 })])).toEqual([]);
  });

  it('tells turned boxes apart where their bounding boxes meet but they do not', () => {
    // A 1000 mm square turned 45° at (1500, 1500) is a diamond |dx| + |dy| ≤ 707. A 400 mm square at
    // (2100, 2100) has its nearest corner at (1900, 1900): 400 + 400 = 800 > 707, clear. At (2000, 2000)
    // the corner (1800, 1800) gives 600 < 707: they overlap.
    const diamond = pieceInput({ id: 'diamond', x: 1500, y: 1500, width: 1000, depth: 1000, height: 700, rotation: 45 });
    const square = pieceInput({ id: 'square', x: 2100, y: 2100, width: 400, depth: 400, height: 700 });
    expect(overlaps([diamond, square])).toEqual([]);
    expect(overlaps([diamond, { ...square, x: 2000, y: 2000 }])).toHaveLength(1);
  });

  it('ignores pieces in the holding area', () => {
    expect(overlaps([sofa, { ...sofa, id: 'sofa-2', placed: false }])).toEqual([]);
  });
});
