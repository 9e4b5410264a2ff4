// Tests for placing openings on their walls: edges on the inside and outside faces, window sills, door
// swings by hinge and direction, and every opening of a shell with per-wall thickness.
import { describe, expect, it } from 'vitest';
import type { Door } from '../schemas/room';
import { DOOR_OPEN_ANGLE_DEG, doorSwing, placeOpening, placeShellOpenings } from './openings';
import { layoutWalls } from './walls';

const walls = layoutWalls(
  [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
  [100, 100, 100, 100],
);
const door: Door = { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' };

describe('placeOpening', () => {
  it('puts the edges on the inside face and straight through on the outside face', () => {
    const placed = placeOpening(walls[0], door);
    expect(placed.insideStart).toEqual([300, 0]);
    expect(placed.insideEnd).toEqual([1120, 0]);
    expect(placed.outsideStart).toEqual([300, -100]);
    expect(placed.outsideEnd).toEqual([1120, -100]);
    expect([placed.sillMm, placed.headMm]).toEqual([0, 2040]);
  });

  it('lifts a window by its sill', () => {
    const placed = placeOpening(walls[2], {
      id: 'w1',
      type: 'window',
      wall: 2,
      offset: 1000,
      width: 1500,
      height: 1200,
      sill: 900,
    });
    // wall 2 runs from (4200, 3600) towards (0, 3600)
    expect(placed.insideStart).toEqual([3200, 3600]);
    expect(placed.outsideEnd).toEqual([1700, 3700]);
    expect([placed.sillMm, placed.headMm]).toEqual([900, 2100]);
  });
});

describe('doorSwing', () => {
  it('swings a start-hinged door into the room', () => {
    const swing = doorSwing(walls[0], door);
    expect(swing.hingeMm).toEqual([300, 0]);
    expect(swing.leafLengthMm).toBe(820);
    expect(swing.closedTipMm).toEqual([1120, 0]);
    expect(swing.openTipMm[0]).toBeCloseTo(300, 9);
    expect(swing.openTipMm[1]).toBeCloseTo(820, 9);
    expect(swing.closedAngleDeg).toBeCloseTo(0, 9);
    expect(swing.openAngleDeg).toBeCloseTo(90, 9);
    expect(swing.sweepDeg).toBe(90);
  });

  it('hinges at the far edge and swings out from the outside face', () => {
    const swing = doorSwing(walls[0], { ...door, hinge: 'end', swing: 'out' });
    expect(swing.hingeMm).toEqual([1120, -100]);
    expect(swing.closedTipMm[0]).toBeCloseTo(300, 9);
    expect(swing.openTipMm[1]).toBeCloseTo(-920, 9);
    expect(swing.openAngleDeg).toBeCloseTo(-90, 9);
    expect(swing.sweepDeg).toBe(90);
    expect(swing.side).toBe('out');
  });

  it('sweeps the other way for a start hinge swinging out', () => {
    expect(doorSwing(walls[0], { ...door, swing: 'out' }).sweepDeg).toBe(-90);
  });

  it('opens every leaf by the one open angle, its tip a leaf length from the hinge', () => {
    for (const variant of [door, { ...door, hinge: 'end' as const }, { ...door, swing: 'out' as const }]) {
      const swing = doorSwing(walls[0], variant);
      expect(Math.abs(swing.sweepDeg)).toBe(DOOR_OPEN_ANGLE_DEG);
      const tip = [swing.openTipMm[0] - swing.hingeMm[0], swing.openTipMm[1] - swing.hingeMm[1]];
      expect(Math.hypot(tip[0]!, tip[1]!)).toBeCloseTo(swing.leafLengthMm, 6);
    }
  });
});

describe('placeShellOpenings', () => {
  it('places every opening of a shell and swings its doors, honouring per-wall thickness', () => {
    const { placements, swings } = placeShellOpenings({
      outline: [
        [0, 0],
        [4200, 0],
        [4200, 3600],
        [0, 3600],
      ],
      wallThickness: 100,
      wallThicknesses: [250],
      openings: [
        door,
        { id: 'p1', type: 'passage', wall: 3, offset: 800, width: 900, height: 2100 },
        { ...door, id: 'lost', wall: 9 },
      ],
    });
    expect(placements.map((p) => p.id)).toEqual(['d1', 'p1']);
    expect(placements[0].outsideStart).toEqual([300, -250]);
    expect(swings.map((s) => s.openingId)).toEqual(['d1']);
  });
});
