// The catalogue's bed sizes against the metric and US mattress sizes in docs/references.md, and
// the frame allowance on each bed box.
import { describe, expect, it } from 'vitest';
import {
  BED_FRAME_LENGTH_ALLOWANCE_MM,
  BED_FRAME_WIDTH_ALLOWANCE_MM,
  catalogueEntry,
  type CatalogueId,
} from '../../shared/catalogue/catalogue';
import { MM_PER_INCH } from '../../shared/units/length';

// There is no mandatory mattress standard, so docs/references.md asks for ±2 cm (metric) and ±1 in (US).
const METRIC_TOLERANCE_MM = 20;
const INCH_TOLERANCE_MM = 25.4;

// [kind, width cm, length cm], each with its source as docs/references.md gives it.
const metric: [CatalogueId, number, number][] = [
  ['bed-uk-single', 90, 190], // National Bed Federation sizes (summary)
  ['bed-uk-small-double', 120, 190], // National Bed Federation sizes (summary)
  ['bed-uk-double', 135, 190], // National Bed Federation sizes (summary)
  ['bed-uk-king', 150, 200], // National Bed Federation sizes (summary)
  ['bed-uk-super-king', 180, 200], // National Bed Federation sizes (summary)
  ['bed-continental-90', 90, 200], // trade convention (summary)
  ['bed-continental-140', 140, 200], // trade convention (summary)
  ['bed-continental-160', 160, 200], // trade convention (summary)
  ['bed-continental-180', 180, 200], // trade convention (summary)
];

// [kind, width in, length in]: sleep-industry consumer charts (summary).
const us: [CatalogueId, number, number][] = [
  ['bed-us-twin', 38, 75],
  ['bed-us-twin-xl', 38, 80],
  ['bed-us-full', 54, 75],
  ['bed-us-queen', 60, 80],
  ['bed-us-king', 76, 80],
  ['bed-us-california-king', 72, 84],
];

function mattressOf(kind: CatalogueId) {
  const { mattress } = catalogueEntry(kind);
  if (!mattress) throw new Error(`${kind} has no mattress`);
  return mattress;
}

describe('mattress sizes against docs/references.md', () => {
  it.each(metric)('%s mattress is %i × %i cm within ±2 cm', (kind, widthCm, lengthCm) => {
    const mattress = mattressOf(kind);
    expect(Math.abs(mattress.widthMm - widthCm * 10)).toBeLessThanOrEqual(METRIC_TOLERANCE_MM);
    expect(Math.abs(mattress.lengthMm - lengthCm * 10)).toBeLessThanOrEqual(METRIC_TOLERANCE_MM);
  });

  it.each(us)('%s mattress is %i × %i in within ±1 in', (kind, widthIn, lengthIn) => {
    const mattress = mattressOf(kind);
    expect(Math.abs(mattress.widthMm - widthIn * 25.4)).toBeLessThanOrEqual(INCH_TOLERANCE_MM);
    expect(Math.abs(mattress.lengthMm - lengthIn * 25.4)).toBeLessThanOrEqual(INCH_TOLERANCE_MM);
  });

  it('converts US sizes with 1 in = 25.4 mm exactly, so a Queen is 1524 × 2032 mm', () => {
    expect(MM_PER_INCH).toBe(25.4); // NIST SP 811 (2008) §B.6
    const queen = mattressOf('bed-us-queen');
    expect(queen.widthMm).toBeCloseTo(1524, 9);
    expect(queen.lengthMm).toBeCloseTo(2032, 9);
    expect(mattressOf('bed-us-california-king').lengthMm).toBeCloseTo(2133.6, 9);
  });

  it('keeps the UK double at 135 cm, not the 137.16 cm of its old 4 ft 6 in name', () => {
    // derived in docs/references.md: 4 ft 6 in = 54 in = 137.16 cm; the NBF metric double is 135 cm
    expect(54 * MM_PER_INCH).toBeCloseTo(1371.6, 9);
    expect(mattressOf('bed-uk-double').widthMm).toBe(1350);
  });

  it('makes each bed box the mattress plus the frame allowance (common practice)', () => {
    for (const [kind] of [...metric, ...us]) {
      const entry = catalogueEntry(kind);
      const mattress = mattressOf(kind);
      expect(entry.width).toBeCloseTo(mattress.widthMm + BED_FRAME_WIDTH_ALLOWANCE_MM, 9);
      expect(entry.depth).toBeCloseTo(mattress.lengthMm + BED_FRAME_LENGTH_ALLOWANCE_MM, 9);
      expect(mattress.source.length).toBeGreaterThan(0);
    }
  });
});
