// Tests for the reach widths the fit check asks beside each kind of piece, against the published
// clearance figures (exactly converted from inches), and their use in the walkway check: by kind,
// never by name, and a low table with no kind before a seat used from the seat.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import {
  BED_SIDE_MM,
  BEHIND_DINER_MM,
  COFFEE_TABLE_REACH_MM,
  LOW_TABLE_MAX_HEIGHT_MM,
  reachWidthMm,
  SEAT_TO_TABLE_MAX_MM,
} from './clearances';
import { gapLayout, pieceInput, plan } from './test-plans';
import { findWalkwayProblems } from './walkway';
import type { PieceInput } from '../../schemas/option';

describe('reach widths by kind', () => {
  it('uses the published figures, exactly converted', () => {
    // HUD MAP vol. 4 (1973): 22 in beside a bed; NKBA guideline 8: 32 in behind a seated diner; 1 in = 25.4 mm (NIST SP 811).
    expect(BED_SIDE_MM).toBeCloseTo(558.8, 9);
    expect(BEHIND_DINER_MM).toBeCloseTo(812.8, 9);
    expect(reachWidthMm({ kind: 'bed' }, 900)).toBeCloseTo(558.8, 9);
    expect(reachWidthMm({ kind: 'dining-set' }, 900)).toBeCloseTo(812.8, 9);
    expect(reachWidthMm({ kind: 'dining-table' }, 900)).toBeCloseTo(812.8, 9);
    expect(reachWidthMm({ kind: 'coffee-table' }, 900)).toBe(COFFEE_TABLE_REACH_MM);
    expect(reachWidthMm({ kind: 'wardrobe' }, 900)).toBe(900);
    expect(reachWidthMm({}, 900)).toBe(900);
    // Never more than the walkway the designer asked for.
    expect(reachWidthMm({ kind: 'bed' }, 500)).toBe(500);
  });

  it('reads the kind, never the name: a piece named “Double bed” with no kind is a plain block', () => {
    const find = (fields: Partial<PieceInput>) => {
      const layout = gapLayout(620);
      const pieces = layout.pieces.map((p) => (p.id === 'chest' ? { ...p, ...fields } : p));
      const { room, option } = plan(layout.room, pieces);
      return findWalkwayProblems(room, placedBoxes(option.pieces), 900).filter((f) => f.pieces[0] === 'chest');
    };
    // The chest's front is 620 mm past the gap: enough for a side table's 300 mm, not for a walkway.
    expect(find({ kind: 'side-table' })).toEqual([]);
    expect(find({ name: 'Side table' })).toHaveLength(1);
    expect(find({ name: 'Double bed', kind: 'plain-block' })[0]?.requiredMm).toBe(900);
    expect(find({ name: 'Chest' })).toHaveLength(1);
  });
});

describe('a low table with no kind before a seat', () => {
  // A 4 × 4 m room, door in the top wall (x 2800–3620). A sofa against the bottom wall facing up
  // (y 3100–4000, x 1000–3000); a block 1000 × 400 whose front faces the sofa, gapMm from its front.
  function layout(gapMm: number, height: number): { room: ReturnType<typeof gapLayout>['room']; pieces: PieceInput[] } {
    return {
      room: gapLayout().room,
      pieces: [
        pieceInput({
          id: 'sofa',
          name: 'Sofa',
          kind: 'sofa',
          x: 2000,
          y: 3550,
          width: 2000,
          depth: 900,
          height: 850,
          rotation: 180,
        }),
        pieceInput({ id: 'pouffe', name: 'Pouffe', x: 2000, y: 3100 - gapMm - 200, width: 1000, depth: 400, height }),
      ],
    };
  }
  const findings = (gapMm: number, height: number) => {
    const { room, option } = plan(layout(gapMm, height).room, layout(gapMm, height).pieces);
    return findWalkwayProblems(room, placedBoxes(option.pieces), 900).map(
      (f) => `${f.pieces[0]} ${f.measuredMm}/${f.requiredMm}`,
    );
  };

  it('is used from the seat at the usual 35–45 cm, when no taller than a seat (480 mm, common practice)', () => {
    expect(SEAT_TO_TABLE_MAX_MM).toBe(450);
    expect(LOW_TABLE_MAX_HEIGHT_MM).toBe(480);
    expect(findings(400, 420)).toEqual([]);
    expect(findings(450, 480)).toEqual([]);
  });

  it('is a plain block needing the walkway at its front when further off or taller', () => {
    // 600 mm from the sofa: its front patch lies in the 600 mm gap.
    expect(findings(600, 420)).toEqual(['pouffe 600/900']);
    // A 700 mm block is no low table: judged by its front, which faces the 400 mm gap.
    expect(findings(400, 700)).toEqual(['pouffe 400/900']);
  });
});
