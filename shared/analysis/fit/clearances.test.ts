// Tests for the reach widths the fit check asks beside each kind of piece, against the published
// clearance figures (exactly converted from inches), and their use in the walkway check.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { BED_SIDE_MM, BEHIND_DINER_MM, COFFEE_TABLE_REACH_MM, reachWidthMm } from './clearances';
import { gapLayout, plan } from './test-plans';
import { findWalkwayProblems } from './walkway';

describe('reach widths by piece', () => {
  it('uses the published figures, exactly converted', () => {
    // HUD MAP vol. 4 (1973): 22 in beside a bed; NKBA guideline 8: 32 in behind a seated diner; 1 in = 25.4 mm (NIST SP 811).
    expect(BED_SIDE_MM).toBeCloseTo(558.8, 9);
    expect(BEHIND_DINER_MM).toBeCloseTo(812.8, 9);
    expect(reachWidthMm({ kind: 'bed', name: 'Our bed' }, 900)).toBeCloseTo(558.8, 9);
    expect(reachWidthMm({ name: 'Double bed' }, 900)).toBeCloseTo(558.8, 9);
    expect(reachWidthMm({ kind: 'dining-set', name: 'Table' }, 900)).toBeCloseTo(812.8, 9);
    expect(reachWidthMm({ name: 'Coffee table' }, 900)).toBe(COFFEE_TABLE_REACH_MM);
    expect(reachWidthMm({ name: 'Wardrobe' }, 900)).toBe(900);
    // Never more than the walkway the designer asked for.
    expect(reachWidthMm({ name: 'Double bed' }, 500)).toBe(500);
  });

  it('a bed reached through a 620 mm gap is fine; a chest there is not; a bed through 500 mm is not', () => {
    const find = (gapMm: number, name: string) => {
      const layout = gapLayout(gapMm);
      const pieces = layout.pieces.map((p) => (p.id === 'chest' ? { ...p, name } : p));
      const { room, option } = plan(layout.room, pieces);
      return findWalkwayProblems(room, placedBoxes(option.pieces), 900).filter((f) => f.pieces[0] === 'chest');
    };
    expect(find(620, 'Day bed')).toEqual([]);
    expect(find(620, 'Chest')).toHaveLength(1);
    const [narrow] = find(500, 'Day bed');
    expect(narrow.kind).toBe('narrow-walkway');
    expect(narrow.requiredMm).toBe(560);
  });
});
