// Tests for a piece's plan geometry: footprint corners and bounds under rotation, rotation folding,
// and which pieces are walked over (rugs, flat things), walked under (above head clearance) or round.
import { describe, expect, it } from 'vitest';
import { pieceFromCatalogue, type CatalogueId } from '../catalogue/catalogue';
import type { Piece } from '../schemas/option';
import {
  FLAT_MAX_HEIGHT_MM,
  HEAD_CLEARANCE_MM,
  blocksWalking,
  boxCornersMm,
  isWalkedOver,
  isWalkedUnder,
  normaliseRotationDeg,
  pieceBoundsMm,
  pieceFootprintMm,
  piecePlanBox,
  planBoxAt,
} from './piece';

const block = (extra: Partial<Piece> = {}): Piece => ({
  id: 'p',
  name: 'Block',
  x: 3000,
  y: 2000,
  width: 2000,
  depth: 1000,
  height: 800,
  rotation: 0,
  elevation: 0,
  status: 'new',
  placed: true,
  ...extra,
});

const fromCatalogue = (id: CatalogueId) => pieceFromCatalogue(id, id, [0, 0]);
const rounded = (points: [number, number][]) =>
  points.map(([x, y]) => [Math.round(x * 1e6) / 1e6 + 0, Math.round(y * 1e6) / 1e6 + 0]);

describe('footprint', () => {
  it('puts the four corners round the centre, back-left first, in the piece’s own axes', () => {
    expect(pieceFootprintMm(block())).toEqual([
      [2000, 1500],
      [4000, 1500],
      [4000, 2500],
      [2000, 2500],
    ]);
  });

  it('turns the footprint clockwise seen from above: at 90° the width runs down the plan and the front faces −x', () => {
    // Its own +x (width) now points down the plan (+y), its front (+y) points to −x.
    expect(rounded(pieceFootprintMm(block({ rotation: 90 })))).toEqual([
      [3500, 1000],
      [3500, 3000],
      [2500, 3000],
      [2500, 1000],
    ]);
    const box = piecePlanBox(block({ rotation: 90 }));
    expect(rounded([box.axisX, box.axisY])).toEqual([
      [0, 1],
      [-1, 0],
    ]);
  });

  it('bounds a turned piece by its corners: a 1 m square at 45° spans √2 m', () => {
    const b = pieceBoundsMm(block({ width: 1000, depth: 1000, rotation: 45 }));
    expect(b.maxX - b.minX).toBeCloseTo(1000 * Math.SQRT2, 6);
    expect(b.maxY - b.minY).toBeCloseTo(1000 * Math.SQRT2, 6);
    expect((b.minX + b.maxX) / 2).toBeCloseTo(3000, 6);
  });

  it('builds any box the same way: a door leaf’s box from a centre, an axis and two sizes', () => {
    const box = planBoxAt([100, 200], [0, 1], 800, 40);
    expect(box.axisY).toEqual([-1, 0]);
    expect(boxCornersMm(box)).toEqual([
      [120, -200],
      [120, 600],
      [80, 600],
      [80, -200],
    ]);
  });

  it('folds rotations into [0, 360), a hair short of a full turn counting as none', () => {
    expect(normaliseRotationDeg(-90)).toBe(270);
    expect(normaliseRotationDeg(720)).toBe(0);
    expect(normaliseRotationDeg(360 - 1e-12)).toBe(0);
    expect(Object.is(normaliseRotationDeg(-0), 0)).toBe(true);
  });
});

describe('walked over, walked under or walked round', () => {
  it('walks over rugs by their kind, however thick, and over anything lying flat on the floor', () => {
    expect(isWalkedOver(fromCatalogue('rug'))).toBe(true);
    expect(isWalkedOver(fromCatalogue('rug-round'))).toBe(true);
    expect(isWalkedOver(block({ kind: 'rug', height: 40 }))).toBe(true);
    // A mat entered as a plain block, at the flat limit and just past it.
    expect(isWalkedOver(block({ height: FLAT_MAX_HEIGHT_MM }))).toBe(true);
    expect(isWalkedOver(block({ height: FLAT_MAX_HEIGHT_MM + 1 }))).toBe(false);
    // Thin but hung on the wall: not something underfoot.
    expect(isWalkedOver(block({ height: FLAT_MAX_HEIGHT_MM, elevation: 1500 }))).toBe(false);
    expect(isWalkedOver(fromCatalogue('sofa-3-seat'))).toBe(false);
  });

  it('walks under a piece only when its underside is at the head clearance, 2.0 m, or above', () => {
    expect(HEAD_CLEARANCE_MM).toBe(2000);
    expect(isWalkedUnder(block({ elevation: HEAD_CLEARANCE_MM }))).toBe(true);
    expect(isWalkedUnder(block({ elevation: HEAD_CLEARANCE_MM - 1 }))).toBe(false);
    expect(isWalkedUnder(fromCatalogue('pendant-light'))).toBe(false);
    expect(isWalkedUnder(block({ kind: 'pendant-light', elevation: 2100, height: 300 }))).toBe(true);
  });

  it('makes a person go round everything else: sofas, low wall cabinets and shelves, a pendant hung low', () => {
    for (const id of ['sofa-3-seat', 'wall-cabinet', 'wall-shelf', 'kitchen-wall-unit', 'pendant-light', 'wardrobe'] as const)
      expect(blocksWalking(fromCatalogue(id)), id).toBe(true);
    expect(blocksWalking(fromCatalogue('rug'))).toBe(false);
    expect(blocksWalking(block({ kind: 'wall-shelf', elevation: 2100, height: 40 }))).toBe(false);
  });
});
