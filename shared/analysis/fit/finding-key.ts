// A finding's stable key: what it is about (its kind and the ids it names), never where it stands in the
// list or where its pieces stand, so a mark the designer puts on a finding follows it while pieces move.
import { SEEN_LIMITS } from '../../schemas/option';
import type { Finding } from './finding';

/** Keys longer than this (a finding naming every one of many doors) end in a digest of the whole instead: what a seen mark holds. */
export const FINDING_KEY_MAX_LENGTH = SEEN_LIMITS.keyLength;
/** How much of a long key is kept readable before its digest. */
const LONG_KEY_HEAD = FINDING_KEY_MAX_LENGTH - 40;

// Plain code-unit order, not the locale's: the same ids sort the same on every machine.
const byCodeUnit = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
const sorted = (ids: readonly string[]) => [...new Set(ids)].sort(byCodeUnit);

// Two 32-bit multiplicative hashes over UTF-16 code units (FNV-1a's and MurmurHash2's constants):
// 64 bits are plenty for the few hundred findings of one option, and need no platform API (shared
// code runs in the browser, the worker and the server alike).
function digest(text: string): string {
  let a = 0x811c9dc5;
  let b = 0x9747b28c;
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    a = Math.imul(a ^ unit, 0x01000193) >>> 0;
    b = Math.imul(b ^ unit, 0x5bd1e995) >>> 0;
  }
  return a.toString(16).padStart(8, '0') + b.toString(16).padStart(8, '0');
}

/**
 * The key of a finding: its kind, the piece it is about (the first piece named), the other pieces it
 * names, sorted, and the openings it names, sorted. Two findings differ in key when they differ in
 * what they are about; moving, turning or resizing a piece keeps its findings' keys. Written as JSON
 * so no id can run into the next; at most FINDING_KEY_MAX_LENGTH characters.
 */
export function findingKey(finding: Pick<Finding, 'kind' | 'pieces' | 'openings'>): string {
  const [subject = '', ...others] = finding.pieces;
  const key = JSON.stringify([finding.kind, subject, sorted(others), sorted(finding.openings)]);
  return key.length <= FINDING_KEY_MAX_LENGTH ? key : `${key.slice(0, LONG_KEY_HEAD)}…#${digest(key)}`;
}
