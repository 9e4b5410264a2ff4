import { describe, expect, it } from 'vitest';
import { COMMON_TIN_SIZES_L, chooseTins, describeTins } from './tins';

// Tin sizes are common practice (0.75, 1, 2.5, 5, 10 L); each expected plan below is worked by hand:
// the smallest total at or above the need, then the fewest tins.
describe('chooseTins', () => {
  it('offers the common sizes', () => {
    expect(COMMON_TIN_SIZES_L).toEqual([0.75, 1, 2.5, 5, 10]);
  });

  it.each([
    // need, tins, total: why
    [7.04, '5 L + 3 × 0.75 L', 7.25], // 5 + 1 + 1 = 7 falls short; 7.25 is the least above it (5 + 2.5 leaves 0.46 L)
    [0.5, '0.75 L', 0.75],
    [0.8, '1 L', 1], // 1 L wastes 0.2; two 0.75 L waste 0.7
    [1.6, '1 L + 0.75 L', 1.75], // 1.75 beats 2 × 1 L and 2.5 L
    [3, '3 × 1 L', 3], // exact; 4 × 0.75 L is the same paint in more tins
    [7, '5 L + 2 × 1 L', 7],
    [12, '10 L + 2 × 1 L', 12],
    [10, '10 L', 10],
    [25, '2 × 10 L + 5 L', 25],
  ] as const)('%s L → %s', (need, words, total) => {
    const plan = chooseTins(need);
    expect(describeTins(plan)).toBe(words);
    expect(plan.totalL).toBe(total);
    expect(plan.spareL).toBeCloseTo(total - need, 6);
  });

  it('prefers less paint over fewer tins: 20.1 L → 20.25 L in six tins, not 21 L in three', () => {
    const plan = chooseTins(20.1);
    expect(plan.totalL).toBe(20.25);
    expect(plan.tins.reduce((n, t) => n + t.count, 0)).toBe(6);
  });

  it('buys nothing for nothing, and does not add a tin for floating-point dust', () => {
    expect(chooseTins(0)).toEqual({ tins: [], totalL: 0, spareL: 0 });
    expect(describeTins(chooseTins(0.1 + 0.2 + 4.7))).toBe('5 L');
  });

  it('takes other tin ranges: without 0.75 L tins, 7.04 L is 5 L + 2.5 L', () => {
    // 5 + 1 + 1 + 1 = 8 L; 5 + 2.5 = 7.5 L is the least above 7.04 L.
    expect(describeTins(chooseTins(7.04, [1, 2.5, 5, 10]))).toBe('5 L + 2.5 L');
    expect(describeTins(chooseTins(4.2, [1, 4]))).toBe('4 L + 1 L');
    expect(describeTins(chooseTins(3.5, [2.5, 1]))).toBe('2.5 L + 1 L');
  });

  it('refuses a negative, endless or empty request', () => {
    expect(() => chooseTins(-1)).toThrow(RangeError);
    expect(() => chooseTins(Number.NaN)).toThrow(RangeError);
    expect(() => chooseTins(1e9)).toThrow(RangeError);
    expect(() => chooseTins(2, [])).toThrow(RangeError);
    expect(() => chooseTins(2, [0])).toThrow(RangeError);
  });
});
