// Tests for the window lights: one light in each window's inside face, its size, shining into the room.
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../../shared/schemas/room';
import { WINDOW_LIGHT_INSET_M, windowLightRects } from './window-lights';

describe('windowLightRects', () => {
  it('puts one light in each window’s inside face, its size, shining into the room', () => {
    const shell = roomShellSchema.parse({
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 3000],
        [0, 3000],
      ],
      openings: [
        { id: 'w-top', type: 'window', wall: 0, offset: 1000, width: 1500, height: 1200, sill: 900 },
        { id: 'door', type: 'door', wall: 2, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' },
        { id: 'w-right', type: 'window', wall: 1, offset: 500, width: 1000, height: 1400, sill: 800 },
      ],
    });
    const [top, right] = windowLightRects(shell);
    expect(windowLightRects(shell)).toHaveLength(2);
    expect(top.openingId).toBe('w-top');
    expect(top.centre[0]).toBeCloseTo(1.75, 9);
    expect(top.centre[1]).toBeCloseTo(1.5, 9);
    expect(top.centre[2]).toBeCloseTo(WINDOW_LIGHT_INSET_M, 9);
    expect(top.inward).toEqual([-0, 0, 1]);
    expect([top.widthM, top.heightM]).toEqual([1.5, 1.2]);
    // The right wall (x = 4 m) shines towards −x.
    expect(right.centre[0]).toBeCloseTo(4 - WINDOW_LIGHT_INSET_M, 9);
    expect(right.centre[2]).toBeCloseTo(1, 9);
    expect(right.inward[0]).toBe(-1);
  });
});
