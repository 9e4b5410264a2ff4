// Tests for choosing paint tins: the common sizes, the fewest tins with the least left over (each
// expected plan worked by hand), other tin ranges, and bad requests refused.
import { describe, expect, it } from 'vitest';
import { COMMON_TIN_SIZES_L, chooseTins, describeTins } from './tins';

// Tin sizes are common practice (0.75, 1, 2.5, 5, 10 L); each expected plan below is worked by hand:
// the fewest tins leaving less over than the smallest tin, then the least left over.
describe('chooseTins', () => {
  it('offers the common sizes', () => {
    expect(COMMON_TIN_SIZES_L).toEqual([0.75, 1, 2.5, 5, 10]);
  });

  it.each([
    // need, tins, total: why
    [7.04, '5 L + 2.5 L', 7.5], // two tins; 5 + 3 × 0.75 = 7.25 L leaves less but takes four
    [0.5, '0.75 L', 0.75],
    [0.8, '1 L', 1], // 1 L wastes 0.2; two 0.75 L waste 0.7
    [1.6, '1 L + 0.75 L', 1.75], // 1.75 beats 2 × 1 L and 2.5 L
    [3, '2.5 L + 0.75 L', 3.25], // two tins; 3 × 1 L is exact but three tins
    [7, '5 L + 2.5 L', 7.5], // two tins against three for 5 + 1 + 1
    [12, '10 L + 2.5 L', 12.5],
    [10, '10 L', 10],
    [25, '2 × 10 L + 5 L', 25],
  ] as const)('%s L → %s', (need, words, total) => {
    const plan = chooseTins(need);
    expect(describeTins(plan)).toBe(words);
    expect(plan.totalL).toBe(total);
    expect(plan.spareL).toBeCloseTo(total - need, 6);
  });

  it('never buys a tin for nothing: 20.1 L → 2 × 10 L + 0.75 L, not 21 L nor 20.25 L in six tins', () => {
    const plan = chooseTins(20.1);
    expect(plan.totalL).toBe(20.75);
    expect(plan.tins.reduce((n, t) => n + t.count, 0)).toBe(3);
    expect(plan.spareL).toBeLessThan(0.75);
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
