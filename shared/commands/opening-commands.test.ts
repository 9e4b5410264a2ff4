// Tests for the opening commands: adding, moving and changing doors, windows and passages, flipping
// a door's hinge and swing, removing one, and the refusals of each.
import { describe, expect, it } from 'vitest';
import { addOpening, flipHinge, flipSwing, removeOpening, updateOpening } from './opening-commands';
import { applied, refusal, sampleDoc } from '../../tests/fixtures/commands';

const window2 = { id: 'w2', type: 'window' as const, wall: 1, offset: 600, width: 1200, height: 1200, sill: 900 };

describe('addOpening', () => {
  it('adds an opening with the id it was given', () => {
    const doc = sampleDoc();
    const next = applied(doc, addOpening(window2));
    expect(next.shell.openings.map((o) => o.id)).toEqual(['d1', 'w1', 'p1', 'w2']);
    expect(next.options).toBe(doc.options);
    expect(addOpening(window2).label(doc)).toBe('Add window');
  });

  it('refuses a taken id, a bad size, a missing wall and an overlap', () => {
    const doc = sampleDoc();
    expect(refusal(doc, addOpening({ ...window2, id: 'd1' }))).toBe("Can't add window: there is already an opening d1.");
    expect(refusal(doc, addOpening({ ...window2, width: 0 }))).toBe("Can't add window: width must be more than 0 mm.");
    expect(refusal(doc, addOpening({ ...window2, wall: 4 }))).toBe(
      "Can't add window: there is no wall 4 (the room has walls 0 to 3).",
    );
    expect(refusal(doc, addOpening({ ...window2, wall: 0, offset: 1000 }))).toBe(
      "Can't add window: window w2: overlaps d1 (openings[0]) on wall 0.",
    );
  });
});

describe('updateOpening', () => {
  it('slides an opening along its wall and calls that a move', () => {
    const doc = sampleDoc();
    const next = applied(doc, updateOpening('d1', { offset: 1500 }));
    expect(next.shell.openings[0]).toEqual({ ...doc.shell.openings[0], offset: 1500 });
    expect(next.shell.openings[1]).toBe(doc.shell.openings[1]);
    expect(updateOpening('d1', { offset: 1500 }).label(doc)).toBe('Move door');
    expect(updateOpening('w1', { sill: 800, height: 1300 }).label(doc)).toBe('Change window');
  });

  it('changes a window sill and size, and a door hinge', () => {
    const doc = sampleDoc();
    expect(applied(doc, updateOpening('w1', { sill: 800, height: 1300 })).shell.openings[1]).toMatchObject({
      sill: 800,
      height: 1300,
    });
    expect(applied(doc, updateOpening('d1', { hinge: 'end', width: 900 })).shell.openings[0]).toMatchObject({
      hinge: 'end',
      width: 900,
    });
  });

  it('refuses fields the opening does not have, a run past the wall end and an unknown id', () => {
    const doc = sampleDoc();
    expect(refusal(doc, updateOpening('d1', { sill: 500 }))).toBe("Can't change door: a door has no sill.");
    expect(refusal(doc, updateOpening('p1', { swing: 'out' }))).toBe("Can't change passage: a passage has no hinge or swing.");
    expect(refusal(doc, updateOpening('d1', { offset: 3500 }))).toBe(
      "Can't move door: door d1: runs past the end of wall 0 (4200 mm): ends at 4320 mm, at most 4150 mm.",
    );
    expect(refusal(doc, updateOpening('x9', { offset: 100 }))).toBe("Can't move opening: there is no opening x9.");
  });
});

describe('flipHinge and flipSwing', () => {
  it('turn a door on its other jamb and swing it the other way; twice is back where it was', () => {
    const doc = sampleDoc();
    const hinged = applied(doc, flipHinge('d1'));
    expect(hinged.shell.openings[0]).toMatchObject({ hinge: 'end', swing: 'in' });
    expect(applied(hinged, flipHinge('d1')).shell.openings[0]).toEqual(doc.shell.openings[0]);
    expect(applied(doc, flipSwing('d1')).shell.openings[0]).toMatchObject({ hinge: 'start', swing: 'out' });
    expect(flipSwing('d1').label(doc)).toBe('Flip door swing');
  });

  it('refuse anything but a door', () => {
    expect(refusal(sampleDoc(), flipHinge('w1'))).toBe("Can't flip door hinge: w1 is a window, not a door.");
    expect(refusal(sampleDoc(), flipSwing('zz'))).toBe("Can't flip door swing: there is no opening zz.");
  });
});

describe('removeOpening', () => {
  it('removes the opening and names it', () => {
    const doc = sampleDoc();
    expect(applied(doc, removeOpening('w1')).shell.openings.map((o) => o.id)).toEqual(['d1', 'p1']);
    expect(removeOpening('w1').label(doc)).toBe('Remove window');
    expect(refusal(doc, removeOpening('w9'))).toBe("Can't remove opening: there is no opening w9.");
  });
});
