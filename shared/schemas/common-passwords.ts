// Common passwords, from @zxcvbn-ts/language-common's list (about 49,000, gathered from leaked
// password sets), compared case-insensitively. The Set is built on first use, once.
import { dictionary } from '@zxcvbn-ts/language-common';

let common: Set<string> | null = null;

export function isCommonPassword(password: string): boolean {
  common ??= new Set(dictionary['passwords-common'].map((p) => p.toLowerCase()));
  return common.has(password.trim().toLowerCase());
}
