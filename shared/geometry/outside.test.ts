// Tests for the outside drawn round the room: a sphere well clear of the room, every triangle
// facing its centre, pale sky at the top, the lightest colours round the horizon and a muted
// green-grey ground at the bottom.
import { describe, expect, it } from 'vitest';
import { typicalRoom } from '../../scripts/bench/typical-room';
import { buildOutside, OUTSIDE_DISTANCE_M } from './outside';
import { buildShellScene } from './scene';

const bounds = buildShellScene(typicalRoom().shell).bounds;
const outside = buildOutside(bounds);
const p = (i: number) => [outside.positions[3 * i], outside.positions[3 * i + 1], outside.positions[3 * i + 2]];
const c = (i: number) => [outside.colours[3 * i], outside.colours[3 * i + 1], outside.colours[3 * i + 2]];

describe('buildOutside', () => {
  it('stands well clear of the room on every side', () => {
    for (let i = 0; i < outside.positions.length / 3; i++) {
      const [x, , z] = p(i);
      const d = Math.hypot(x - outside.centre[0], z - outside.centre[2]);
      const [, y] = p(i);
      expect(Math.hypot(d, y - outside.centre[1])).toBeCloseTo(outside.radiusM, 3);
    }
    const roomHalf = Math.hypot(bounds.max[0] - bounds.min[0], bounds.max[2] - bounds.min[2]) / 2;
    expect(outside.radiusM).toBeGreaterThanOrEqual(roomHalf + OUTSIDE_DISTANCE_M - 1e-9);
  });

  it('faces every triangle towards the centre, where the room is', () => {
    let wrong = 0;
    for (let k = 0; k < outside.indices.length; k += 3) {
      const [a, b, d] = [p(outside.indices[k]), p(outside.indices[k + 1]), p(outside.indices[k + 2])];
      const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
      const v = [d[0] - a[0], d[1] - a[1], d[2] - a[2]];
      const n = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
      const toCentre = outside.centre.map((x, axis) => x - a[axis]);
      if (n[0] * toCentre[0] + n[1] * toCentre[1] + n[2] * toCentre[2] <= 0) wrong++;
    }
    expect(outside.indices.length).toBeGreaterThan(0);
    expect(wrong).toBe(0);
  });

  it('runs from a pale blue sky through a light horizon to a green-grey ground', () => {
    const count = outside.positions.length / 3;
    let top = 0;
    let bottom = 0;
    for (let i = 0; i < count; i++) {
      if (p(i)[1] > p(top)[1]) top = i;
      if (p(i)[1] < p(bottom)[1]) bottom = i;
    }
    const [sr, sg, sb] = c(top);
    expect(sb).toBeGreaterThan(sr);
    expect(sb).toBeGreaterThan(sg);
    const [gr, gg, gb] = c(bottom);
    expect(gg).toBeGreaterThan(gr);
    expect(gg).toBeGreaterThan(gb);
    // Muted: no channel of the ground far from the others.
    expect(Math.max(gr, gg, gb) - Math.min(gr, gg, gb)).toBeLessThan(0.12);
    const brightness = (i: number) => c(i).reduce((s, x) => s + x, 0);
    let lightest = 0;
    for (let i = 0; i < count; i++) if (brightness(i) > brightness(lightest)) lightest = i;
    const elevationDeg = (Math.asin((p(lightest)[1] - outside.centre[1]) / outside.radiusM) * 180) / Math.PI;
    expect(Math.abs(elevationDeg)).toBeLessThan(5);
  });
});
