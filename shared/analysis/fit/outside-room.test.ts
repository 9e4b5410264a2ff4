// Tests for the `outside-room` finding: pieces flush with a wall, through a wall, poked by the inside
// corner of an L, and wholly outside the room.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { findOutsideRoom } from './outside-room';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';

const rectangle: [number, number][] = [
  [0, 0],
  [4000, 0],
  [4000, 3000],
  [0, 3000],
];
// An L whose inside corner is at (2000, 2000): the square x > 2000, y > 2000 is not floor.
const lShape: [number, number][] = [
  [0, 0],
  [4000, 0],
  [4000, 2000],
  [2000, 2000],
  [2000, 3500],
  [0, 3500],
];
const outside = (outline: [number, number][], pieces: PieceInput[]) =>
  findOutsideRoom({ outline }, placedBoxes(pieces.map((p) => pieceSchema.parse(p))));

describe('outside-room', () => {
  it('accepts a piece flush against a wall', () => {
    expect(outside(rectangle, [pieceInput({ id: 'chest', x: 2000, y: 300, width: 800, depth: 600, height: 800 })])).toEqual([]);
    // Turned 90° and flush with the right wall: x 3700–4000.
    expect(
      outside(rectangle, [pieceInput({ id: 'chest', x: 3700, y: 1500, width: 800, depth: 600, height: 800, rotation: 90 })]),
    ).toEqual([]);
  });

  it('reports a piece 50 mm through a wall', () => {
    expect(
      outside(rectangle, [pieceInput({ id: 'chest', name: 'Chest', x: 2000, y: 250, width: 800, depth: 600, height: 800 })]),
    ).toEqual([{ kind: 'outside-room', pieces: ['chest'], openings: [], message: 'The chest stands partly outside the room' }]);
  });

  it('reports a turned piece the inside corner of an L pokes into, though all its corners are on the floor', () => {
    // A 424 mm square turned 45° at (1950, 1950): corners (2250, 1950), (1950, 2250), (1650, 1950),
    // (1950, 1650) are all floor, but its edge passes (2100, 2100), inside the cut-out.
    const table = pieceInput({
      id: 'table',
      x: 1950,
      y: 1950,
      width: 300 * Math.SQRT2,
      depth: 300 * Math.SQRT2,
      height: 700,
      rotation: 45,
    });
    expect(outside(lShape, [table]).map((f) => f.pieces)).toEqual([['table']]);
    expect(outside(lShape, [{ ...table, x: 1700, y: 1700 }])).toEqual([]);
  });

  it('says when a piece stands wholly outside', () => {
    expect(
      outside(rectangle, [pieceInput({ id: 'bench', name: 'Bench', x: 5000, y: 1500, width: 800, depth: 400, height: 450 })])[0]
        .message,
    ).toBe('The bench stands outside the room');
  });
});
