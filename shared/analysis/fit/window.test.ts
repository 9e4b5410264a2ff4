// Tests for the `window-blocked` finding: pieces against a window's wall rising above its sill, and
// the ones that are fine (lower, pulled off the wall, beside the window, above it).
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { findBlockedWindows } from './window';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';
import { roomShellSchema } from '../../schemas/room';

// 4 × 3 m; the window is on the bottom wall, which runs from (4000, 3000) to (0, 3000): 1000 mm
// along it is x 3000, so the window spans x 1500–3000. Sill 900, head 2100.
function blocked(pieces: PieceInput[]) {
  const shell = roomShellSchema.parse({
    outline: [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ],
    openings: [{ id: 'w1', type: 'window', wall: 2, offset: 1000, width: 1500, height: 1200, sill: 900 }],
  });
  return findBlockedWindows(shell, placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
}
// Back 50 mm off the bottom wall (y 2050–2950), x 1000–3000, 950 high.
const sofa = pieceInput({ id: 'sofa', name: 'Sofa', x: 2000, y: 2500, width: 2000, depth: 900, height: 950, rotation: 180 });

describe('window-blocked', () => {
  it('reports a sofa against the wall rising above the sill', () => {
    expect(blocked([sofa])).toEqual([
      { kind: 'window-blocked', pieces: ['sofa'], openings: ['w1'], message: 'The sofa rises above the window sill (90 cm)' },
    ]);
  });

  it('accepts a lower sofa, one pulled 300 mm off the wall, one beside the window, and a shelf above it', () => {
    expect(blocked([{ ...sofa, height: 850 }])).toEqual([]);
    expect(blocked([{ ...sofa, y: 2250 }])).toEqual([]);
    // x 0–1400: clear of the window's span, which starts at 1500.
    expect(blocked([{ ...sofa, x: 700, width: 1400 }])).toEqual([]);
    expect(blocked([{ ...sofa, height: 200, elevation: 2200 }])).toEqual([]);
  });

  it('counts a piece within 150 mm of the wall as against it', () => {
    // Back at y 2860: 140 mm off the wall.
    expect(blocked([{ ...sofa, y: 2410 }])).toHaveLength(1);
    // Back at y 2840: 160 mm off.
    expect(blocked([{ ...sofa, y: 2390 }])).toEqual([]);
  });
});
