// Floor areas and perimeters against published and derived values (docs/references.md) and
// against an independent library, 2d-polygon-area.
import polygonArea from '2d-polygon-area';
import { describe, expect, it } from 'vitest';
import { computeTakeoff } from '../../shared/analysis/takeoff';
import { areaMm2, perimeterMm, signedAreaMm2 } from '../../shared/geometry/polygon';
import { roomShellSchema } from '../../shared/schemas/room';
import { MM_PER_FOOT } from '../../shared/units/length';

type P = [number, number];
const metres = (points: P[]): P[] => points.map(([x, y]) => [x * 1000, y * 1000]);
const feet = (points: P[]): P[] => points.map(([x, y]) => [x * MM_PER_FOOT, y * MM_PER_FOOT]);

describe('floor areas against published and derived values', () => {
  it('L-shape (0,0)(5,0)(5,2.5)(3,2.5)(3,4)(0,4) m is 17.0 m² with perimeter 18.0 m', () => {
    // derived (docs/references.md, Flooring): 5 × 2.5 + 3 × 1.5 = 17.0 m²; 5 + 2.5 + 2 + 1.5 + 3 + 4 = 18.0 m
    const outline = metres([
      [0, 0],
      [5, 0],
      [5, 2.5],
      [3, 2.5],
      [3, 4],
      [0, 4],
    ]);
    expect(areaMm2(outline) / 1e6).toBeCloseTo(5 * 2.5 + 3 * 1.5, 9);
    expect(perimeterMm(outline) / 1000).toBeCloseTo(18.0, 9);
    const takeoff = computeTakeoff(roomShellSchema.parse({ outline }));
    expect(takeoff.floorAreaM2).toBe(17);
    expect(takeoff.perimeterM).toBe(18);
  });

  it('L-shape (0,0)(15,0)(15,8)(10,8)(10,12)(0,12) ft is 160 ft² = 14.8644864 m²', () => {
    // derived: 15 × 8 + 10 × 4 = 160 ft²; 1 ft² = 0.09290304 m² (16 CFR 500.19)
    const outline = feet([
      [0, 0],
      [15, 0],
      [15, 8],
      [10, 8],
      [10, 12],
      [0, 12],
    ]);
    expect(15 * 8 + 10 * 4).toBe(160);
    expect(areaMm2(outline) / 1e6).toBeCloseTo(160 * 0.09290304, 9);
    expect(areaMm2(outline) / 1e6).toBeCloseTo(14.8644864, 9);
    expect(computeTakeoff(roomShellSchema.parse({ outline })).floorAreaM2).toBe(14.864);
  });

  it('survey traverse A B C D encloses 102,935.72 ft²', () => {
    // J. Mahun, Open Access Surveying Library, traverse computations ch. G, example 1 (published inputs, area recomputed)
    const survey: P[] = [
      [500.0, 2000.0],
      [323.614, 1561.426],
      [526.996, 1488.321],
      [719.336, 1686.956],
    ];
    const squareFeet = areaMm2(feet(survey)) / (MM_PER_FOOT * MM_PER_FOOT);
    expect(squareFeet).toBeCloseTo(102935.72, 2);
  });

  it('shoelace sign is positive for counter-clockwise vertices in a y-up frame', () => {
    // E. W. Weisstein, "Polygon Area", MathWorld: positive for counter-clockwise vertices
    const counterClockwiseYUp: P[] = [
      [0, 0],
      [1000, 0],
      [1000, 1000],
      [0, 1000],
    ];
    expect(signedAreaMm2(counterClockwiseYUp)).toBeGreaterThan(0);
  });

  it('agrees with an independent implementation (2d-polygon-area) on L, U, bay, splay and survey shapes', () => {
    const shapes: P[][] = [
      metres([
        [0, 0],
        [5, 0],
        [5, 2.5],
        [3, 2.5],
        [3, 4],
        [0, 4],
      ]),
      [
        [0, 0],
        [1000, 0],
        [1000, 2000],
        [2000, 2000],
        [2000, 0],
        [3000, 0],
        [3000, 3000],
        [0, 3000],
      ],
      [
        [0, 0],
        [3000, 0],
        [3000, 1000],
        [3400, 1400],
        [3400, 2600],
        [3000, 3000],
        [3000, 4000],
        [0, 4000],
      ],
      [
        [0, 0],
        [3300, 0],
        [4000, 700],
        [4000, 3000],
        [0, 3000],
      ],
      feet([
        [500.0, 2000.0],
        [323.614, 1561.426],
        [526.996, 1488.321],
        [719.336, 1686.956],
      ]),
    ];
    for (const shape of shapes) {
      for (const wound of [shape, [...shape].reverse()]) {
        expect(areaMm2(wound)).toBeCloseTo(Math.abs(polygonArea(wound)), 3);
      }
    }
  });
});
