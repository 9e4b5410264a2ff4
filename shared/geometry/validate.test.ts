// Tests for validateRoomShell: too few corners, zero-length and self-crossing walls, openings too
// long, past a wall end, overlapping or too tall, missing walls, and each problem's facts as values.
import { describe, expect, it } from 'vitest';
import { roomShellSchema, type RoomShellInput } from '../schemas/room';
import { validateRoomShell } from './validate';
import { starOutline } from './test-outlines';

function problems(input: Partial<RoomShellInput>) {
  const shell = roomShellSchema.parse({
    outline: [
      [0, 0],
      [3000, 0],
      [3000, 3000],
      [0, 3000],
    ],
    ...input,
  });
  return worded(validateRoomShell(shell, 'room'));
}

/** The plan-file wording alone (path and message), as the readers print it. */
function worded(list: ReturnType<typeof validateRoomShell>) {
  return list.map(({ path, message }) => ({ path, message }));
}

describe('validateRoomShell', () => {
  it('accepts a sound room', () => {
    expect(
      problems({
        openings: [{ id: 'd1', type: 'door', wall: 0, offset: 100, width: 800, height: 2000, hinge: 'start', swing: 'in' }],
      }),
    ).toEqual([]);
  });

  it('refuses fewer than 3 corners', () => {
    const shell = {
      ...roomShellSchema.parse({
        outline: [
          [0, 0],
          [1, 0],
          [1, 1],
        ],
      }),
      outline: [
        [0, 0],
        [1000, 0],
      ] as [number, number][],
    };
    expect(worded(validateRoomShell(shell))).toEqual([{ path: 'outline', message: 'needs at least 3 corners (has 2)' }]);
  });

  it('refuses a zero-length wall and names the repeated corner', () => {
    expect(
      problems({
        outline: [
          [0, 0],
          [3000, 0],
          [3000, 0],
          [0, 3000],
        ],
      }),
    ).toEqual([{ path: 'room.outline[2]', message: 'wall 1 has zero length (corner 2 repeats corner 1)' }]);
  });

  it('refuses a self-crossing outline', () => {
    expect(
      problems({
        outline: [
          [0, 0],
          [3000, 0],
          [0, 3000],
          [3000, 3000],
        ],
      }),
    ).toEqual([{ path: 'room.outline', message: 'wall 1 crosses wall 3' }]);
  });

  it('lists at most 20 crossings of a 200-corner star whose every wall crosses nearly all others', () => {
    const found = problems({ outline: starOutline(200) });
    expect(found).toHaveLength(20);
    expect(found[0]).toEqual({ path: 'room.outline', message: 'wall 0 crosses wall 2' });
  });

  it('refuses an opening longer than its wall', () => {
    expect(problems({ openings: [{ id: 'p1', type: 'passage', wall: 1, offset: 100, width: 3200, height: 2000 }] })).toEqual([
      { path: 'room.openings[0].width', message: 'longer than wall 1 (3000 mm) less 50 mm at each corner' },
    ]);
  });

  it('refuses an opening that runs past its wall end or crowds a corner', () => {
    const base = { id: 'w1', type: 'window' as const, wall: 0, width: 1000, height: 1000, sill: 900 };
    expect(problems({ openings: [{ ...base, offset: 2000 }] })[0]).toEqual({
      path: 'room.openings[0].offset',
      message: 'runs past the end of wall 0 (3000 mm): ends at 3000 mm, at most 2950 mm',
    });
    expect(problems({ openings: [{ ...base, offset: 20 }] })[0].path).toBe('room.openings[0].offset');
    expect(problems({ openings: [{ ...base, offset: 1950 }] })).toEqual([]);
  });

  it('refuses overlapping openings on one wall but not on different walls', () => {
    const a = { id: 'w1', type: 'window' as const, wall: 0, offset: 200, width: 1000, height: 1000, sill: 900 };
    const b = { id: 'w2', type: 'window' as const, wall: 0, offset: 1100, width: 1000, height: 1000, sill: 900 };
    expect(problems({ openings: [a, b] })).toEqual([
      { path: 'room.openings[1].offset', message: 'overlaps w1 (openings[0]) on wall 0' },
    ]);
    expect(problems({ openings: [a, { ...b, wall: 1 }] })).toEqual([]);
    expect(problems({ openings: [a, { ...b, offset: 1200 }] })).toEqual([]);
    const wide = { id: 'p1', type: 'passage' as const, wall: 1, offset: 100, width: 2500, height: 2000 };
    const small = (id: string, offset: number) => ({
      id,
      type: 'window' as const,
      wall: 1,
      offset,
      width: 300,
      height: 500,
      sill: 900,
    });
    expect(problems({ openings: [wide, small('s1', 500), small('s2', 1500)] }).map((p) => p.message)).toEqual([
      'overlaps p1 (openings[0]) on wall 1',
      'overlaps p1 (openings[0]) on wall 1',
    ]);
  });

  it('refuses a window head above the wall and a door taller than the wall', () => {
    const found = problems({
      wallHeight: 2400,
      openings: [
        { id: 'w1', type: 'window', wall: 0, offset: 200, width: 1000, height: 1600, sill: 900 },
        { id: 'd1', type: 'door', wall: 1, offset: 200, width: 800, height: 2500, hinge: 'end', swing: 'out' },
      ],
    });
    expect(found.map((p) => p.path)).toEqual(['room.openings[0].height', 'room.openings[1].height']);
    expect(found[0].message).toContain('above the wall height (2400 mm)');
  });

  it('refuses an opening on a wall that does not exist', () => {
    expect(problems({ openings: [{ id: 'p1', type: 'passage', wall: 4, offset: 100, width: 900, height: 2000 }] })).toEqual([
      { path: 'room.openings[0].wall', message: 'there is no wall 4 (the outline has 4 walls, 0 to 3)' },
    ]);
  });

  it('refuses more thickness overrides than walls', () => {
    expect(problems({ wallThicknesses: [100, 100, 100, 100, 100] })[0].path).toBe('room.wallThicknesses');
  });

  it('carries each problem’s facts as values for screens that word them in their own unit', () => {
    const shell = roomShellSchema.parse({
      outline: [
        [0, 0],
        [3000, 0],
        [3000, 3000],
        [0, 3000],
      ],
      wallHeight: 2400,
      openings: [
        { id: 'w1', type: 'window', wall: 1, offset: 500, width: 1000, height: 1300, sill: 1500 },
        { id: 'd1', type: 'door', wall: 2, offset: 2500, width: 800, height: 2000, hinge: 'start', swing: 'in' },
      ],
    });
    const [head, end] = validateRoomShell(shell);
    expect(head).toMatchObject({
      rule: 'window-above-ceiling',
      field: 'height',
      opening: 0,
      wall: 1,
      sillMm: 1500,
      heightMm: 1300,
      valueMm: 2800,
      limitMm: 2400,
    });
    // 3000 mm wall less the 50 mm corner margin less the 800 mm door: the offset may be at most 2150 mm.
    expect(end).toMatchObject({ rule: 'opening-past-end', field: 'offset', opening: 1, wall: 2, valueMm: 2500, limitMm: 2150 });
  });
});
