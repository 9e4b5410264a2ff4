// Tests for the `door-swing` finding: pieces in the quarter disc a door's leaf sweeps into the room,
// following the arc and its side, and what is left out (doors opening out, shelves above, rugs).
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { findDoorSwings } from './door-swing';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';
import { roomShellSchema, type Door } from '../../schemas/room';

// A 4 × 3 m room; the door is on the top wall from x 300 to 1120. Hinged at its start and swinging
// in, its leaf sweeps the quarter disc of radius 820 round (300, 0) with x ≥ 300 and y ≥ 0.
function swings(pieces: PieceInput[], door: Partial<Door> = {}) {
  const shell = roomShellSchema.parse({
    outline: [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ],
    openings: [{ id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in', ...door }],
  });
  return findDoorSwings(shell, placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
}
// x 300–1100, y 100–700: well inside the swing.
const wardrobe = pieceInput({ id: 'wardrobe', name: 'Wardrobe', x: 700, y: 400, width: 800, depth: 600, height: 2000 });

describe('door-swing', () => {
  it('reports a wardrobe in the swing of a door opening into the room', () => {
    expect(swings([wardrobe])).toEqual([
      { kind: 'door-swing', pieces: ['wardrobe'], openings: ['d1'], message: 'The wardrobe stands in the door’s swing' },
    ]);
  });

  it('follows the arc, not its bounding square', () => {
    // A 100 mm box whose near corner is 830 mm from the hinge on the diagonal: (300 + 586.9, 586.9).
    const d = 830 / Math.SQRT2;
    const box = pieceInput({ id: 'stool', x: 300 + d + 50, y: d + 50, width: 100, depth: 100, height: 450 });
    expect(swings([box])).toEqual([]);
    // At 800 mm from the hinge it is under the leaf.
    const e = 800 / Math.SQRT2;
    expect(swings([{ ...box, x: 300 + e + 50, y: e + 50 }])).toHaveLength(1);
  });

  it('looks at the side the leaf swings to', () => {
    // A box at (450, 700) is 716 mm from the start hinge but 898 mm from the end hinge (1120, 0) at its nearest corner (500, 650).
    const box = pieceInput({ id: 'basket', x: 450, y: 700, width: 100, depth: 100, height: 400 });
    expect(swings([box], { hinge: 'start' })).toHaveLength(1);
    expect(swings([box], { hinge: 'end' })).toEqual([]);
  });

  it('says nothing for a door opening out, a shelf above the door head, or a rug', () => {
    expect(swings([wardrobe], { swing: 'out' })).toEqual([]);
    expect(swings([{ ...wardrobe, height: 300, elevation: 2100 }])).toEqual([]);
    expect(swings([{ ...wardrobe, height: 15 }])).toEqual([]);
  });

  it('lets a piece stand beside the door, flush with the open leaf', () => {
    // x 0–300, y 0–600: against the hinge side, touching where the open leaf rests.
    expect(swings([pieceInput({ id: 'coat-stand', x: 150, y: 300, width: 300, depth: 600, height: 1800 })])).toEqual([]);
  });
});
