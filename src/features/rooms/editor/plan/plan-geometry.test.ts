// What the plan draws where: a closed ring's path, a piece's box from the one piece rule, and where
// the holding area sits beside or below the room.
import { describe, expect, it } from 'vitest';
import { pieceFootprintMm } from '../../../../../shared/geometry/piece';
import { pieceSchema } from '../../../../../shared/schemas/option';
import { roomShellSchema } from '../../../../../shared/schemas/room';
import { rectangleShell } from '../../../../../tests/fixtures/commands';
import { inHolding, pieceRing, planLayout, ringPath } from './plan-geometry';

const shell = roomShellSchema.parse(rectangleShell);
const held = pieceSchema.parse({
  id: 'chair',
  name: 'Chair',
  x: 0,
  y: 0,
  width: 600,
  depth: 500,
  height: 800,
  status: 'new',
  placed: false,
});

describe('plan geometry', () => {
  it('writes a closed ring as one SVG path', () => {
    expect(
      ringPath([
        [0, 0],
        [10, 0],
        [10, 5],
      ]),
    ).toBe('M0 0 L10 0 L10 5 Z');
  });

  it('draws a piece’s box where the one piece rule puts its footprint', () => {
    const piece = { x: 500, y: 400, width: 1000, depth: 600, rotation: 30 };
    expect(pieceRing(piece)).toEqual(pieceFootprintMm(piece));
  });

  it('keeps the holding area beside the room in a wide panel and below it in a tall one', () => {
    const right = planLayout(shell, [held], 'right');
    expect(right.holding.x).toBeGreaterThan(right.roomBounds.maxX);
    expect(inHolding(right, right.holding.slots.chair)).toBe(true);
    expect(inHolding(right, [2100, 1800])).toBe(false);
    const below = planLayout(shell, [held], 'below');
    expect(below.holding.y).toBeGreaterThan(below.roomBounds.maxY);
    expect(inHolding(below, below.holding.slots.chair)).toBe(true);
    expect(inHolding(below, [2100, 1800])).toBe(false);
  });
});
