// When a worn model's measured size differs enough from the piece's box to ask which is meant.
import { describe, expect, it } from 'vitest';
import { sizeDiffers } from './piece-model-size';

describe('sizeDiffers', () => {
  const box = { width: 1000, depth: 500, height: 800 };
  it('lets 2 % pass on every side and asks beyond it', () => {
    expect(sizeDiffers(box, { widthMm: 1020, depthMm: 490, heightMm: 800 })).toBe(false);
    expect(sizeDiffers(box, { widthMm: 1000, depthMm: 500, heightMm: 820 })).toBe(true);
    expect(sizeDiffers(box, { widthMm: 450, depthMm: 500, heightMm: 900 })).toBe(true);
  });
});
