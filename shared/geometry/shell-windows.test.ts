// Tests for windows in the 3D shell: glazing bars by the window's size (one upright above 1,200 mm
// wide, one across above 1,200 mm tall), the frame and glass in the hole, and the inside sill board
// projecting into the room under the sill. Numbers, not pictures.
import { describe, expect, it } from 'vitest';
import { designExampleRoom } from '../../tests/reference/rooms';
import { roomShellSchema, type Window } from '../schemas/room';
import { meshBounds } from './scene';
import { placeOpening } from './openings';
import {
  GLAZING_BAR_ABOVE_MM,
  SILL_BOARD_EARS_MM,
  SILL_BOARD_PROJECTION_MM,
  SILL_BOARD_THICKNESS_MM,
  buildWindow,
} from './shell-windows';
import { layoutShellWalls } from './walls';

const example = roomShellSchema.parse(designExampleRoom);
const walls = layoutShellWalls(example);
const mm = (m: number) => m * 1000;
// A window on wall 0 (plan y 0, the wall out to y −100) from x 1000, 900 mm up.
const windowOf = (width: number, height: number) => {
  const w: Window = { id: 'w', type: 'window', wall: 0, offset: 1000, width, height, sill: 900 };
  return buildWindow(walls[0], placeOpening(walls[0], w));
};
const boxes = (triangles: number) => triangles / 12;

describe('buildWindow', () => {
  it('gives a window bars by its size: none, one upright, one across, or both', () => {
    const frameBoxes = (w: number, h: number) => boxes(windowOf(w, h).frame.indices.length / 3);
    expect(GLAZING_BAR_ABOVE_MM).toBe(1200);
    expect(frameBoxes(1000, 1000)).toBe(4);
    expect(frameBoxes(1200, 1200)).toBe(4);
    expect(frameBoxes(1500, 1000)).toBe(5);
    expect(frameBoxes(1000, 1500)).toBe(5);
    expect(frameBoxes(1800, 1500)).toBe(6);
  });

  it('keeps the frame, bars and glass in the hole', () => {
    const built = windowOf(1800, 1500);
    for (const mesh of [built.frame, built.glass]) {
      const b = meshBounds(mesh);
      expect(mm(b.min[0])).toBeGreaterThanOrEqual(1000 - 1e-3);
      expect(mm(b.max[0])).toBeLessThanOrEqual(2800 + 1e-3);
      expect(mm(b.min[1])).toBeGreaterThanOrEqual(900 - 1e-3);
      expect(mm(b.max[1])).toBeLessThanOrEqual(2400 + 1e-3);
      expect(mm(b.max[2])).toBeLessThanOrEqual(0);
      expect(mm(b.min[2])).toBeGreaterThanOrEqual(-100);
    }
  });

  it('lays the sill board under the sill, out past the wall face and a little past each side', () => {
    const sill = meshBounds(windowOf(1400, 1300).sill);
    expect(mm(sill.max[1])).toBeCloseTo(900, 3);
    expect(mm(sill.min[1])).toBeCloseTo(900 - SILL_BOARD_THICKNESS_MM, 3);
    // Into the room is +y on this wall (scene +z).
    expect(mm(sill.max[2])).toBeCloseTo(SILL_BOARD_PROJECTION_MM, 3);
    expect(mm(sill.min[2])).toBeCloseTo(-20, 3);
    expect(mm(sill.min[0])).toBeCloseTo(1000 - SILL_BOARD_EARS_MM, 3);
    expect(mm(sill.max[0])).toBeCloseTo(2400 + SILL_BOARD_EARS_MM, 3);
  });

  it('gives a window down to the floor no sill board', () => {
    const w: Window = { id: 'w', type: 'window', wall: 0, offset: 1000, width: 1000, height: 2000, sill: 0 };
    expect(buildWindow(walls[0], placeOpening(walls[0], w)).sill.indices.length).toBe(0);
  });
});
