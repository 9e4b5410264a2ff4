// Tests for the common-password check against the whole list in @zxcvbn-ts/language-common (any
// case, trimmed), and the first broken rule of a new password given in words.
import { describe, expect, it } from 'vitest';
import { dictionary } from '@zxcvbn-ts/language-common';
import { isCommonPassword } from './common-passwords';
import { newPasswordSchema } from './account';

describe('common passwords', () => {
  it('uses the whole list from @zxcvbn-ts/language-common, whatever the case', () => {
    const list = dictionary['passwords-common'];
    expect(list.length).toBeGreaterThan(40_000);
    expect(list.every((p) => isCommonPassword(p))).toBe(true);
    expect(isCommonPassword('PASSWORD')).toBe(true);
    expect(isCommonPassword(' qwerty123456 ')).toBe(true);
    expect(isCommonPassword('maple-window')).toBe(false);
  });

  it('gives the first broken rule of a new password in words', () => {
    const first = (p: unknown) => newPasswordSchema.safeParse(p).error?.issues[0]?.message;
    expect(first('maple-window')).toBeUndefined();
    expect(first('a'.repeat(11))).toBe('Use at least 12 characters. A few words you will remember work well.');
    expect(first(' '.repeat(12))).toBe('A password cannot be only spaces. Use letters, numbers or words.');
    expect(first('Qwerty123456')).toMatch(/^This is one of the most common passwords/);
    expect(first('x'.repeat(201))).toBe('Use at most 200 characters.');
    expect(first(undefined)).toBe('Choose a password.');
  });
});
