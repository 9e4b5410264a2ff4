// Tests for the option document's seen marks: documents saved before them read with none, and a mark's
// key, note, time, count and uniqueness are checked.
import { describe, expect, it } from 'vitest';
import { optionDocSchema, SEEN_LIMITS } from './option';

const AT = '2026-12-03T14:00:00.000Z';
const mark = (key: string, note = '') => ({ key, note, at: AT });

describe('optionDocSchema seen marks', () => {
  it('reads a document saved before seen marks with none', () => {
    expect(optionDocSchema.parse({ pieces: [] }).seen).toEqual([]);
    expect(optionDocSchema.parse({}).seen).toEqual([]);
  });

  it('keeps marks with their note and time, the note trimmed', () => {
    const doc = optionDocSchema.parse({
      seen: [mark('a', '  wanted  '), { key: 'b', note: '', at: '2026-12-03T14:00:00+01:00' }],
    });
    expect(doc.seen).toEqual([mark('a', 'wanted'), { key: 'b', note: '', at: '2026-12-03T14:00:00+01:00' }]);
  });

  it('refuses a long note, a bad time, an empty or long key, a finding marked twice and too many marks', () => {
    const fails = (seen: unknown) => !optionDocSchema.safeParse({ seen }).success;
    expect(fails([mark('a', 'x'.repeat(SEEN_LIMITS.noteLength))])).toBe(false);
    expect(fails([mark('a', 'x'.repeat(SEEN_LIMITS.noteLength + 1))])).toBe(true);
    expect(fails([mark('a', 'two\nlines')])).toBe(true);
    expect(fails([{ key: 'a', note: '', at: 'today' }])).toBe(true);
    expect(fails([mark('')])).toBe(true);
    expect(fails([mark('k'.repeat(SEEN_LIMITS.keyLength + 1))])).toBe(true);
    expect(fails([mark('a'), mark('a', 'again')])).toBe(true);
    const many = Array.from({ length: SEEN_LIMITS.marks }, (_, i) => mark(`k${i}`));
    expect(fails(many)).toBe(false);
    expect(fails([...many, mark('one-more')])).toBe(true);
  });
});
