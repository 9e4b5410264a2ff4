// Tests for plan files, starting from the example in assets/plans/living-room.json: reading with
// defaults, errors naming their field, the same caps and bounds as the API, and writing back.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readPlanFile, writePlanFile } from './plan-file';

const example = readFileSync(new URL('../../assets/plans/living-room.json', import.meta.url), 'utf8');

function withRoom(change: (room: Record<string, unknown>) => void): unknown {
  const plan = JSON.parse(example) as { room: Record<string, unknown> };
  change(plan.room);
  return plan;
}

describe('readPlanFile', () => {
  it('reads the example and fills in defaults', () => {
    const result = readPlanFile(example);
    if (!result.ok) throw new Error(result.errors.join('\n'));
    expect(result.plan.room.name).toBe('Living room');
    expect(result.plan.room.openings).toHaveLength(3);
    expect(result.plan.option.pieces[0].rotation).toBe(180);
    expect(result.plan.option.pieces[0].placed).toBe(true);
  });

  it('fills defaults for wall height and thickness', () => {
    const result = readPlanFile(
      withRoom((room) => {
        delete room.wallHeight;
        delete room.wallThickness;
      }),
    );
    expect(result.ok && [result.plan.room.wallHeight, result.plan.room.wallThickness]).toEqual([2600, 100]);
  });

  it('reads a version 1 file without the child’s room mark or fixed pieces as before, and with them', () => {
    const before = readPlanFile(example);
    expect(before.ok && [before.plan.room.childRoom, 'fixedToWall' in before.plan.option.pieces[0]!]).toEqual([false, false]);
    const plan = JSON.parse(example) as { room: Record<string, unknown>; option: { pieces: Record<string, unknown>[] } };
    plan.room.childRoom = true;
    plan.option.pieces[0]!.fixedToWall = true;
    const marked = readPlanFile(plan);
    if (!marked.ok) throw new Error(marked.errors.join('\n'));
    expect([marked.plan.room.childRoom, marked.plan.option.pieces[0]!.fixedToWall]).toEqual([true, true]);
    expect(readPlanFile(writePlanFile(marked.plan))).toEqual(marked);
    plan.room.childRoom = 'yes';
    expect(readPlanFile(plan)).toEqual({
      ok: false,
      errors: ['room.childRoom: Invalid input: expected boolean, received string'],
    });
  });

  it('names the field of a schema error', () => {
    const result = readPlanFile(
      withRoom((room) => {
        (room.openings as Record<string, unknown>[])[1].width = -5;
      }),
    );
    expect(result).toEqual({ ok: false, errors: ['room.openings[1].width: must be more than 0 mm'] });
  });

  it('names the field of a geometry error', () => {
    const result = readPlanFile(
      withRoom((room) => {
        (room.openings as Record<string, unknown>[])[1].width = 5000;
      }),
    );
    expect(result).toEqual({
      ok: false,
      errors: ['room.openings[1].width: longer than wall 2 (4200 mm) less 50 mm at each corner'],
    });
  });

  it('refuses broken JSON, another format and another version', () => {
    expect(readPlanFile('{"format": ').ok).toBe(false);
    expect(readPlanFile({ format: 'something-else', version: 1 })).toEqual({
      ok: false,
      errors: ['format: must be "parlour-plan"'],
    });
    const future = readPlanFile({ ...JSON.parse(example), version: 2 });
    expect(!future.ok && future.errors[0]).toMatch(/^version: must be 1/);
  });

  it('refuses a piece with a non-positive size', () => {
    const plan = JSON.parse(example);
    plan.option.pieces[0].depth = 0;
    expect(readPlanFile(plan)).toEqual({ ok: false, errors: ['option.pieces[0].depth: must be more than 0 mm'] });
  });
});

describe('readPlanFile: the same caps and bounds as the API', () => {
  const square = (sideMm: number): [number, number][] => [
    [0, 0],
    [sideMm, 0],
    [sideMm, sideMm],
    [0, sideMm],
  ];

  it('refuses more than 200 corners, 60 openings or 400 pieces before any geometry, naming the field', () => {
    const corners = Array.from({ length: 201 }, (_, i): [number, number] => [
      Math.round(3000 * Math.cos((2 * Math.PI * i) / 201)),
      Math.round(3000 * Math.sin((2 * Math.PI * i) / 201)),
    ]);
    expect(
      readPlanFile(
        withRoom((room) => {
          room.outline = corners;
          room.openings = [];
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.outline: has more than 200 corners (a room has at most 200)'] });
    const windows = Array.from({ length: 61 }, (_, i) => ({
      id: `w${i}`,
      type: 'window',
      wall: 0,
      offset: 60 + i * 60,
      width: 50,
      height: 1000,
      sill: 900,
    }));
    expect(
      readPlanFile(
        withRoom((room) => {
          room.openings = windows;
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.openings: has more than 60 openings (a room has at most 60)'] });
    const plan = JSON.parse(example);
    plan.option.pieces = Array.from({ length: 401 }, (_, i) => ({ ...plan.option.pieces[0], id: `p${i}` }));
    expect(readPlanFile(plan)).toEqual({
      ok: false,
      errors: ['option.pieces: has more than 400 pieces (an option has at most 400)'],
    });
  });

  it('refuses an outline over 50 m a side or 1,000 m², and numbers beyond their bounds', () => {
    expect(
      readPlanFile(
        withRoom((room) => {
          room.outline = [
            [0, 0],
            [50_001, 0],
            [50_001, 100],
            [0, 100],
          ];
          room.openings = [];
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.outline: is 50,001 mm × 100 mm, more than 50 m × 50 m'] });
    expect(
      readPlanFile(
        withRoom((room) => {
          room.outline = square(31_700);
          room.openings = [];
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.outline: encloses 1,005 m², more than 1,000 m²'] });
    expect(
      readPlanFile(
        withRoom((room) => {
          room.outline = square(31_600);
          room.openings = [];
        }),
      ).ok,
    ).toBe(true);
    expect(
      readPlanFile(
        withRoom((room) => {
          room.wallHeight = 1e300;
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.wallHeight: must be at most 20,000 mm'] });
    expect(
      readPlanFile(
        '{"format":"parlour-plan","version":1,"room":{"name":"x","outline":[[0,0],[1e400,0],[0,1000]]},"option":{"name":"A"}}',
      ),
    ).toEqual({ ok: false, errors: ['room.outline[1][0]: must be a finite number (mm)'] });
  });

  it('takes the API’s name and note limits, and an empty room name for the import to fill in', () => {
    expect(
      readPlanFile(
        withRoom((room) => {
          room.name = 'R'.repeat(81);
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.name: Keep the name under 80 characters.'] });
    expect(
      readPlanFile(
        withRoom((room) => {
          room.name = 'Living\u0000room';
        }),
      ),
    ).toEqual({ ok: false, errors: ['room.name: Remove control characters and text-direction marks.'] });
    expect(
      readPlanFile(
        withRoom((room) => {
          room.name = '  ';
        }),
      ).ok,
    ).toBe(true);
    const plan = JSON.parse(example);
    plan.option.note = 'n'.repeat(2001);
    expect(readPlanFile(plan)).toEqual({ ok: false, errors: ['option.note: Keep the note under 2,000 characters.'] });
  });
});

describe('writePlanFile', () => {
  it('writes a file that reads back the same', () => {
    const first = readPlanFile(example);
    if (!first.ok) throw new Error('example must read');
    const text = writePlanFile(first.plan);
    expect(text.startsWith('{\n  "format": "parlour-plan",\n  "version": 1,')).toBe(true);
    const again = readPlanFile(text);
    expect(again).toEqual(first);
  });

  it('refuses to write a plan its own reader would refuse', () => {
    expect(() =>
      writePlanFile({ room: { name: 'x', outline: [[0, 0]], openings: [] }, option: { name: 'A', pieces: [] } }),
    ).toThrow();
    const crossing = {
      name: 'x',
      outline: [
        [0, 0],
        [3000, 0],
        [0, 3000],
        [3000, 3000],
      ] as [number, number][],
    };
    expect(() => writePlanFile({ room: crossing, option: { name: 'A' } })).toThrow('room.outline: wall 1 crosses wall 3');
  });
});
