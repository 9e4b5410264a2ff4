// The piece model library's short formats: sizes in the user's unit, storage, the unit fix's size.
import { describe, expect, it } from 'vitest';
import { fixedSize, formatModelSize, formatStorage } from './model-labels';

describe('model labels', () => {
  it('says the size once with its unit', () => {
    const size = { widthMm: 450, depthMm: 500, heightMm: 900 };
    expect(formatModelSize(size, 'mm')).toBe('450 × 500 × 900 mm');
    expect(formatModelSize(size, 'cm')).toBe('45 × 50 × 90 cm');
    expect(formatModelSize(size, 'in')).toContain('×');
  });
  it('groups the thousands of a large size in the reader’s locale', () => {
    const sofaReadAsMetres = { widthMm: 210_000, depthMm: 90_000, heightMm: 85_000 };
    expect(formatModelSize(sofaReadAsMetres, 'mm', 'en-GB')).toBe('210,000 × 90,000 × 85,000 mm');
    expect(formatModelSize(sofaReadAsMetres, 'm', 'en-GB')).toBe('210.00 × 90.00 × 85.00 m');
    expect(formatModelSize({ widthMm: 2100, depthMm: 900, heightMm: 850 }, 'mm', 'en-GB')).toBe('2,100 × 900 × 850 mm');
  });
  it('says storage in KB, MB or GB', () => {
    expect(formatStorage(312 * 1024 * 1024)).toBe('312 MB');
    expect(formatStorage(2 * 1024 * 1024 * 1024)).toBe('2 GB');
    expect(formatStorage(5000)).toBe('5 KB');
  });
  it('reads a centimetre model at a hundredth of its size', () => {
    expect(fixedSize({ size: { widthMm: 210_000, depthMm: 90_000, heightMm: 85_000 }, unitHint: 'cm' })).toEqual({
      widthMm: 2100,
      depthMm: 900,
      heightMm: 850,
    });
    expect(fixedSize({ size: null, unitHint: null })).toBeNull();
  });
});
