// Tests for the safety findings: climbable pieces near a window in a child's room (against the
// IRC R312.2.1 24 in sill), and tall storage (27 in, 16 CFR 1261) not marked as fixed to the wall.
import { describe, expect, it } from 'vitest';
import { placedBoxes } from './boxes';
import { findingSchema } from './finding';
import { checkFit } from './index';
import {
  CLIMB_REACH_MM,
  findClimbableNearWindows,
  findTallNotFixed,
  isTallStorage,
  SAFE_SILL_ABOVE_MM,
  TIP_OVER_HEIGHT_MM,
} from './safety';
import { cleanLayout, pieceInput, plan } from './test-plans';
import { pieceSchema, type PieceInput } from '../../schemas/option';
import { roomShellSchema, type RoomShellInput } from '../../schemas/room';

// A 4 × 3 m room; a window on the bottom wall (wall 2 runs from x 4000 to 0) from x 3000 to 1500, sill 900.
const room: RoomShellInput = {
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  openings: [{ id: 'w1', type: 'window', wall: 2, offset: 1000, width: 1500, height: 1200, sill: 900 }],
};

function climbable(pieces: PieceInput[], childRoom = true) {
  const shell = roomShellSchema.parse({ ...room, childRoom });
  const findings = findClimbableNearWindows(shell, placedBoxes(pieces.map((p) => pieceSchema.parse(p))));
  for (const f of findings) findingSchema.parse(f);
  return findings;
}
// A single bed 500 high, its foot towards the window: y 900–2900, 100 mm from the window wall.
const bed = pieceInput({ id: 'bed', name: 'Bed', kind: 'bed', x: 2250, y: 1900, width: 900, depth: 2000, height: 500 });

describe('figures', () => {
  it('uses the published inches', () => {
    // IRC R312.2.1: 24 in; 16 CFR 1261 / ASTM F2057-23: 27 in; 1 in = 25.4 mm (NIST SP 811).
    expect(SAFE_SILL_ABOVE_MM).toBeCloseTo(609.6, 6);
    expect(TIP_OVER_HEIGHT_MM).toBeCloseTo(685.8, 6);
    expect(CLIMB_REACH_MM).toBe(600);
  });
});

describe('climbable-near-window', () => {
  it('reports a bed under a window in a child’s room: the sill 40 cm above its top', () => {
    expect(climbable([bed])).toEqual([
      {
        kind: 'climbable-near-window',
        pieces: ['bed'],
        openings: ['w1'],
        message:
          'The bed stands 40 cm below the window sill, within reach: a child can climb it to the window. Move it away, or fit window guards or opening limiters. Check local codes and ask a licensed professional where it matters.',
      },
    ]);
  });

  it('says so when a piece rises above the sill', () => {
    const [finding] = climbable([
      { ...bed, id: 'chest', name: 'Chest', kind: 'chest-of-drawers', height: 1000, depth: 450, y: 2775 },
    ]);
    expect(finding?.message).toMatch(/^The chest rises above the window sill: /);
  });

  it('is quiet in a room not marked as a child’s, by default too', () => {
    expect(climbable([bed], false)).toEqual([]);
    expect(roomShellSchema.parse(room).childRoom).toBe(false);
  });

  it('is quiet when the bed is more than 60 cm from the window, the sill 24 in above its top, or it cannot be climbed', () => {
    // 610 mm from the wall: y 290–2290.
    expect(climbable([{ ...bed, y: 1290 }])).toEqual([]);
    // Sill 1110: 610 mm above the bed's top, at least 24 in.
    const high = { ...room, openings: [{ ...room.openings![0]!, sill: 1110, height: 1000 }] } as RoomShellInput;
    expect(
      findClimbableNearWindows(roomShellSchema.parse({ ...high, childRoom: true }), placedBoxes([pieceSchema.parse(bed)])),
    ).toEqual([]);
    // Sill 1109: just short of 24 in above.
    const low = { ...room, openings: [{ ...room.openings![0]!, sill: 1109, height: 1000 }] } as RoomShellInput;
    expect(
      findClimbableNearWindows(roomShellSchema.parse({ ...low, childRoom: true }), placedBoxes([pieceSchema.parse(bed)])),
    ).toHaveLength(1);
    // A plain block or a floor lamp is not counted as climbable.
    expect(
      climbable([
        { ...bed, kind: undefined },
        { ...bed, id: 'lamp', kind: 'floor-lamp', width: 300, depth: 300 },
      ]),
    ).toEqual([]);
  });

  it('counts a piece beside the window, within reach of its edge', () => {
    // An armchair x 3100–3900 by the bottom wall: 100 mm past the window's edge at x 3000.
    expect(
      climbable([
        pieceInput({ id: 'chair', name: 'Armchair', kind: 'armchair', x: 3500, y: 2550, width: 800, depth: 800, height: 800 }),
      ]),
    ).toHaveLength(1);
  });
});

describe('tall-not-fixed', () => {
  const wardrobe = pieceInput({
    id: 'wardrobe',
    name: 'Wardrobe',
    kind: 'wardrobe',
    x: 500,
    y: 300,
    width: 1000,
    depth: 600,
    height: 2000,
  });
  const tall = (pieces: PieceInput[]) => findTallNotFixed(placedBoxes(pieces.map((p) => pieceSchema.parse(p))));

  it('reports a wardrobe not marked as fixed, and not one that is', () => {
    expect(tall([wardrobe])).toEqual([
      {
        kind: 'tall-not-fixed',
        pieces: ['wardrobe'],
        openings: [],
        message:
          'The wardrobe (200 cm tall) is not marked as fixed to the wall: furniture this tall can tip over onto a child. Fix it with an anchoring kit as its maker directs. Check local codes and ask a licensed professional where it matters.',
      },
    ]);
    expect(tall([{ ...wardrobe, fixedToWall: true }])).toEqual([]);
  });

  it('counts chests from 27 in (686 mm), bookcases and shelving, on the floor only', () => {
    const chest = (height: number) =>
      pieceSchema.parse(pieceInput({ id: 'c', kind: 'chest-of-drawers', x: 0, y: 0, width: 800, depth: 450, height }));
    expect(isTallStorage(chest(686))).toBe(true);
    expect(isTallStorage(chest(685))).toBe(false);
    for (const kind of ['bookcase', 'open-shelving'] as const)
      expect(isTallStorage(pieceSchema.parse({ ...wardrobe, kind, settings: undefined }))).toBe(true);
    expect(isTallStorage(pieceSchema.parse({ ...wardrobe, elevation: 300 }))).toBe(false);
    expect(isTallStorage(pieceSchema.parse({ ...wardrobe, kind: 'sideboard' }))).toBe(false);
    expect(isTallStorage(pieceSchema.parse({ ...wardrobe, kind: undefined }))).toBe(false);
  });
});

describe('the clean layout with kinds', () => {
  it('finds only the unfixed bookcase, and nothing once it is fixed and the room is not a child’s', () => {
    const layout = cleanLayout();
    const kinds: Record<string, PieceInput['kind']> = {
      sideboard: 'sideboard',
      'wall-cabinet': 'wall-cabinet',
      sofa: 'sofa',
      bookcase: 'bookcase',
      rug: 'rug',
    };
    layout.pieces = layout.pieces.map((p) => ({ ...p, kind: kinds[p.id] }));
    const fit = (child: boolean, fixed: boolean) => {
      const pieces = layout.pieces.map((p) => (p.id === 'bookcase' ? { ...p, fixedToWall: fixed } : p));
      const { room: shell, option } = plan({ ...layout.room, childRoom: child }, pieces);
      return checkFit(shell, option.pieces).map((f) => [f.kind, ...f.pieces]);
    };
    expect(fit(false, false)).toEqual([['tall-not-fixed', 'bookcase']]);
    expect(fit(false, true)).toEqual([]);
    // In a child's room the sofa under the window (800 high, sill 900) is within reach.
    expect(fit(true, true)).toEqual([['climbable-near-window', 'sofa']]);
  });
});
