// Tests for the `cannot-open` finding: worked examples of doors, drawers and an oven's door short of
// clear floor in front, blocked by a piece, a wall or a room door's swing, and what never blocks.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { DRAWER_BACK_MM, findCannotOpen, pieceFronts } from './cannot-open';
import { findingSchema } from './finding';
import { pieceInput } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';
import { roomShellSchema, type RoomShellInput } from '../../schemas/room';

// A 4 × 4 m room with a door on the left wall (y 3000–3820 from the bottom corner, swinging out).
const room: RoomShellInput = {
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 4000],
    [0, 4000],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 3, offset: 200, width: 820, height: 2040, hinge: 'start', swing: 'out' }],
};

function check(pieces: PieceInput[], shell: RoomShellInput = room) {
  const findings = findCannotOpen(roomShellSchema.parse(shell), placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
  for (const finding of findings) findingSchema.parse(finding);
  return findings;
}

// 1200 wide: the form draws two doors (one per 600 mm at most), each 600 less a 4 mm gap = 596 mm.
// Against the top wall, front facing +y: y 0–600.
const wardrobe = pieceInput({
  id: 'wardrobe',
  name: 'Wardrobe',
  kind: 'wardrobe',
  x: 2000,
  y: 300,
  width: 1200,
  depth: 600,
  height: 2000,
});
/** A plain bed across the room whose top edge is at `edgeY`. */
const bedAt = (edgeY: number) =>
  pieceInput({ id: 'bed', name: 'Bed', x: 2000, y: edgeY + 1000, width: 1600, depth: 2000, height: 500 });

describe('pieceFronts', () => {
  it('reads a wardrobe’s doors as the form draws them, hinged away from their handles', () => {
    const fronts = pieceFronts(pieceSchema.parse(wardrobe));
    expect(fronts.map((f) => [f.motion, f.hinge, f.requiredMm])).toEqual([
      ['door', 'left', 596],
      ['door', 'right', 596],
    ]);
  });

  it('gives a drawer the piece’s depth less the carcass back', () => {
    const chest = pieceSchema.parse(
      pieceInput({ id: 'c', kind: 'chest-of-drawers', x: 0, y: 0, width: 800, depth: 500, height: 900 }),
    );
    const fronts = pieceFronts(chest);
    expect(fronts.length).toBeGreaterThan(1);
    for (const f of fronts) expect([f.motion, f.requiredMm]).toEqual(['drawer', 500 - DRAWER_BACK_MM]);
  });

  it('gives an oven its own door height, a dishwasher too, and a panel with no handle nothing', () => {
    // Oven 2100 high: door from 0.38 h = 798 to 798 + 0.28 h = 1386, less 2 mm each edge: 584 mm.
    const oven = pieceSchema.parse(
      pieceInput({ id: 'o', kind: 'oven-housing', x: 0, y: 0, width: 600, depth: 600, height: 2100 }),
    );
    const drop = pieceFronts(oven).filter((f) => f.motion === 'drop-down');
    expect(drop.map((f) => Math.round(f.requiredMm))).toEqual([584]);
    const dishwasher = pieceSchema.parse(
      pieceInput({ id: 'w', kind: 'dishwasher', x: 0, y: 0, width: 600, depth: 600, height: 900 }),
    );
    const fronts = pieceFronts(dishwasher);
    // One steel door under the control strip, kick 117 mm to the strip: about 0.7 of the height.
    expect(fronts.map((f) => f.motion)).toEqual(['drop-down']);
    expect(fronts[0]!.requiredMm).toBeGreaterThan(600);
    expect(fronts[0]!.requiredMm).toBeLessThan(800);
  });

  it('has nothing for a piece with no kind, or a kind without fronts', () => {
    expect(pieceFronts(pieceSchema.parse(pieceInput({ id: 'b', x: 0, y: 0, width: 800, depth: 500, height: 900 })))).toEqual([]);
    expect(
      pieceFronts(pieceSchema.parse(pieceInput({ id: 'b', kind: 'bookcase', x: 0, y: 0, width: 800, depth: 300, height: 1800 }))),
    ).toEqual([]);
  });
});

describe('cannot-open', () => {
  it('reports a wardrobe whose doors meet a bed 40 cm in front, with both depths and the swing', () => {
    // The bed's edge at y 1000: 1000 − 600 = 400 mm clear where a 596 mm leaf needs its width.
    const [finding, ...rest] = check([wardrobe, bedAt(1000)]);
    expect(rest).toEqual([]);
    expect(finding).toMatchObject({
      kind: 'cannot-open',
      pieces: ['wardrobe', 'bed'],
      openings: [],
      message: 'The wardrobe’s doors cannot open fully: 40 cm clear in front, blocked by the bed',
      measuredMm: 400,
      requiredMm: 600,
    });
    // The left door's quarter disc: hinge at its left edge (x 1400 + 2) on the front, arc to (1402, 1196).
    const zone = finding!.zone!;
    expect(zone[0]).toEqual([1402, 600]);
    expect(zone[1]).toEqual([1998, 600]);
    expect(zone.at(-1)).toEqual([1402, 1196]);
  });

  it('is quiet when the bed is a leaf’s width away, or a rug, a chair or a stool stands there', () => {
    expect(check([wardrobe, bedAt(1200)])).toEqual([]);
    expect(
      check([
        wardrobe,
        pieceInput({ id: 'rug', kind: 'rug', x: 2000, y: 1000, width: 1600, depth: 800, height: 10 }),
        pieceInput({ id: 'chair', kind: 'dining-chair', x: 1700, y: 900, width: 450, depth: 450, height: 900 }),
        pieceInput({ id: 'stool', kind: 'stool', x: 2300, y: 900, width: 350, depth: 350, height: 650 }),
      ]),
    ).toEqual([]);
  });

  it('reports drawers short of the wall, the piece’s depth less the back', () => {
    // Turned 90°: front faces −x, 300 mm from the left wall (x 300–800); drawers need 450.
    const chest = pieceInput({
      id: 'chest',
      name: 'Chest',
      kind: 'chest-of-drawers',
      x: 550,
      y: 1500,
      width: 800,
      depth: 500,
      height: 900,
      rotation: 90,
    });
    const [finding] = check([chest]);
    expect(finding).toMatchObject({
      pieces: ['chest'],
      message: 'The chest’s drawers cannot pull out fully: 30 cm clear in front, blocked by the wall',
      measuredMm: 300,
      requiredMm: 450,
    });
    // The pull-out rectangle runs from the front (x 300) 450 mm out, through the wall at x 0.
    const xs = finding!.zone!.map(([x]) => x);
    expect(Math.min(...xs)).toBe(-150);
    expect(Math.max(...xs)).toBe(300);
  });

  it('reports an oven’s drop-down door short of an island, naming the front short of the most', () => {
    // Oven against the top wall (y 0–600); a plain island 900 high from y 1100: 500 mm clear. The
    // drawers below need 550 (short 50), the oven's door 584 (short 84), the cupboard above starts
    // at 1386, over the island.
    const oven = pieceInput({
      id: 'oven',
      name: 'Oven',
      kind: 'oven-housing',
      x: 2000,
      y: 300,
      width: 600,
      depth: 600,
      height: 2100,
    });
    const island = pieceInput({ id: 'island', name: 'Island', x: 2000, y: 1550, width: 1800, depth: 900, height: 900 });
    expect(check([oven, island])).toMatchObject([
      {
        pieces: ['oven', 'island'],
        message: 'The oven’s door cannot open fully: 50 cm clear in front, blocked by the island',
        measuredMm: 500,
        requiredMm: 580,
      },
    ]);
  });

  it('leaves a wall cabinet above a sideboard alone, and blocks it with a tall piece', () => {
    // Wall cabinet at 1400 mm over a sideboard facing +y, 350 deep: doors 400 wide need 400 clear.
    const cabinet = pieceInput({
      id: 'cab',
      name: 'Cabinet',
      kind: 'wall-cabinet',
      x: 2000,
      y: 175,
      width: 800,
      depth: 350,
      height: 700,
      elevation: 1400,
    });
    const low = pieceInput({ id: 'low', name: 'Low unit', x: 2000, y: 600, width: 800, depth: 400, height: 850 });
    expect(check([cabinet, low])).toEqual([]);
    const tall = { ...low, id: 'tall', name: 'Tall unit', height: 1800 };
    expect(check([cabinet, tall])).toMatchObject([{ pieces: ['cab', 'tall'], measuredMm: 50, requiredMm: 400 }]);
  });

  it('reports a sideboard whose doors open into a room door’s swing', () => {
    // Door on the top wall from x 300 to 1120, hinged at its start, swinging in: its quarter disc
    // reaches y 820 at x 300. A sideboard against the left wall, turned 270° (front +x, x 0–450),
    // y 200–1400: its doors open into the disc.
    const shell: RoomShellInput = {
      ...room,
      openings: [{ id: 'd2', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
    };
    const sideboard = pieceInput({
      id: 'sb',
      name: 'Sideboard',
      kind: 'sideboard',
      x: 225,
      y: 800,
      width: 1200,
      depth: 450,
      height: 850,
      rotation: 270,
    });
    const [finding] = check([sideboard], shell);
    expect(finding).toMatchObject({ pieces: ['sb'], openings: ['d2'] });
    expect(finding!.message).toMatch(/blocked by the door’s swing$/);
  });
});
