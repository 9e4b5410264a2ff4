// Tests for findingKey: a piece moved, turned or listed in another order keeps its findings' keys; no two
// findings share a key on the test plans and the example plans; long keys stay bounded and distinct.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { planFileSchema } from '../../schemas/plan-file';
import type { PieceInput } from '../../schemas/option';
import type { RoomShellInput } from '../../schemas/room';
import type { Finding } from './finding';
import { FINDING_KEY_MAX_LENGTH, findingKey } from './finding-key';
import { checkFit } from './index';
import { cleanLayout, gapLayout, pieceInput, plan, walledInLayout } from './test-plans';

type Layout = { room: RoomShellInput; pieces: PieceInput[] };

function fit(layout: Layout): Finding[] {
  const { room, option } = plan(layout.room, layout.pieces);
  return checkFit(room, option.pieces);
}

/** The clean layout with a wardrobe in the door's swing over a chest, and a crate through the right wall. */
function crowdedLayout(): Layout {
  const layout = cleanLayout();
  layout.pieces.push(
    pieceInput({ id: 'b-wardrobe', name: 'Wardrobe', x: 700, y: 400, width: 800, depth: 600, height: 2000 }),
    pieceInput({ id: 'a-chest', name: 'Chest', x: 1300, y: 400, width: 600, depth: 500, height: 900 }),
    pieceInput({ id: 'crate', name: 'Crate', x: 3600, y: 2400, width: 1000, depth: 1000, height: 1000 }),
  );
  layout.pieces = layout.pieces.map((p) => (p.id === 'sofa' ? { ...p, height: 950 } : p));
  return layout;
}

function moved(layout: Layout, id: string, change: Partial<PieceInput>): Layout {
  return { ...layout, pieces: layout.pieces.map((p) => (p.id === id ? { ...p, ...change } : p)) };
}

const keysOf = (findings: readonly Finding[]) => findings.map(findingKey);

const examplePlans = ['living-room.json', 'l-shaped-living-room.json', 'bedroom.json'].map((name) => {
  const file = planFileSchema.parse(JSON.parse(readFileSync(new URL(`../../../assets/plans/${name}`, import.meta.url), 'utf8')));
  return { name, findings: checkFit(file.room, file.option.pieces) };
});

describe('findingKey', () => {
  it('keeps a finding’s key when its piece moves a little and the finding stays', () => {
    const before = fit(gapLayout());
    // The bed slides 50 mm down and the chest 30 mm up: the gap between them is still 620 mm wide.
    const after = fit(moved(moved(gapLayout(), 'bed', { y: 2250 }), 'chest', { y: 1970 }));
    expect(before.map((f) => f.kind)).toEqual(['narrow-walkway']);
    expect(after[0]?.at).not.toEqual(before[0]?.at);
    expect(keysOf(after)).toEqual(keysOf(before));
  });

  it('keeps the keys of a crowded layout when the crate moves and turns, and when pieces are listed in another order', () => {
    const before = fit(crowdedLayout());
    const after = fit(moved(crowdedLayout(), 'crate', { x: 3650, y: 2350, rotation: 10 }));
    expect(new Set(keysOf(after))).toEqual(new Set(keysOf(before)));
    const reordered = crowdedLayout();
    reordered.pieces.reverse();
    expect(new Set(keysOf(fit(reordered)))).toEqual(new Set(keysOf(before)));
  });

  it('gives every finding its own key on each test plan and example plan', () => {
    const plans: { name: string; findings: Finding[] }[] = [
      { name: 'crowded', findings: fit(crowdedLayout()) },
      { name: 'gap', findings: fit(gapLayout()) },
      { name: 'walled in', findings: fit(walledInLayout()) },
      ...examplePlans,
    ];
    // The crowded layout has findings of five kinds, so the check is not of empty lists.
    expect(plans[0]!.findings.length).toBeGreaterThanOrEqual(6);
    for (const { name, findings } of plans) {
      const keys = keysOf(findings);
      expect({ name, unique: new Set(keys).size }).toEqual({ name, unique: keys.length });
    }
  });

  it('tells apart findings that name the same pieces about different ones, and kinds about the same piece', () => {
    const reachBed: Finding = { kind: 'narrow-walkway', pieces: ['bed', 'chest'], openings: [], message: '' };
    const reachChest: Finding = { ...reachBed, pieces: ['chest', 'bed'] };
    expect(findingKey(reachBed)).not.toBe(findingKey(reachChest));
    expect(findingKey({ ...reachBed, kind: 'unreachable' })).not.toBe(findingKey(reachBed));
    // The other ids and the openings are sorted: their order in the finding does not matter.
    const swing: Finding = { kind: 'door-swing', pieces: ['sofa', 'b', 'a'], openings: ['d2', 'd1'], message: '' };
    expect(findingKey(swing)).toBe(findingKey({ ...swing, pieces: ['sofa', 'a', 'b'], openings: ['d1', 'd2'] }));
    // An id holding the characters the key is written with cannot run into the next one.
    expect(findingKey({ ...swing, pieces: ['a","b'], openings: [] })).not.toBe(
      findingKey({ ...swing, pieces: ['a', 'b'], openings: [] }),
    );
  });

  it('bounds a key naming many long ids and still tells two such findings apart', () => {
    const doors = Array.from({ length: 60 }, (_, i) => `door-${String(i).padStart(2, '0')}-${'x'.repeat(90)}`);
    const one: Finding = { kind: 'unreachable', pieces: ['cabinet'], openings: doors, message: '' };
    // The same doors but the last one: the two keys differ only past their readable head.
    const other: Finding = { ...one, openings: [...doors.slice(0, -1), 'door-99'] };
    expect(findingKey(one).length).toBeLessThanOrEqual(FINDING_KEY_MAX_LENGTH);
    expect(findingKey(one)).toBe(findingKey({ ...one, openings: [...doors].reverse() }));
    expect(findingKey(one)).not.toBe(findingKey(other));
  });
});
