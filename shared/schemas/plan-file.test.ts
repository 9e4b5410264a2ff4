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
    const result = readPlanFile(withRoom((room) => {
      delete room.wallHeight;
      delete room.wallThickness;
    }));
    expect(result.ok && [result.plan.room.wallHeight, result.plan.room.wallThickness]).toEqual([2600, 100]);
  });

  it('names the field of a schema error', () => {
    const result = readPlanFile(withRoom((room) => {
      (room.openings as Record<string, unknown>[])[1].width = -5;
    }));
    expect(result).toEqual({ ok: false, errors: ['room.openings[1].width: must be more than 0 mm'] });
  });

  it('names the field of a geometry error', () => {
    const result = readPlanFile(withRoom((room) => {
      (room.openings as Record<string, unknown>[])[1].width = 5000;
    }));
    expect(result).toEqual({ ok: false, errors: ['room.openings[1].width: longer than wall 2 (4200 mm) less 50 mm at each corner'] });
  });

  it('refuses broken JSON, another format and another version', () => {
    expect(readPlanFile('{"format": ').ok).toBe(false);
    expect(readPlanFile({ format: 'something-else', version: 1 })).toEqual({ ok: false, errors: ['format: must be "parlour-plan"'] });
    const future = readPlanFile({ ...JSON.parse(example), version: 2 });
    expect(!future.ok && future.errors[0]).toMatch(/^version: must be 1/);
  });

  it('refuses a piece with a non-positive size', () => {
    const plan = JSON.parse(example);
    plan.option.pieces[0].depth = 0;
    expect(readPlanFile(plan)).toEqual({ ok: false, errors: ['option.pieces[0].depth: must be more than 0 mm'] });
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
    expect(() => writePlanFile({ room: { name: 'x', outline: [[0, 0]], openings: [] }, option: { name: 'A', pieces: [] } })).toThrow();
    const crossing = { name: 'x', outline: [[0, 0], [3000, 0], [0, 3000], [3000, 3000]] as [number, number][] };
    expect(() => writePlanFile({ room: crossing, option: { name: 'A' } })).toThrow('room.outline: wall 1 crosses wall 3');
  });
});
