// Tests for texture repeats: how often a photo finish repeats per metre from its real size (tiles,
// boards), a whole repeat on exactly its real width, and a size of zero refused.
import { describe, expect, it } from 'vitest';
import { textureFraction, textureRepeat } from './texture-repeat';

describe('textureRepeat', () => {
  it('repeats a 600 × 600 mm tile 1 / 0.6 times per metre', () => {
    const r = textureRepeat({ repeatWidthMm: 600, repeatHeightMm: 600 });
    expect(r.repeatU).toBeCloseTo(1 / 0.6, 12);
    expect(r.repeatV).toBeCloseTo(1 / 0.6, 12);
  });

  it('keeps width and height apart: a 200 × 1200 mm board', () => {
    expect(textureRepeat({ repeatWidthMm: 200, repeatHeightMm: 1200 })).toEqual({ repeatU: 5, repeatV: 1000 / 1200 });
  });

  it('puts one whole repeat on exactly the real width: 3 tiles of 600 mm span 1.8 m', () => {
    const { repeatU } = textureRepeat({ repeatWidthMm: 600, repeatHeightMm: 600 });
    expect(1.8 * repeatU).toBeCloseTo(3, 12);
    // 0.9 m is halfway across the second tile.
    expect(textureFraction(0.9, repeatU)).toBeCloseTo(0.5, 12);
  });

  it('refuses a size of zero', () => {
    expect(() => textureRepeat({ repeatWidthMm: 0, repeatHeightMm: 600 })).toThrow(RangeError);
  });
});
