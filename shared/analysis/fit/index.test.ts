// Tests for checkFit as a whole: nothing on a clean layout, every finding kind on a crowded one in a
// steady order, each a valid finding, and the default walkway width.
import { describe, expect, it } from 'vitest';
import { findingSchema } from './finding';
import { checkFit } from './index';
import { cleanLayout, gapLayout, pieceInput, plan } from './test-plans';

function fit(layout: ReturnType<typeof cleanLayout>, walkwayMm?: number) {
  const { room, option } = plan(layout.room, layout.pieces);
  return checkFit(room, option.pieces, walkwayMm === undefined ? {} : { walkwayMm });
}

describe('checkFit', () => {
  it('finds nothing on a clean layout', () => {
    expect(fit(cleanLayout())).toEqual([]);
  });

  it('reports every kind on a crowded layout, by kind then piece id, each a valid finding', () => {
    const layout = cleanLayout();
    layout.pieces.push(
      // In the door's swing (x 300–1220, y 0–920) and overlapping the wardrobe beside it.
      pieceInput({ id: 'b-wardrobe', name: 'Wardrobe', x: 700, y: 400, width: 800, depth: 600, height: 2000 }),
      pieceInput({ id: 'a-chest', name: 'Chest', x: 1300, y: 400, width: 600, depth: 500, height: 900 }),
      // 100 mm through the right wall, 1000 × 1000 × 1000: too big for a 920 mm door (869.2 clear).
      pieceInput({ id: 'crate', name: 'Crate', x: 3600, y: 2400, width: 1000, depth: 1000, height: 1000 }),
    );
    // The sofa grows past the sill (800 → 950 mm).
    layout.pieces = layout.pieces.map((p) => (p.id === 'sofa' ? { ...p, height: 950 } : p));
    const findings = fit(layout);
    for (const finding of findings) findingSchema.parse(finding);
    const kinds = findings.map((f) => f.kind);
    for (const kind of ['overlap', 'outside-room', 'door-swing', 'window-blocked', 'too-big-for-door'] as const)
      expect(kinds).toContain(kind);
    expect(findings.find((f) => f.kind === 'overlap')?.pieces).toEqual(['a-chest', 'b-wardrobe']);
    expect(findings.filter((f) => f.kind === 'door-swing').map((f) => f.pieces[0])).toEqual(['a-chest', 'b-wardrobe']);
    expect(findings.find((f) => f.kind === 'outside-room')?.pieces).toEqual(['crate']);
    expect(findings.find((f) => f.kind === 'window-blocked')?.pieces).toEqual(['sofa']);
    expect(findings.find((f) => f.kind === 'too-big-for-door')?.pieces).toEqual(['crate']);
    const order = [
      'overlap',
      'outside-room',
      'door-swing',
      'cannot-open',
      'window-blocked',
      'narrow-walkway',
      'unreachable',
      'too-big-for-door',
      'climbable-near-window',
      'tall-not-fixed',
    ];
    const ranks = findings.map((f) => order.indexOf(f.kind));
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
    // The same layout checked again reads the same.
    expect(fit(layout)).toEqual(findings);
  });

  it('uses 900 mm as the walkway width unless told otherwise', () => {
    expect(fit(gapLayout(850)).map((f) => f.kind)).toEqual(['narrow-walkway']);
    expect(fit(gapLayout(850), 800)).toEqual([]);
    expect(fit(gapLayout(850))[0].requiredMm).toBe(900);
  });
});
