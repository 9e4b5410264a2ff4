// Tests the mirrored edge blend that makes a photo finish repeat without a visible seam.
import { describe, expect, it } from 'vitest';
import { blendEdgesMirrored } from './seamless';
import { photoLike } from './generate';

/** Mean absolute step across the wrap-around join (last column to first, last row to first) and between neighbours inside. */
function steps(p: Uint8Array, w: number, h: number, ch: number) {
  let joinX = 0;
  let insideX = 0;
  let joinY = 0;
  let insideY = 0;
  const at = (x: number, y: number, c: number) => p[(y * w + x) * ch + c];
  for (let y = 0; y < h; y++) {
    for (let c = 0; c < ch; c++) {
      joinX += Math.abs(at(0, y, c) - at(w - 1, y, c));
      for (let x = 1; x < w; x++) insideX += Math.abs(at(x, y, c) - at(x - 1, y, c));
    }
  }
  for (let x = 0; x < w; x++) {
    for (let c = 0; c < ch; c++) {
      joinY += Math.abs(at(x, 0, c) - at(x, h - 1, c));
      for (let y = 1; y < h; y++) insideY += Math.abs(at(x, y, c) - at(x, y - 1, c));
    }
  }
  return {
    joinX: joinX / (h * ch),
    insideX: insideX / (h * ch * (w - 1)),
    joinY: joinY / (w * ch),
    insideY: insideY / (w * ch * (h - 1)),
  };
}

/** A left-to-right and top-to-bottom ramp: the worst case for a seam, 0 on one edge and 255 on the other. */
function ramp(w: number, h: number): Uint8Array {
  const p = new Uint8Array(w * h);
  for (let y = 0; y < h; y++)
    for (let x = 0; x < w; x++) p[y * w + x] = Math.round(((x / (w - 1)) * 0.5 + (y / (h - 1)) * 0.5) * 255);
  return p;
}

describe('blendEdgesMirrored', () => {
  it('joins a ramp to its next copy without a step, both ways', () => {
    const p = ramp(200, 120);
    const before = steps(p, 200, 120, 1);
    expect(before.joinX).toBeGreaterThan(100);
    blendEdgesMirrored(p, 200, 120, 1, 0.1);
    const after = steps(p, 200, 120, 1);
    expect(after.joinX).toBeLessThanOrEqual(Math.max(1, after.insideX * 1.5));
    expect(after.joinY).toBeLessThanOrEqual(Math.max(1, after.insideY * 1.5));
  });

  it('joins a photo that does not repeat by itself', () => {
    const img = photoLike(300, 240);
    const before = steps(img.data, 300, 240, 3);
    expect(before.joinX).toBeGreaterThan(before.insideX * 3);
    blendEdgesMirrored(img.data, 300, 240, 3, 0.08);
    const after = steps(img.data, 300, 240, 3);
    expect(after.joinX).toBeLessThanOrEqual(after.insideX * 1.5);
    expect(after.joinY).toBeLessThanOrEqual(after.insideY * 1.5);
  });

  it('leaves the middle, the size, and an already symmetric edge untouched', () => {
    const w = 100;
    const p = ramp(w, 50);
    const copy = Uint8Array.from(p);
    blendEdgesMirrored(p, w, 50, 1, 0.1);
    for (let y = 5; y < 45; y++) for (let x = 10; x < 90; x++) expect(p[y * w + x]).toBe(copy[y * w + x]);
    expect(p.length).toBe(copy.length);

    // Grout split across the edges: the same on both sides of the join, so nothing changes.
    const tile = new Uint8Array(64 * 64).fill(150);
    for (let i = 0; i < 64; i++) for (const g of [0, 1, 62, 63]) tile[i * 64 + g] = tile[g * 64 + i] = 220;
    const tileCopy = Uint8Array.from(tile);
    blendEdgesMirrored(tile, 64, 64, 1, 0.16);
    expect(tile).toEqual(tileCopy);
  });

  it('does nothing with no blend', () => {
    const p = ramp(40, 40);
    const copy = Uint8Array.from(p);
    blendEdgesMirrored(p, 40, 40, 1, 0);
    expect(p).toEqual(copy);
  });
});
