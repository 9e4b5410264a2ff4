// Tests for sortBySeen: open findings before seen ones, each group in the check's order, marks of
// findings no longer listed left out.
import { describe, expect, it } from 'vitest';
import type { Finding } from './fit/finding';
import { findingKey } from './fit/finding-key';
import { sortBySeen } from './seen-findings';

const finding = (kind: Finding['kind'], pieces: string[], openings: string[] = []): Finding => ({
  kind,
  pieces,
  openings,
  message: `${kind} ${pieces.join(' ')}`,
});
const AT = '2026-12-03T14:00:00.000Z';

describe('sortBySeen', () => {
  it('puts open findings first and seen ones after, each in the check’s order, with their marks and places', () => {
    const findings = [finding('overlap', ['a', 'b']), finding('door-swing', ['a'], ['d1']), finding('door-swing', ['c'], ['d1'])];
    const marks = [
      { key: findingKey(findings[2]!), note: 'the door stays shut', at: AT },
      { key: findingKey(findings[0]!), note: '', at: AT },
      // A finding that went away: its mark is kept in the document but not listed.
      { key: findingKey(finding('unreachable', ['gone'])), note: 'old', at: AT },
    ];
    const { open, seen } = sortBySeen(findings, marks);
    expect(open.map((f) => [f.index, f.mark])).toEqual([[1, null]]);
    expect(seen.map((f) => [f.index, f.mark?.note])).toEqual([
      [0, ''],
      [2, 'the door stays shut'],
    ]);
    expect(seen[0]!.key).toBe(findingKey(findings[0]!));
  });

  it('leaves every finding open without marks', () => {
    const findings = [finding('overlap', ['a', 'b'])];
    expect(sortBySeen(findings, []).open).toHaveLength(1);
    expect(sortBySeen([], [{ key: findingKey(findings[0]!), note: '', at: AT }])).toEqual({ open: [], seen: [] });
  });
});
