// Tests for where each piece is reached from: tables, desks and ottomans from any side, a seat from a
// stretch of its front as wide as a person, a sofa with its coffee table as one layout, and a bed
// from a long side (a double from both), with HUD's worked figures; a piece standing on another is
// used where the piece below it is.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { BED_LEAST_USED_SIDE_MM, BED_SIDE_MM, DOUBLE_BED_MIN_WIDTH_MM, PERSON_WIDTH_MM } from './clearances';
import { gapLayout, pieceInput, plan } from './test-plans';
import { findWalkwayProblems } from './walkway';
import type { PieceInput } from '../../schemas/option';

/** Walkway findings as "piece kind measured/required" for pieces in the 4 × 4 m gap room (door in the top wall, x 2800–3620). */
function findings(pieces: PieceInput[], room = gapLayout().room): string[] {
  const { room: shell, option } = plan(room, pieces);
  return findWalkwayProblems(shell, placedBoxes(option.pieces), 900).map(
    (f) => `${f.pieces[0]} ${f.kind}${f.measuredMm === undefined ? '' : ` ${f.measuredMm}/${f.requiredMm}`}`,
  );
}
// A sofa against the bottom wall facing up: x 1000–3000, y 3100–4000.
const sofa = pieceInput({
  id: 'sofa',
  name: 'Sofa',
  kind: 'sofa',
  x: 2000,
  y: 3550,
  width: 2000,
  depth: 900,
  height: 850,
  rotation: 180,
});

describe('tables, desks and ottomans are used from any side', () => {
  it('a dining table past the 620 mm gap is reached from its side facing the door; a sideboard there is not', () => {
    // The gap plan's chest (x 2620–4000, y 1750–2250) faces the bottom half, past the 620 mm gap; its back faces the door.
    const swap = (fields: Partial<PieceInput>) => gapLayout().pieces.map((p) => (p.id === 'chest' ? { ...p, ...fields } : p));
    expect(findings(swap({ kind: 'dining-table' }))).toEqual([]);
    expect(findings(swap({ kind: 'desk' }))).toEqual([]);
    expect(findings(swap({ kind: 'ottoman' }))).toEqual([]);
    expect(findings(swap({ kind: 'sideboard' }))).toEqual(['chest narrow-walkway 620/900']);
  });

  it('a desk shut in on every side is unreachable', () => {
    const layout = {
      room: gapLayout().room,
      // A desk (x 3000–3800, y 0–500) boxed in by the walls and a wardrobe across its front and end.
      pieces: [
        pieceInput({ id: 'desk', name: 'Desk', kind: 'desk', x: 3400, y: 250, width: 800, depth: 500, height: 740 }),
        pieceInput({
          id: 'wardrobe',
          name: 'Wardrobe',
          kind: 'wardrobe',
          x: 3300,
          y: 800,
          width: 1400,
          depth: 600,
          height: 2000,
        }),
        pieceInput({
          id: 'bookcase',
          name: 'Bookcase',
          kind: 'bookcase',
          x: 2750,
          y: 250,
          width: 500,
          depth: 300,
          height: 2000,
          rotation: 90,
        }),
      ],
    };
    layout.room = {
      ...layout.room,
      openings: [{ id: 'd1', type: 'door', wall: 3, offset: 1000, width: 820, height: 2040, hinge: 'start', swing: 'out' }],
    };
    expect(findings(layout.pieces, layout.room)).toContain('desk unreachable');
  });
});

describe('a seat is reached from a stretch of its front as wide as a person', () => {
  it('takes a person as 600 mm wide (common practice)', () => {
    expect(PERSON_WIDTH_MM).toBe(600);
  });

  // A block 700 mm high (no low table) standing against the sofa's front from its left end, leaving freeMm open at the right end.
  const crowded = (freeMm: number) => [
    sofa,
    pieceInput({
      id: 'block',
      name: 'Block',
      x: 1000 + (2000 - freeMm) / 2,
      y: 2900,
      width: 2000 - freeMm,
      depth: 400,
      height: 700,
    }),
  ];

  it('a sofa with only 200 mm of its front clear cannot be sat on from there', () => {
    expect(findings(crowded(200)).filter((f) => f.startsWith('sofa'))).toEqual(['sofa unreachable']);
  });

  it('800 mm clear at the end of its front, open to the room, is enough', () => {
    expect(findings(crowded(800)).filter((f) => f.startsWith('sofa'))).toEqual([]);
  });
});

describe('a sofa and its coffee table at the usual distance are one layout', () => {
  // A coffee table as wide as the sofa, gapMm in front of it (35–45 cm is usual, common practice).
  const withTable = (gapMm: number) => [
    sofa,
    pieceInput({
      id: 'table',
      name: 'Coffee table',
      kind: 'coffee-table',
      x: 2000,
      y: 3100 - gapMm - 300,
      width: 2000,
      depth: 600,
      height: 420,
    }),
  ];

  it('at 40 cm neither the sofa nor the table is a narrow walkway: the sofa is reached round the table', () => {
    expect(findings(withTable(400))).toEqual([]);
    expect(findings(withTable(350))).toEqual([]);
  });

  it('at 60 cm the gap is a walkway again, and too narrow to reach the sofa by', () => {
    expect(findings(withTable(600))).toEqual(['sofa narrow-walkway 600/900']);
  });
});

describe('a bed is reached from a long side; a double from both', () => {
  it('uses HUD’s 22 in on the side people use and 12 in on a double’s least-used side, and 120 cm for a double', () => {
    // HUD Manual of Acceptable Practices vol. 4 (1973): 22 in = 558.8 mm, 12 in = 304.8 mm (1 in = 25.4 mm, NIST SP 811).
    expect(BED_SIDE_MM).toBeCloseTo(558.8, 9);
    expect(BED_LEAST_USED_SIDE_MM).toBeCloseTo(304.8, 9);
    // The UK small double, 120 × 190 cm (National Bed Federation sizes), the narrowest double.
    expect(DOUBLE_BED_MIN_WIDTH_MM).toBe(1200);
  });

  /** A bed 2000 mm long, head against the bottom wall (foot towards the door), its left long side gapMm from the left wall. */
  const bedFromWall = (width: number, gapMm: number, more: PieceInput[] = []) =>
    findings([
      pieceInput({
        id: 'bed',
        name: 'Bed',
        kind: 'bed',
        x: gapMm + width / 2,
        y: 3000,
        width,
        depth: 2000,
        height: 550,
        rotation: 180,
      }),
      ...more,
    ]).filter((f) => f.startsWith('bed'));

  it('a double (160 cm) needs its second side at 12 in: 60 cm and 32 cm pass, 25 cm is short, against the wall is unreachable', () => {
    expect(bedFromWall(1600, 600)).toEqual([]);
    expect(bedFromWall(1600, 320)).toEqual([]);
    expect(bedFromWall(1600, 250)).toEqual(['bed narrow-walkway 250/300']);
    expect(bedFromWall(1600, 0)).toEqual(['bed unreachable']);
  });

  it('a single (90 cm) may stand against the wall; shut in on both long sides it needs 22 in on one', () => {
    expect(bedFromWall(900, 0)).toEqual([]);
    // A wardrobe 500 mm past its right side (x 1900–2500), the left side 500 mm from the wall.
    const wardrobe = pieceInput({
      id: 'wardrobe',
      name: 'Wardrobe',
      kind: 'wardrobe',
      x: 2200,
      y: 3000,
      width: 2000,
      depth: 600,
      height: 2000,
      rotation: 90,
    });
    expect(bedFromWall(900, 500, [wardrobe])).toEqual(['bed narrow-walkway 500/560']);
  });

  it('the foot no longer counts: a double with its foot against a chest is reached from its sides', () => {
    const chest = pieceInput({
      id: 'chest',
      name: 'Chest',
      kind: 'chest-of-drawers',
      x: 1600,
      y: 1750,
      width: 1600,
      depth: 500,
      height: 800,
      rotation: 180,
    });
    expect(bedFromWall(1600, 800, [chest])).toEqual([]);
  });
});

describe('a piece standing on another is used where that one is', () => {
  // A side table against the left wall (x 0–500, y 1000–1500, its front facing +x) with a lamp on it
  // whose front faces the wall: on its own, the lamp's front patch would be the table's top and the wall.
  const table = pieceInput({
    id: 'table',
    name: 'Side table',
    kind: 'side-table',
    x: 250,
    y: 1250,
    width: 500,
    depth: 500,
    height: 550,
    rotation: 270,
  });
  const lamp = pieceInput({
    id: 'lamp',
    name: 'Lamp',
    kind: 'table-lamp',
    x: 250,
    y: 1250,
    width: 300,
    depth: 300,
    height: 450,
    elevation: 550,
    rotation: 90,
  });

  it('a lamp on a side table needs no route of its own', () => {
    expect(findings([table, lamp])).toEqual([]);
  });

  it('the same lamp hung at 1.2 m, on nothing, is judged at its height: from its own front, which faces the wall', () => {
    expect(findings([table, { ...lamp, elevation: 1200 }])).toEqual(['lamp unreachable']);
  });
});
