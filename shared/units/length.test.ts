// Tests for lengths typed and shown in the person's unit: parseLength over the spellings people type
// and its refusals, formatLength in cm, m, mm and feet and inches, and round trips between them.
import { describe, expect, it } from 'vitest';
import { formatLength, parseLength, type LengthUnit } from './length';

function mmOf(text: string, unit?: LengthUnit): number {
  const result = parseLength(text, unit);
  if (!result.ok) throw new Error(`expected ${text} to parse: ${result.message}`);
  return result.mm;
}

describe('parseLength', () => {
  it.each([
    ['420', 4200],
    ['420cm', 4200],
    ['420 cm', 4200],
    ['4.2m', 4200],
    ['4.2 metres', 4200],
    ['4200 mm', 4200],
    ['4,2 m', 4200],
    ['.5m', 500],
    ['  42.5  ', 425],
  ])('reads metric %s as %d mm', (text, mm) => {
    expect(mmOf(text)).toBeCloseTo(mm, 9);
  });

  it.each([
    [`13' 9"`, 13 * 304.8 + 9 * 25.4],
    [`13'9"`, 13 * 304.8 + 9 * 25.4],
    ['13ft 9in', 13 * 304.8 + 9 * 25.4],
    ['13 feet 9 inches', 13 * 304.8 + 9 * 25.4],
    [`13' 9`, 13 * 304.8 + 9 * 25.4],
    [`9 1/2"`, 9.5 * 25.4],
    [`13' 9 1/2"`, 13 * 304.8 + 9.5 * 25.4],
    [`1/2"`, 12.7],
    [`5'`, 5 * 304.8],
    ['13\u2032 9\u2033', 13 * 304.8 + 9 * 25.4],
  ])('reads imperial %s', (text, mm) => {
    expect(mmOf(text)).toBeCloseTo(mm, 9);
  });

  it('reads a bare number in the user unit', () => {
    expect(mmOf('420', 'mm')).toBe(420);
    expect(mmOf('4.2', 'm')).toBeCloseTo(4200, 9);
    expect(mmOf('10', 'in')).toBeCloseTo(254, 9);
    expect(mmOf('13', 'ftin')).toBeCloseTo(13 * 304.8, 9);
    expect(mmOf('42')).toBe(420);
  });

  it('refuses text that is not a length with an example', () => {
    const result = parseLength('abc');
    expect(result).toEqual({ ok: false, message: '“abc” is not a length. Try 420, 4.2m or 13\' 9".' });
    expect(parseLength('4.2 parsecs').ok).toBe(false);
    expect(parseLength('4m 20cm').ok).toBe(false);
    expect(parseLength(`9" 13'`).ok).toBe(false);
    expect(parseLength('1/0"').ok).toBe(false);
    expect(parseLength('1,200 mm').ok).toBe(false);
  });

  it('refuses empty text and negative lengths unless allowed', () => {
    expect(parseLength('   ').ok).toBe(false);
    expect(parseLength('-420')).toEqual({ ok: false, message: 'A length here cannot be negative.' });
    expect(parseLength('-420', 'cm', { allowNegative: true })).toEqual({ ok: true, mm: -4200 });
  });

  it('refuses lengths beyond a kilometre as a likely unit slip', () => {
    expect(parseLength('4200000000 mm').ok).toBe(false);
  });
});

describe('formatLength', () => {
  it('writes centimetres with at most one decimal', () => {
    expect(formatLength(4200, 'cm')).toBe('420 cm');
    expect(formatLength(4205, 'cm')).toBe('420.5 cm');
    expect(formatLength(4206.66, 'cm')).toBe('420.7 cm');
  });

  it('writes metres with two decimals and millimetres whole', () => {
    expect(formatLength(4200, 'm')).toBe('4.20 m');
    expect(formatLength(4199.6, 'mm')).toBe('4200 mm');
  });

  it('writes feet and inches to the nearest 1/8 in or 1/2 in', () => {
    expect(formatLength(13 * 304.8 + 9 * 25.4, 'ftin')).toBe(`13' 9"`);
    expect(formatLength(13 * 304.8 + 9.5 * 25.4, 'ftin')).toBe(`13' 9 1/2"`);
    expect(formatLength(13 * 304.8 + 9.375 * 25.4, 'ftin')).toBe(`13' 9 3/8"`);
    expect(formatLength(13 * 304.8 + 9.375 * 25.4, 'ftin', { inchDenominator: 2 })).toBe(`13' 9 1/2"`);
    expect(formatLength(5 * 304.8, 'ftin')).toBe(`5' 0"`);
    expect(formatLength(9.5 * 25.4, 'ftin')).toBe(`9 1/2"`);
    // 11.99 in rounds up into the next foot rather than printing 12"
    expect(formatLength(304.8 - 0.2, 'ftin')).toBe(`1' 0"`);
    expect(formatLength(165.5 * 25.4, 'in')).toBe(`165 1/2"`);
  });

  it('groups thousands in the reader’s locale for labels, and not without one (fields read back)', () => {
    expect(formatLength(210_000, 'mm', { locale: 'en-GB' })).toBe('210,000 mm');
    expect(formatLength(210_000, 'mm')).toBe('210000 mm');
    expect(formatLength(2_100_005, 'cm', { locale: 'en-US' })).toBe('210,000.5 cm');
    expect(formatLength(1_234_000, 'm', { locale: 'en-GB' })).toBe('1,234.00 m');
    expect(formatLength(4200, 'm', { locale: 'en-GB' })).toBe('4.20 m');
    // German groups with a point and marks decimals with a comma (Unicode CLDR, de).
    expect(formatLength(210_000, 'mm', { locale: 'de-DE' })).toBe('210.000 mm');
    expect(formatLength(4200, 'm', { locale: 'de-DE' })).toBe('4,20 m');
    expect(formatLength(1000 * 304.8 + 9.5 * 25.4, 'ftin', { locale: 'en-US' })).toBe(`1,000' 9 1/2"`);
    expect(formatLength(1500 * 25.4, 'in', { locale: 'en-US' })).toBe(`1,500"`);
  });

  it('keeps the minus sign only when something is left after rounding', () => {
    expect(formatLength(-4200, 'cm')).toBe('-420 cm');
    expect(formatLength(-9.5 * 25.4, 'ftin')).toBe(`-9 1/2"`);
    expect(formatLength(-0.01, 'ftin')).toBe('0"');
    expect(formatLength(-0.2, 'm')).toBe('0.00 m');
  });

  it('round-trips through parseLength', () => {
    for (const unit of ['mm', 'cm', 'm', 'in', 'ftin'] as const) {
      for (const mm of [4200, 3048, 812.8, 2438.4]) {
        const back = mmOf(formatLength(mm, unit), unit);
        // each unit's printed precision bounds the round-trip error
        const tolerance = { mm: 0.5, cm: 0.5, m: 5, in: 25.4 / 16, ftin: 25.4 / 16 }[unit];
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(tolerance);
      }
    }
  });
});
