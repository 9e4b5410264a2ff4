// Tests for markSeen and unmarkSeen: a mark with its note and time on one option, a second mark changing
// the note, one undo step each, the bound pushing out marks of findings no longer listed, and refusals.
import { describe, expect, it } from 'vitest';
import { SEEN_LIMITS } from '../schemas/option';
import { applyToHistory, createHistory, undo, undoLabel, type History } from './history';
import { markSeen, unmarkSeen } from './seen-commands';
import { applied, refusal, sampleDoc } from '../../tests/fixtures/commands';
import type { Command } from './command';

const AT = '2026-12-03T14:00:00.000Z';
const LATER = '2026-12-03T15:00:00.000Z';
const KEY = '["door-swing","sofa",[],["d1"]]';

function run(history: History, command: Command): History {
  const result = applyToHistory(history, command);
  if (!result.ok) throw new Error(result.message);
  return result.history;
}

describe('markSeen', () => {
  it('marks a finding of one option as seen with its note and time, and leaves the other option alone', () => {
    const doc = sampleDoc();
    const next = applied(doc, markSeen('opt-a', KEY, '  The sofa stays: the door is never used  ', AT));
    expect(next.options['opt-a'].seen).toEqual([{ key: KEY, note: 'The sofa stays: the door is never used', at: AT }]);
    expect(next.options['opt-a'].pieces).toBe(doc.options['opt-a'].pieces);
    expect(next.options['opt-b']).toBe(doc.options['opt-b']);
    expect(markSeen('opt-a', KEY, '', AT).label(doc)).toBe('Mark as seen');
  });

  it('changes the note and time of a finding marked again, keeping one mark', () => {
    const once = applied(sampleDoc(), markSeen('opt-a', KEY, 'first', AT));
    const twice = applied(once, markSeen('opt-a', KEY, 'second', LATER));
    expect(twice.options['opt-a'].seen).toEqual([{ key: KEY, note: 'second', at: LATER }]);
    expect(markSeen('opt-a', KEY, 'x', AT).label(once)).toBe('Change seen note');
  });

  it('is one undo step, and so is unmarking', () => {
    const start = createHistory(sampleDoc());
    const marked = run(start, markSeen('opt-a', KEY, 'on purpose', AT));
    expect(undoLabel(marked)).toBe('Mark as seen');
    expect(undo(marked).doc.options['opt-a'].seen).toEqual([]);
    const unmarked = run(marked, unmarkSeen('opt-a', KEY));
    expect(unmarked.doc.options['opt-a'].seen).toEqual([]);
    expect(undoLabel(unmarked)).toBe('Unmark');
    expect(undo(unmarked).doc.options['opt-a'].seen).toEqual([{ key: KEY, note: 'on purpose', at: AT }]);
  });

  it('at the bound pushes out the oldest mark whose finding is not listed, and refuses when all are', () => {
    let doc = sampleDoc();
    const keys = Array.from({ length: SEEN_LIMITS.marks }, (_, i) => `["overlap","p${i}",["q"],[]]`);
    for (const key of keys) doc = applied(doc, markSeen('opt-a', key, '', AT));
    expect(doc.options['opt-a'].seen).toHaveLength(SEEN_LIMITS.marks);
    // p0 and p1 are still listed; p2's finding went away, so its mark makes room.
    const next = applied(doc, markSeen('opt-a', 'new', 'x', LATER, [keys[0]!, keys[1]!, 'new']));
    const seenKeys = next.options['opt-a'].seen.map((m) => m.key);
    expect(seenKeys).toHaveLength(SEEN_LIMITS.marks);
    expect(seenKeys.slice(0, 3)).toEqual([keys[0], keys[1], keys[3]]);
    expect(seenKeys.at(-1)).toBe('new');
    expect(refusal(doc, markSeen('opt-a', 'new', 'x', LATER, keys))).toBe(
      `Can't mark as seen: an option keeps at most ${SEEN_LIMITS.marks} seen marks.`,
    );
  });

  it('refuses an unknown option, a long note, a bad time and an empty key', () => {
    const doc = sampleDoc();
    expect(refusal(doc, markSeen('opt-x', KEY, '', AT))).toBe("Can't mark as seen: there is no option opt-x.");
    expect(refusal(doc, markSeen('opt-a', KEY, 'x'.repeat(SEEN_LIMITS.noteLength + 1), AT))).toBe(
      `Can't mark as seen: note must be at most ${SEEN_LIMITS.noteLength} characters.`,
    );
    expect(refusal(doc, markSeen('opt-a', KEY, '', 'yesterday'))).toBe(
      "Can't mark as seen: at must be a date and time (ISO 8601).",
    );
    expect(refusal(doc, markSeen('opt-a', '', '', AT))).toBe("Can't mark as seen: key must name a finding.");
  });
});

describe('unmarkSeen', () => {
  it('takes off only that mark and refuses a finding that is not marked', () => {
    const doc = applied(applied(sampleDoc(), markSeen('opt-a', KEY, 'a', AT)), markSeen('opt-a', 'other', 'b', AT));
    expect(applied(doc, unmarkSeen('opt-a', KEY)).options['opt-a'].seen.map((m) => m.key)).toEqual(['other']);
    expect(refusal(doc, unmarkSeen('opt-a', 'missing'))).toBe("Can't unmark: that finding is not marked as seen.");
    expect(refusal(doc, unmarkSeen('opt-x', KEY))).toBe("Can't unmark: there is no option opt-x.");
  });
});
