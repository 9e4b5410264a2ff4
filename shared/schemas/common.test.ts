// Tests for the shared text schemas: control and text-direction characters refused in names, tab and
// line breaks allowed in notes only, trimming and length limits, and record versions.
import { describe, expect, it } from 'vitest';
import { isCleanName, isCleanNote, nameText, noteText, versionSchema, withoutUncleanCharacters } from './common';

describe('names and notes', () => {
  it('refuses every C0 and C1 control character and the bidirectional controls in a name', () => {
    const forbidden = [
      ...Array.from({ length: 0x20 }, (_, c) => c),
      0x7f,
      ...Array.from({ length: 0x20 }, (_, c) => 0x80 + c),
      0x202a,
      0x202b,
      0x202c,
      0x202d,
      0x202e,
      0x2066,
      0x2067,
      0x2068,
      0x2069,
    ];
    for (const code of forbidden) expect(isCleanName(`a${String.fromCharCode(code)}b`), code.toString(16)).toBe(false);
    // Marks that only hint a direction (LRM, RLM, ALM) and ordinary letters of every script stay.
    for (const text of ['Café Ölçü', 'غرفة المعيشة', 'リビング', 'a\u200eb', 'Wren & Tallow — studio'])
      expect(isCleanName(text), text).toBe(true);
  });

  it('allows tab and line breaks in notes only', () => {
    expect(isCleanNote('one\ttwo\r\nthree\n')).toBe(true);
    expect(isCleanName('one\ttwo')).toBe(false);
    expect(isCleanNote('a\u0000b')).toBe(false);
    expect(isCleanNote('a\u202eb')).toBe(false);
    expect(isCleanNote('a\u000bb')).toBe(false);
  });

  it('trims, limits the length and names the problem', () => {
    expect(nameText(5).parse('  Den  ')).toBe('Den');
    expect(nameText(5, 'Too long.').safeParse('Dining').error?.issues[0].message).toBe('Too long.');
    expect(nameText(5).safeParse('D\u0000n').error?.issues[0].message).toBe(
      'Remove control characters and text-direction marks.',
    );
    expect(noteText(20).parse(' a\nb ')).toBe('a\nb');
  });

  it('strips what a name may not hold from text made into a name', () => {
    expect(withoutUncleanCharacters('oak\u202egpj.jpg\u0000')).toBe('oakgpj.jpg');
  });
});

describe('versionSchema', () => {
  it('takes whole numbers from 1 to the largest 32-bit integer', () => {
    expect(versionSchema.parse(2_147_483_647)).toBe(2_147_483_647);
    for (const v of [0, 1.5, 2_147_483_648, 999_999_999_999]) expect(versionSchema.safeParse(v).success, String(v)).toBe(false);
  });
});
