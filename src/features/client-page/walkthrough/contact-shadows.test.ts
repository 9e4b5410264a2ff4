// Tests for the soft shadows under pieces in the walk-through: their footprint, reach, fade and
// the daylight direction taken from the windows.
import { describe, expect, it } from 'vitest';
import type { Piece } from '../../../../shared/schemas/option';
import { SHADOW_DARKNESS, SHADOW_LIFT_M, contactShadows, daylightDirection } from './contact-shadows';

const piece = (extra: Partial<Piece> = {}): Piece => ({
  id: 'p',
  name: 'p',
  x: 2000,
  y: 1500,
  width: 1000,
  depth: 600,
  height: 800,
  rotation: 0,
  elevation: 0,
  status: 'new',
  placed: true,
  ...extra,
});

const vertex = (d: ReturnType<typeof contactShadows>, i: number) => [
  d.positions[i * 3],
  d.positions[i * 3 + 1],
  d.positions[i * 3 + 2],
];

describe('contactShadows', () => {
  it('darkens the footprint of each placed piece and fades out round it, facing up', () => {
    const d = contactShadows([piece(), piece({ id: 'away', placed: false })], [0, 0]);
    expect(d.positions.length).toBe(8 * 3);
    expect(d.indices.length).toBe(30);
    // The inner ring is the footprint (scene metres), just above the floor, at full darkness.
    expect(vertex(d, 0).map((v) => Number(v.toFixed(6)))).toEqual([1.5, SHADOW_LIFT_M, 1.2]);
    expect(vertex(d, 1)[0]).toBeCloseTo(2.5, 6);
    expect(d.colours[3]).toBeCloseTo(SHADOW_DARKNESS, 6);
    // The outer ring (vertices 4–7) lies further out and is clear.
    expect(vertex(d, 4)[0]).toBeLessThan(1.5);
    expect(vertex(d, 4)[2]).toBeLessThan(1.2);
    expect(d.colours[4 * 4 + 3]).toBe(0);
    for (let t = 0; t < d.indices.length; t += 3) {
      const [a, b, c] = [vertex(d, d.indices[t]), vertex(d, d.indices[t + 1]), vertex(d, d.indices[t + 2])];
      const up = (b[2] - a[2]) * (c[0] - a[0]) - (b[0] - a[0]) * (c[2] - a[2]);
      expect(up).toBeGreaterThan(0);
    }
  });

  it('reaches further for a tall piece, moves away from the daylight, and is faint under a high shelf', () => {
    const low = contactShadows([piece({ height: 400 })], [0, 0]);
    const tall = contactShadows([piece({ height: 2000 })], [0, 0]);
    expect(vertex(tall, 4)[0]).toBeLessThan(vertex(low, 4)[0]);
    const lit = contactShadows([piece()], [0, 1]);
    expect(vertex(lit, 0)[2]).toBeGreaterThan(1.2);
    expect(vertex(lit, 0)[0]).toBeCloseTo(1.5, 6);
    const shelf = contactShadows([piece({ elevation: 1500, height: 40 })], [0, 0]);
    expect(shelf.colours[3]).toBeLessThan(SHADOW_DARKNESS / 2);
  });

  it('takes the daylight’s way in from the windows, the larger ones counting more', () => {
    const [x, z] = daylightDirection([
      { inward: [0, 0, 1], widthM: 2, heightM: 1.4 },
      { inward: [-1, 0, 0], widthM: 1, heightM: 1 },
    ]);
    expect(z).toBeGreaterThan(-x);
    expect(x).toBeLessThan(0);
  });
});
