// Tests for the `too-big-for-door` finding: pieces carried on their side or on end through doors and
// passages, the carry allowance, and the clear width a door's leaf takes off.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { CARRY_ALLOWANCE_MM, clearPassMm, DOOR_LEAF_CLEAR_LOSS_MM, findTooBigForDoor, passesThrough } from './door-fit';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';
import { roomShellSchema, type Opening } from '../../schemas/room';

const door820: Opening = { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' };

function tooBig(pieces: PieceInput[], openings: Opening[] = [door820]) {
  const shell = roomShellSchema.parse({
    outline: [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ],
    openings,
  });
  return findTooBigForDoor(shell, placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
}

describe('too-big-for-door', () => {
  // An 820 mm leaf leaves 820 − 50.8 = 769.2 mm clear; less the 10 mm allowance, 759.2 mm across and 2030 mm up.
  it('passes a 900 mm deep sofa 720 mm high through an 820 mm door on its back', () => {
    expect(clearPassMm(door820).widthMm).toBeCloseTo(769.2, 6);
    expect(passesThrough([2000, 900, 720], clearPassMm(door820))).toBe(true);
    expect(tooBig([pieceInput({ id: 'sofa', x: 2000, y: 1500, width: 2000, depth: 900, height: 720 })])).toEqual([]);
  });

  it('stops the same sofa 850 mm high: neither 850 nor 900 goes across', () => {
    const sofa = pieceInput({ id: 'sofa', name: 'Sofa', x: 2000, y: 1500, width: 2000, depth: 900, height: 850 });
    expect(tooBig([sofa])).toEqual([
      {
        kind: 'too-big-for-door',
        pieces: ['sofa'],
        openings: ['d1'],
        message: 'The sofa (85 × 90 × 200 cm) will not pass through any door of this room in one piece',
      },
    ]);
    // A 900 mm passage takes it: 850 ≤ 890 across, 900 ≤ 2090 up.
    expect(tooBig([sofa], [door820, { id: 'p1', type: 'passage', wall: 1, offset: 500, width: 900, height: 2100 }])).toEqual([]);
  });

  it('carries a wardrobe on its side: 60 cm deep across, 100 cm wide up', () => {
    expect(tooBig([pieceInput({ id: 'wardrobe', x: 2000, y: 1500, width: 1000, depth: 600, height: 2000 })])).toEqual([]);
  });

  it('says nothing in a room with no door or passage, and about rugs', () => {
    const sofa = pieceInput({ id: 'sofa', x: 2000, y: 1500, width: 2000, depth: 900, height: 850 });
    expect(tooBig([sofa], [])).toEqual([]);
    expect(tooBig([pieceInput({ id: 'rug', x: 2000, y: 1500, width: 3000, depth: 4000, height: 15 })])).toEqual([]);
  });

  it('takes the leaf off a door’s width but not off a passage’s', () => {
    expect(clearPassMm({ ...door820, width: 900 }).widthMm).toBeCloseTo(900 - DOOR_LEAF_CLEAR_LOSS_MM, 9);
    expect(clearPassMm({ id: 'p', type: 'passage', wall: 0, offset: 0, width: 900, height: 2100 }).widthMm).toBe(900);
    // Right at the limit, one way and the other.
    const clear = { widthMm: 800, heightMm: 2000 };
    expect(passesThrough([700, 800 - CARRY_ALLOWANCE_MM, 1990], clear)).toBe(true);
    expect(passesThrough([700, 800 - CARRY_ALLOWANCE_MM + 1, 1990], clear)).toBe(true);
    expect(passesThrough([800 - CARRY_ALLOWANCE_MM + 1, 1000, 1991], clear)).toBe(false);
  });
});
