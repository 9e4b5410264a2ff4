// Tests for assignFinish: finishes on the floor, the ceiling and every wall of one option, feature
// walls set and cleared, and refusals for an unknown option, a missing wall or an empty finish id.
import { describe, expect, it } from 'vitest';
import { assignFinish } from './finish-commands';
import { applied, refusal, sampleDoc } from '../../tests/fixtures/commands';

describe('assignFinish', () => {
  it('puts finishes on the floor, the ceiling and all walls of one option', () => {
    const doc = sampleDoc();
    const next = applied(applied(doc, assignFinish('opt-b', 'floor', 'tiles')), assignFinish('opt-b', 'ceiling', 'paint-white'));
    expect(next.options['opt-b'].finishes).toEqual({ floor: 'tiles', ceiling: 'paint-white', walls: null, wallOverrides: {} });
    expect(next.options['opt-a']).toBe(doc.options['opt-a']);
    expect(applied(doc, assignFinish('opt-a', 'walls', null)).options['opt-a'].finishes.walls).toBeNull();
    expect(assignFinish('opt-a', 'floor', 'x').label(doc)).toBe('Change floor finish');
    expect(assignFinish('opt-a', 'walls', null).label(doc)).toBe('Clear wall finish');
  });

  it('sets and clears a feature wall', () => {
    const doc = sampleDoc();
    const feature = applied(doc, assignFinish('opt-a', { wall: 3 }, 'paper-fern'));
    expect(feature.options['opt-a'].finishes.wallOverrides).toEqual({ '1': 'paint-sage', '3': 'paper-fern' });
    expect(applied(feature, assignFinish('opt-a', { wall: 1 }, null)).options['opt-a'].finishes.wallOverrides).toEqual({
      '3': 'paper-fern',
    });
    expect(assignFinish('opt-a', { wall: 3 }, null).label(doc)).toBe('Clear wall 3 finish');
  });

  it('refuses an unknown option, a missing wall and an empty finish id', () => {
    const doc = sampleDoc();
    expect(refusal(doc, assignFinish('opt-x', 'floor', 'tiles'))).toBe("Can't change floor finish: there is no option opt-x.");
    expect(refusal(doc, assignFinish('opt-a', { wall: 4 }, 'tiles'))).toBe(
      "Can't change wall 4 finish: there is no wall 4 (the room has walls 0 to 3).",
    );
    expect(refusal(doc, assignFinish('opt-a', 'floor', ''))).toBe("Can't change floor finish: the finish needs an id.");
  });
});
