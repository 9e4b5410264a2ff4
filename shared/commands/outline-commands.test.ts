// Tests for the outline commands: setOutline, moveCorner, setWallLength (angles kept), insertCorner,
// removeCorner, wall height and thickness, with openings, overrides and finishes following their walls.
import { describe, expect, it } from 'vitest';
import {
  closeOutlineGap,
  insertCorner,
  moveCorner,
  removeCorner,
  setOutline,
  setChildRoom,
  setWallHeight,
  setWallLength,
  setWallThickness,
} from './outline-commands';
import { applied, lOutline, rectangleShell, refusal, sampleDoc } from '../../tests/fixtures/commands';

const noOpenings = { ...rectangleShell, openings: [] };

describe('setOutline', () => {
  it('redraws the outline, dropping a repeated closing corner, and leaves the old document alone', () => {
    const doc = sampleDoc();
    const next = applied(
      doc,
      setOutline([
        [0, 0],
        [4500, 0],
        [4500, 3600],
        [0, 3600],
        [0, 0],
      ]),
    );
    expect(next.shell.outline).toEqual([
      [0, 0],
      [4500, 0],
      [4500, 3600],
      [0, 3600],
    ]);
    expect(doc.shell.outline[1]).toEqual([4200, 0]);
    expect(next.options).toBe(doc.options);
    expect(setOutline([]).label(doc)).toBe('Redraw outline');
  });

  it('drops thickness overrides and wall finishes of walls the new outline no longer has', () => {
    const doc = sampleDoc({ ...noOpenings, wallThicknesses: [null, 200, null, 250] });
    const next = applied(
      doc,
      setOutline([
        [0, 0],
        [4000, 0],
        [0, 3000],
      ]),
    );
    expect(next.shell.wallThicknesses).toEqual([null, 200]);
    expect(next.options['opt-a'].finishes.wallOverrides).toEqual({ '1': 'paint-sage' });
  });

  it('refuses too few corners, crossing walls and openings left on missing walls', () => {
    const doc = sampleDoc();
    expect(
      refusal(
        doc,
        setOutline([
          [0, 0],
          [1000, 0],
        ]),
      ),
    ).toBe("Can't redraw outline: an outline needs at least 3 corners (has 2).");
    expect(
      refusal(
        sampleDoc(noOpenings),
        setOutline([
          [0, 0],
          [4000, 0],
          [0, 3000],
          [4000, 3000],
        ]),
      ),
    ).toBe("Can't redraw outline: wall 1 crosses wall 3.");
    expect(
      refusal(
        doc,
        setOutline([
          [0, 0],
          [4000, 0],
          [0, 3000],
        ]),
      ),
    ).toBe("Can't redraw outline: passage p1 is on wall 3, which the new outline does not have (remove it first).");
    expect(
      refusal(
        doc,
        setOutline([
          [0, 0],
          [Number.NaN, 0],
          [0, 3000],
        ]),
      ),
    ).toBe("Can't redraw outline: corner 1 x must be a number of millimetres.");
  });
});

describe('moveCorner', () => {
  it('moves one corner; openings keep their offsets from their wall start', () => {
    const doc = sampleDoc();
    const next = applied(doc, moveCorner(2, 4500, 3600));
    expect(next.shell.outline).toEqual([
      [0, 0],
      [4200, 0],
      [4500, 3600],
      [0, 3600],
    ]);
    expect(next.shell.openings).toBe(doc.shell.openings);
    expect(moveCorner(2, 0, 0).label(doc)).toBe('Move corner 2');
  });

  it('slides an opening back along a wall that became too short for it', () => {
    const next = applied(sampleDoc(), moveCorner(1, 1000, 0));
    // wall 0 is now 1000 mm: the 820 mm door must end 50 mm before corner 1, so it starts at 130
    expect(next.shell.openings[0]).toMatchObject({ id: 'd1', offset: 130 });
  });

  it('refuses when an opening can no longer fit, walls cross or the corner does not exist', () => {
    const doc = sampleDoc();
    expect(refusal(doc, moveCorner(1, 800, 0))).toBe(
      "Can't move corner 1: door d1 (820 mm wide) would no longer fit on wall 0 (800 mm long).",
    );
    expect(refusal(sampleDoc(noOpenings), moveCorner(2, -1000, 1800))).toMatch(
      /^Can't move corner 2: wall \d crosses wall \d\.$/,
    );
    expect(refusal(doc, moveCorner(9, 0, 0))).toBe("Can't move corner 9: there is no corner 9 (the room has corners 0 to 3).");
  });
});

describe('setWallLength', () => {
  it('lengthens a rectangle wall by moving the next corners; the parallel wall opposite takes it up', () => {
    const doc = sampleDoc();
    const next = applied(doc, setWallLength(0, 4500));
    expect(next.shell.outline).toEqual([
      [0, 0],
      [4500, 0],
      [4500, 3600],
      [0, 3600],
    ]);
    // w1 is measured from corner 2, which moved with the wall, so its offset stays 1000
    expect(next.shell.openings.find((o) => o.id === 'w1')?.offset).toBe(1000);
    expect(setWallLength(3, 1).label(doc)).toBe('Change wall 3 length');
  });

  it('keeps every angle of an L shape', () => {
    const next = applied(sampleDoc({ ...noOpenings, outline: lOutline }), setWallLength(1, 3000));
    expect(next.shell.outline).toEqual([
      [0, 0],
      [5000, 0],
      [5000, 3000],
      [3000, 3000],
      [3000, 4000],
      [0, 4000],
    ]);
  });

  it('re-measures the closing wall by moving corner 0 and the corners up to the next parallel wall', () => {
    const next = applied(sampleDoc(), setWallLength(3, 4000));
    expect(next.shell.outline).toEqual([
      [0, -400],
      [4200, -400],
      [4200, 3600],
      [0, 3600],
    ]);
  });

  it('lets the closing wall take up the change when no wall is parallel', () => {
    const next = applied(
      sampleDoc({
        ...noOpenings,
        outline: [
          [0, 0],
          [4000, 0],
          [0, 3000],
        ],
      }),
      setWallLength(0, 5000),
    );
    expect(next.shell.outline).toEqual([
      [0, 0],
      [5000, 0],
      [1000, 3000],
    ]);
  });

  it('refuses a wall too short to take up the change, a zero length and a missing wall', () => {
    const doc = sampleDoc({ ...noOpenings, outline: lOutline });
    expect(refusal(doc, setWallLength(1, 4200))).toBe(
      "Can't change wall 1 length: wall 3 (1500 mm) is too short to take up the change.",
    );
    expect(refusal(doc, setWallLength(1, 0))).toBe("Can't change wall 1 length: the length must be at least 1 mm.");
    expect(refusal(doc, setWallLength(6, 1000))).toBe(
      "Can't change wall 6 length: there is no wall 6 (the room has walls 0 to 5).",
    );
  });
});

describe('insertCorner', () => {
  it('splits a wall without changing the shape; later openings, overrides and finishes follow their walls', () => {
    const doc = sampleDoc({ ...rectangleShell, wallThicknesses: [null, null, 200] });
    const next = applied(doc, insertCorner(2, 3000));
    expect(next.shell.outline).toEqual([
      [0, 0],
      [4200, 0],
      [4200, 3600],
      [1200, 3600],
      [0, 3600],
    ]);
    expect(next.shell.openings.map((o) => [o.id, o.wall, o.offset])).toEqual([
      ['d1', 0, 300],
      ['w1', 2, 1000],
      ['p1', 4, 800],
    ]);
    expect(next.shell.wallThicknesses).toEqual([null, null, 200, 200]);
    expect(insertCorner(2, 1).label(doc)).toBe('Add corner to wall 2');
  });

  it('moves an opening beyond the new corner onto the second half, and renumbers wall finishes', () => {
    const doc = sampleDoc();
    const next = applied(doc, insertCorner(0, 200));
    expect(next.shell.openings[0]).toMatchObject({ id: 'd1', wall: 1, offset: 100 });
    // wall 1's feature finish is now on wall 2; both halves of wall 0 had none
    expect(next.options['opt-a'].finishes.wallOverrides).toEqual({ '2': 'paint-sage' });
    expect(next.options['opt-b']).toBe(doc.options['opt-b']);
  });

  it('refuses a corner inside an opening or off the wall', () => {
    const doc = sampleDoc();
    expect(refusal(doc, insertCorner(2, 2000))).toBe("Can't add corner to wall 2: the new corner would fall inside window w1.");
    expect(refusal(doc, insertCorner(2, 0))).toBe(
      "Can't add corner to wall 2: the new corner must fall between the ends of wall 2 (0 to 4200 mm).",
    );
  });
});

describe('removeCorner', () => {
  const withMidpoint = {
    ...rectangleShell,
    outline: [
      [0, 0],
      [2000, 0],
      [4200, 0],
      [4200, 3600],
      [0, 3600],
    ] as [number, number][],
    wallThicknesses: [150, 250],
    openings: [
      {
        id: 'd1',
        type: 'door' as const,
        wall: 1,
        offset: 300,
        width: 820,
        height: 2040,
        hinge: 'start' as const,
        swing: 'in' as const,
      },
      { id: 'p1', type: 'passage' as const, wall: 4, offset: 800, width: 900, height: 2100 },
    ],
  };

  it('merges the two walls at the corner; openings keep their place along the merged wall', () => {
    const doc = sampleDoc(withMidpoint);
    const next = applied(doc, removeCorner(1));
    expect(next.shell.outline).toEqual([
      [0, 0],
      [4200, 0],
      [4200, 3600],
      [0, 3600],
    ]);
    // d1 was 300 mm past corner 1 at x = 2000, so it now starts 2300 mm along wall 0
    expect(next.shell.openings.map((o) => [o.id, o.wall, o.offset])).toEqual([
      ['d1', 0, 2300],
      ['p1', 3, 800],
    ]);
    // the merged wall keeps the thickness of the wall that ended at the removed corner
    expect(next.shell.wallThicknesses).toEqual([150]);
    // wall 1's feature finish moved down to wall 0 with the merge
    expect(next.options['opt-a'].finishes.wallOverrides).toEqual({ '0': 'paint-sage' });
    expect(removeCorner(1).label(doc)).toBe('Remove corner 1');
  });

  it('refuses to leave fewer than 3 corners, or a missing corner', () => {
    const triangle = sampleDoc({
      ...noOpenings,
      outline: [
        [0, 0],
        [4000, 0],
        [0, 3000],
      ],
    });
    expect(refusal(triangle, removeCorner(0))).toBe("Can't remove corner 0: an outline needs at least 3 corners.");
    expect(refusal(triangle, removeCorner(3))).toBe("Can't remove corner 3: there is no corner 3 (the room has corners 0 to 2).");
  });
});

describe('setChildRoom', () => {
  it('marks the room as a child’s and back', () => {
    const marked = applied(sampleDoc(), setChildRoom(true));
    expect(marked.shell.childRoom).toBe(true);
    expect(applied(marked, setChildRoom(false)).shell.childRoom).toBe(false);
    expect(setChildRoom(true).label(sampleDoc())).toBe('Mark as a child’s room');
  });
});

describe('setWallHeight', () => {
  it('sets the height for the whole room', () => {
    expect(applied(sampleDoc(), setWallHeight(2400)).shell.wallHeight).toBe(2400);
  });

  it('refuses a height the openings do not fit under, and a non-positive one', () => {
    const doc = sampleDoc();
    expect(refusal(doc, setWallHeight(2000))).toBe(
      "Can't change wall height: door d1: door is taller than the wall (2000 mm) (and 2 more).",
    );
    expect(refusal(doc, setWallHeight(0))).toBe("Can't change wall height: the wall height must be more than 0 mm.");
  });
});

describe('setWallThickness', () => {
  it('sets the room thickness, one wall override, and clears it again', () => {
    const doc = sampleDoc();
    expect(applied(doc, setWallThickness(150)).shell.wallThickness).toBe(150);
    const thick = applied(doc, setWallThickness(250, 2));
    expect(thick.shell.wallThicknesses).toEqual([null, null, 250]);
    expect(thick.shell.wallThickness).toBe(100);
    const cleared = applied(thick, setWallThickness(null, 2));
    expect('wallThicknesses' in cleared.shell).toBe(false);
    expect(setWallThickness(250, 2).label(doc)).toBe('Change wall 2 thickness');
    expect(setWallThickness(250).label(doc)).toBe('Change wall thickness');
  });

  it('refuses no thickness for the room, a missing wall and a non-positive thickness', () => {
    const doc = sampleDoc();
    expect(refusal(doc, setWallThickness(null))).toBe("Can't change wall thickness: the room needs a wall thickness.");
    expect(refusal(doc, setWallThickness(200, 4))).toBe(
      "Can't change wall 4 thickness: there is no wall 4 (the room has walls 0 to 3).",
    );
    expect(refusal(doc, setWallThickness(-5, 1))).toBe("Can't change wall 1 thickness: the thickness must be more than 0 mm.");
  });
});

describe('closeOutlineGap', () => {
  it('closes a walk that misses by 10 mm each way by stretching the last two walls', () => {
    const next = applied(
      sampleDoc(),
      closeOutlineGap([{ lengthMm: 4200 }, { lengthMm: 3600 }, { lengthMm: 4190 }, { lengthMm: 3590 }]),
    );
    next.shell.outline.forEach((corner, i) => {
      const expected = [
        [0, 0],
        [4200, 0],
        [4200, 3600],
        [0, 3600],
      ][i];
      expect(corner[0]).toBeCloseTo(expected[0], 6);
      expect(corner[1]).toBeCloseTo(expected[1], 6);
    });
    expect(closeOutlineGap([]).label(sampleDoc())).toBe('Close the outline');
  });

  it('refuses a walk of two walls or with a non-positive length', () => {
    const doc = sampleDoc();
    expect(refusal(doc, closeOutlineGap([{ lengthMm: 4200 }, { lengthMm: 3600 }]))).toBe(
      "Can't close the outline: a walk needs at least 3 walls (has 2).",
    );
    expect(refusal(doc, closeOutlineGap([{ lengthMm: 4200 }, { lengthMm: -1 }, { lengthMm: 4200 }]))).toBe(
      "Can't close the outline: wall 1 length must be more than 0 mm.",
    );
  });
});
