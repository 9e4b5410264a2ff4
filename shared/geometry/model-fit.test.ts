// The fit of a piece model into its box: uniform, inside the box, centred, standing on its bottom,
// turned by the quarter-turn correction.
import { describe, expect, it } from 'vitest';
import { fitModelInBox, MODEL_SIZE_TOLERANCE, sizeDifference } from './model-fit';

const chair = { min: [-0.225, 0, -0.25], max: [0.225, 0.9, 0.25] } as const;

describe('fitModelInBox', () => {
  it('leaves a model the size of its box at scale 1, centred on the footprint and standing on the bottom', () => {
    const fit = fitModelInBox(chair, 0, { width: 450, depth: 500, height: 900 })!;
    expect(fit.scale).toBeCloseTo(1, 12);
    fit.offset.forEach((v) => expect(Math.abs(v)).toBe(0));
    expect(fit.fittedMm.widthMm).toBeCloseTo(450, 9);
  });

  it('scales uniformly by the tightest side: a 450 × 500 × 900 chair in a 900 × 900 × 900 box stays 900 high', () => {
    const fit = fitModelInBox(chair, 0, { width: 900, depth: 900, height: 900 })!;
    expect(fit.scale).toBeCloseTo(1, 12);
    const small = fitModelInBox(chair, 0, { width: 400, depth: 500, height: 900 })!;
    expect(small.scale).toBeCloseTo(400 / 450, 12);
    expect(small.fittedMm.heightMm).toBeCloseTo(800, 9);
    expect(small.fittedMm.depthMm).toBeLessThanOrEqual(500);
  });

  it('moves an off-centre model so its footprint centre and bottom are at the origin', () => {
    const fit = fitModelInBox({ min: [1, 0.5, 2], max: [2, 1.5, 4] }, 0, { width: 1000, depth: 2000, height: 1000 })!;
    expect(fit.offset).toEqual([-1.5, -0.5, -3]);
  });

  it('a model facing −X turned a quarter measures its depth across', () => {
    const turned = { min: [-0.25, 0, -0.225], max: [0.25, 0.9, 0.225] } as const;
    const fit = fitModelInBox(turned, 90, { width: 450, depth: 500, height: 900 })!;
    expect(fit.turnRad).toBeCloseTo(Math.PI / 2, 12);
    expect(fit.scale).toBeCloseTo(1, 12);
    expect(fit.fittedMm).toEqual({
      widthMm: expect.closeTo(450, 6),
      depthMm: expect.closeTo(500, 6),
      heightMm: expect.closeTo(900, 6),
    });
  });

  it('reads a flat model (a rug with no height) by its footprint, and refuses empty bounds', () => {
    const rug = fitModelInBox({ min: [-1, 0, -0.7], max: [1, 0, 0.7] }, 0, { width: 1000, depth: 700, height: 10 })!;
    expect(rug.scale).toBeCloseTo(0.5, 12);
    expect(fitModelInBox({ min: [0, 0, 0], max: [0, 0, 0] }, 0, { width: 1, depth: 1, height: 1 })).toBeNull();
  });
});

describe('sizeDifference', () => {
  it('is the worst side’s difference as a fraction of the box', () => {
    expect(sizeDifference({ widthMm: 2100, depthMm: 900, heightMm: 850 }, { width: 2000, depth: 900, height: 850 })).toBeCloseTo(
      0.05,
      12,
    );
    expect(sizeDifference({ widthMm: 2010, depthMm: 900, heightMm: 850 }, { width: 2000, depth: 900, height: 850 })).toBeLessThan(
      MODEL_SIZE_TOLERANCE,
    );
  });
});
