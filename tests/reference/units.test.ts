// Length and area units against their definitions (1 in = 25.4 mm, 1 ft = 0.3048 m), and how
// lengths are written for a designer.
import { describe, expect, it } from 'vitest';
import { areaMm2 } from '../../shared/geometry/polygon';
import { MM_PER_FOOT, MM_PER_INCH, formatLength, parseLength } from '../../shared/units/length';

function mm(text: string): number {
  const result = parseLength(text, 'cm');
  if (!result.ok) throw new Error(result.message);
  return result.mm;
}

describe('length units against their definitions', () => {
  it('takes 1 in as exactly 25.4 mm', () => {
    expect(MM_PER_INCH).toBe(25.4); // NIST SP 811 (2008) §B.6: 1 in = 2.54 cm exactly
    expect(mm('1"')).toBe(25.4);
    expect(mm('100in')).toBeCloseTo(2540, 9);
  });

  it('takes 1 ft as exactly 0.3048 m', () => {
    expect(MM_PER_FOOT).toBeCloseTo(304.8, 12); // NIST SP 811 (2008) §B.6; 16 CFR 500.19
    expect(mm(`13' 9"`)).toBeCloseTo(13 * 304.8 + 9 * 25.4, 9);
  });

  it('gives 1 ft² = 0.09290304 m² and 1 in² = 6.4516 cm²', () => {
    const foot = MM_PER_FOOT;
    expect(
      areaMm2([
        [0, 0],
        [foot, 0],
        [foot, foot],
        [0, foot],
      ]) / 1e6,
    ).toBeCloseTo(0.09290304, 12); // 16 CFR 500.19
    expect(
      areaMm2([
        [0, 0],
        [MM_PER_INCH, 0],
        [MM_PER_INCH, MM_PER_INCH],
        [0, MM_PER_INCH],
      ]) / 100,
    ).toBeCloseTo(6.4516, 12); // 16 CFR 500.19
  });

  it('writes the rounded and exact code widths the way a designer reads them', () => {
    // 2010 ADA Standards print 32 in as 815 mm and 36 in as 915 mm; exact is 812.8 and 914.4 mm
    expect(formatLength(32 * MM_PER_INCH, 'mm')).toBe('813 mm');
    expect(formatLength(36 * MM_PER_INCH, 'cm')).toBe('91.4 cm');
    expect(formatLength(815, 'ftin')).toBe(`2' 8 1/8"`);
  });
});
