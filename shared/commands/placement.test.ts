// Tests for findPlacement, where a new piece lands: the asked-for spot when free, the nearest free
// floor otherwise (rugs count as free), inside an L-shaped room, and turned pieces by their footprint.
import { describe, expect, it } from 'vitest';
import type { Piece } from '../schemas/option';
import { boxesOverlap, boxInsideOutline, findPlacement } from './placement';
import { pieceFootprintMm } from '../geometry/piece';

const rect: [number, number][] = [
  [0, 0],
  [4000, 0],
  [4000, 3000],
  [0, 3000],
];
// An L: 6 m × 5 m with a 3.5 m × 3 m block taken out of its top right. Its bounding box's centre,
// (3000, 2500), falls outside the room, beyond the inner walls — where "Add" used to pile pieces.
const ell: [number, number][] = [
  [0, 0],
  [2500, 0],
  [2500, 3000],
  [6000, 3000],
  [6000, 5000],
  [0, 5000],
];

function piece(id: string, x: number, y: number, width = 1000, depth = 800, rotation = 0): Piece {
  return {
    id,
    name: id,
    x,
    y,
    width,
    depth,
    height: 800,
    rotation,
    elevation: 0,
    status: 'new',
    price: null,
    placed: true,
  } as Piece;
}

const fits = (outline: [number, number][], p: Piece) => boxInsideOutline(outline, pieceFootprintMm(p));

describe('findPlacement', () => {
  it('keeps the asked-for spot when it is free floor', () => {
    expect(findPlacement({ outline: rect }, [], { width: 1000, depth: 800, rotation: 0, near: [2000, 1500] })).toEqual([
      2000, 1500,
    ]);
  });

  it('in an L-shaped room, never lands across the inner wall, and lands near the asked-for spot', () => {
    const near: [number, number] = [3000, 2500];
    const at = findPlacement({ outline: ell }, [], { width: 2100, depth: 900, rotation: 0, near });
    expect(fits(ell, piece('sofa', at[0], at[1], 2100, 900))).toBe(true);
    expect(Math.hypot(at[0] - near[0], at[1] - near[1])).toBeLessThan(1200);
  });

  it('moves off a piece already there, to the nearest free floor', () => {
    const sofa = piece('sofa', 2000, 1500, 2000, 900);
    const at = findPlacement({ outline: rect }, [sofa], { width: 800, depth: 800, rotation: 0, near: [2000, 1500] });
    const chair = piece('chair', at[0], at[1], 800, 800);
    expect(fits(rect, chair)).toBe(true);
    expect(boxesOverlap(pieceFootprintMm(chair), pieceFootprintMm(sofa))).toBe(false);
    // The sofa's front or back edge is 450 mm from its centre, the chair's half depth 400 mm.
    expect(Math.abs(at[1] - 1500)).toBeLessThanOrEqual(900);
  });

  it('lands on a rug (walked over, so free floor) but still moves off a table', () => {
    const rug = { ...piece('rug', 2000, 1500, 2000, 1400), height: 10, kind: 'rug' } as Piece;
    const onRug = findPlacement({ outline: rect }, [rug], { width: 1000, depth: 600, rotation: 0, near: [2000, 1500] });
    expect(onRug).toEqual([2000, 1500]);
    const table = piece('table', 2000, 1500, 1000, 600);
    const beside = findPlacement({ outline: rect }, [rug, table], { width: 1000, depth: 600, rotation: 0, near: [2000, 1500] });
    expect(boxesOverlap(pieceFootprintMm(piece('x', beside[0], beside[1], 1000, 600)), pieceFootprintMm(table))).toBe(false);
  });

  it('eight pieces added one after another in the L all stand on free floor, none over a wall or another', () => {
    const placed: Piece[] = [];
    const sizes: [number, number][] = [
      [2100, 900],
      [800, 800],
      [800, 800],
      [1200, 600],
      [1600, 400],
      [500, 500],
      [1800, 1000],
      [450, 450],
    ];
    sizes.forEach(([w, d], i) => {
      const at = findPlacement({ outline: ell }, placed, { width: w, depth: d, rotation: 0, near: [3000, 2500] });
      placed.push(piece(`p${i}`, at[0], at[1], w, d));
    });
    for (const p of placed) {
      expect(fits(ell, p)).toBe(true);
      for (const q of placed) if (q !== p) expect(boxesOverlap(pieceFootprintMm(p), pieceFootprintMm(q))).toBe(false);
    }
  });

  it('a turned piece is tested by its turned footprint', () => {
    // A 3 m bench turned 90° cannot stand across the 2 m-deep arm of the L's top-left part lengthwise.
    const at = findPlacement({ outline: ell }, [], { width: 3000, depth: 400, rotation: 90, near: [1500, 1000] });
    expect(fits(ell, piece('bench', at[0], at[1], 3000, 400, 90))).toBe(true);
  });

  it('ignores the piece being placed and holding-area pieces', () => {
    const self = piece('self', 2000, 1500);
    const held = { ...piece('held', 2000, 1500), placed: false };
    expect(
      findPlacement({ outline: rect }, [self, held], { id: 'self', width: 1000, depth: 800, rotation: 0, near: [2000, 1500] }),
    ).toEqual([2000, 1500]);
  });

  it('with no free floor left, still lands inside the room', () => {
    const filler = piece('filler', 2000, 1500, 3990, 2990);
    const at = findPlacement({ outline: rect }, [filler], { width: 1000, depth: 800, rotation: 0, near: [9000, 9000] });
    expect(fits(rect, piece('x', at[0], at[1]))).toBe(true);
  });

  it('a piece larger than the room goes to the inside point nearest the asked-for spot', () => {
    const at = findPlacement({ outline: rect }, [], { width: 9000, depth: 9000, rotation: 0, near: [2000, 1500] });
    expect(at).toEqual([2000, 1500]);
  });
});
