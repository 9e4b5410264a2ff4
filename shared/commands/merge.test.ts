// Tests for merging two people's edits of one room: mergeShell (ceiling height, child's room, openings, outline,
// falling back to mine when the result cannot be drawn) and mergeOptionDoc (pieces, finishes, seen marks).
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import { optionDocSchema } from '../schemas/option';
import { mergeOptionDoc, mergeShell } from './merge';

const base = roomShellSchema.parse({
  wallHeight: 2600,
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 300, width: 826, height: 2040, hinge: 'start', swing: 'in' }],
});

describe('mergeShell', () => {
  it('keeps my child’s room mark beside their ceiling height, and theirs when I left it alone', () => {
    const merged = mergeShell(base, { ...base, childRoom: true }, { ...base, wallHeight: 2500 });
    expect([merged.childRoom, merged.wallHeight]).toEqual([true, 2500]);
    expect(mergeShell(base, { ...base, wallHeight: 2500 }, { ...base, childRoom: true }).childRoom).toBe(true);
  });

  it('keeps my ceiling height and their new window', () => {
    const mine = { ...base, wallHeight: 2700 };
    const theirs = {
      ...base,
      openings: [
        ...base.openings,
        { id: 'w1', type: 'window' as const, wall: 2, offset: 1000, width: 1200, height: 1200, sill: 900 },
      ],
    };
    const merged = mergeShell(base, mine, theirs);
    expect(merged.wallHeight).toBe(2700);
    expect(merged.openings.map((o) => o.id)).toEqual(['d1', 'w1']);
  });

  it('my moved door wins over their untouched one; their outline change stays when I did not touch the outline', () => {
    const mine = { ...base, openings: [{ ...base.openings[0], offset: 900 }] };
    const theirs = {
      ...base,
      outline: [
        [0, 0],
        [4500, 0],
        [4500, 3000],
        [0, 3000],
      ] as [number, number][],
    };
    const merged = mergeShell(base, mine, theirs);
    expect(merged.openings[0].offset).toBe(900);
    expect(merged.outline[1]).toEqual([4500, 0]);
  });

  it('an opening I removed stays removed; one I added is kept', () => {
    const mine = { ...base, openings: [{ id: 'p1', type: 'passage' as const, wall: 1, offset: 500, width: 900, height: 2100 }] };
    const merged = mergeShell(base, mine, base);
    expect(merged.openings.map((o) => o.id)).toEqual(['p1']);
  });

  it('falls back to mine when the combination cannot be drawn', () => {
    // They shortened wall 0 to 1000 mm; I widened the door to 1500 mm: together the door no longer fits.
    const mine = { ...base, openings: [{ ...base.openings[0], width: 1500 }] };
    const theirs = {
      ...base,
      outline: [
        [0, 0],
        [1000, 0],
        [1000, 3000],
        [0, 3000],
      ] as [number, number][],
    };
    expect(mergeShell(base, mine, theirs)).toBe(mine);
  });
});

describe('mergeOptionDoc', () => {
  const doc = optionDocSchema.parse({
    pieces: [
      { id: 'sofa', name: 'Sofa', x: 1000, y: 1000, width: 2000, depth: 900, height: 850, status: 'new' },
      { id: 'bed', name: 'Bed', x: 3000, y: 2000, width: 1500, depth: 2000, height: 550, status: 'existing' },
    ],
  });

  it('my moved sofa and their recoloured bed both survive', () => {
    const mine = { ...doc, pieces: doc.pieces.map((p) => (p.id === 'sofa' ? { ...p, x: 1500 } : p)) };
    const theirs = { ...doc, pieces: doc.pieces.map((p) => (p.id === 'bed' ? { ...p, colour: '#aabbcc' } : p)) };
    const merged = mergeOptionDoc(doc, mine, theirs);
    expect(merged.pieces.find((p) => p.id === 'sofa')?.x).toBe(1500);
    expect(merged.pieces.find((p) => p.id === 'bed')?.colour).toBe('#aabbcc');
  });

  it('merges finishes surface by surface', () => {
    const mine = { ...doc, finishes: { ...doc.finishes, floor: 'oak', wallOverrides: { '2': 'sage' } } };
    const theirs = { ...doc, finishes: { ...doc.finishes, ceiling: 'white' } };
    const merged = mergeOptionDoc(doc, mine, theirs);
    expect(merged.finishes).toEqual({ floor: 'oak', ceiling: 'white', walls: null, wallOverrides: { '2': 'sage' } });
  });

  it('merges seen marks finding by finding: my new and removed marks and their changed note all count', () => {
    const at = '2026-12-03T14:00:00.000Z';
    const base = {
      ...doc,
      seen: [
        { key: 'kept', note: 'old', at },
        { key: 'dropped', note: '', at },
      ],
    };
    const mine = {
      ...base,
      seen: [
        { key: 'kept', note: 'old', at },
        { key: 'mine', note: 'new here', at },
      ],
    };
    const theirs = {
      ...base,
      seen: [
        { key: 'kept', note: 'their note', at },
        { key: 'dropped', note: '', at },
        { key: 'theirs', note: '', at },
      ],
    };
    expect(mergeOptionDoc(base, mine, theirs).seen).toEqual([
      { key: 'kept', note: 'their note', at },
      { key: 'theirs', note: '', at },
      { key: 'mine', note: 'new here', at },
    ]);
  });
});
