// Tests for renumbering walls when one splits or two merge: settings copied to both halves, later
// walls moved up, and openings kept in place when corner 0 is removed.
import { describe, expect, it } from 'vitest';
import { removeCorner } from './outline-commands';
import { applied, sampleDoc } from '../../tests/fixtures/commands';
import { remapThicknesses, sourcesAfterRemoval, sourcesAfterSplit, wallAfterRemoval } from './wall-edits';

describe('wall renumbering', () => {
  it('gives both halves of a split wall its settings and moves later walls up one', () => {
    expect(sourcesAfterSplit(4, 2)).toEqual([[0], [1], [2], [2], [3]]);
    expect(remapThicknesses([null, null, 200], sourcesAfterSplit(4, 2))).toEqual([null, null, 200, 200]);
  });

  it('merges the closing wall and wall 0 when corner 0 goes, onto the new last wall', () => {
    expect([0, 1, 2, 3, 4].map((wall) => wallAfterRemoval(wall, 0, 5))).toEqual([3, 0, 1, 2, 3]);
    expect(sourcesAfterRemoval(5, 0)).toEqual([[1], [2], [3], [4, 0]]);
    expect(remapThicknesses([180, null, null, null, null], sourcesAfterRemoval(5, 0))).toEqual([null, null, null, 180]);
  });

  it('keeps openings of both merged walls in place along the new wall when corner 0 goes', () => {
    const door = { type: 'door' as const, offset: 300, width: 820, height: 2040, hinge: 'start' as const, swing: 'in' as const };
    const doc = sampleDoc({
      wallHeight: 2600,
      wallThickness: 100,
      // corner 0 sits halfway along the top wall, which walls 4 and 0 share
      outline: [
        [2000, 0],
        [4200, 0],
        [4200, 3600],
        [0, 3600],
        [0, 0],
      ],
      openings: [
        { ...door, id: 'a', wall: 0 },
        { ...door, id: 'b', wall: 4 },
      ],
    });
    const next = applied(doc, removeCorner(0));
    expect(next.shell.outline).toEqual([
      [4200, 0],
      [4200, 3600],
      [0, 3600],
      [0, 0],
    ]);
    expect(next.shell.openings.map((o) => [o.id, o.wall, o.offset])).toEqual([
      ['a', 3, 2300],
      ['b', 3, 300],
    ]);
  });
});
