// Tests for the room take-off against the README's plan-file example (tests/reference/rooms), coats,
// coverage and waste, skirting by opening, an L-shaped room, and the printed analysis output.
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import { computeTakeoff, roundQuantity } from './takeoff';
import { analysisOutput, analysisOutputSchema } from './analysis-output';
import { findingSchema } from './fit/finding';
import { designExampleRoom as example, designExampleTakeoff, designExampleWall0 } from '../../tests/reference/rooms';

describe('computeTakeoff', () => {
  it("gives exactly the numbers of the README's plan-file example", () => {
    const takeoff = computeTakeoff(roomShellSchema.parse(example));
    const printed = analysisOutput(takeoff, []);
    expect(printed).toMatchObject(designExampleTakeoff);
    expect(printed.walls[0]).toEqual(designExampleWall0);
    expect(takeoff.walls.map((w) => w.openingsAreaM2)).toEqual([1.673, 0, 1.8, 1.89]);
  });

  it('follows the coats, coverage and waste options', () => {
    const takeoff = computeTakeoff(roomShellSchema.parse(example), { coats: 3, coverageM2PerL: 12, wastePercent: 15 });
    expect(takeoff.paint).toEqual({ coats: 3, coverageM2PerL: 12, litres: roundQuantity((35.1972 * 3) / 12) });
    expect(takeoff.flooring.orderAreaM2).toBe(roundQuantity(15.12 * 1.15));
  });

  it('runs the skirting under windows but not across doors and passages', () => {
    const noWindow = computeTakeoff(
      roomShellSchema.parse({ ...example, openings: example.openings!.filter((o) => o.type !== 'window') }),
    );
    expect(noWindow.skirtingM).toBe(13.88);
    const noOpenings = computeTakeoff(roomShellSchema.parse({ ...example, openings: [] }));
    expect(noOpenings.skirtingM).toBe(15.6);
  });

  it('measures an L-shaped room on its inside faces', () => {
    const takeoff = computeTakeoff(
      roomShellSchema.parse({
        wallHeight: 2500,
        outline: [
          [0, 0],
          [5000, 0],
          [5000, 2500],
          [3000, 2500],
          [3000, 4000],
          [0, 4000],
        ],
      }),
    );
    expect(takeoff.floorAreaM2).toBe(17);
    expect(takeoff.perimeterM).toBe(18);
    expect(takeoff.netWallAreaM2).toBe(45);
    expect(takeoff.volumeM3).toBe(42.5);
  });
});

describe('analysisOutput', () => {
  it('prints the findings under their documented names, and nothing else is renamed or lost', () => {
    const finding = findingSchema.parse({
      kind: 'narrow-walkway',
      pieces: ['bed', 'chest'],
      openings: [],
      message: 'Only 62 cm to pass between the bed and the chest',
      measuredMm: 620,
      requiredMm: 900,
      at: [1000, 2000],
      between: [
        [1000, 1690],
        [1000, 2310],
      ],
    });
    const printed = analysisOutput(computeTakeoff(roomShellSchema.parse(example)), [finding]);
    expect(printed.findings).toEqual([
      {
        kind: 'narrow-walkway',
        pieces: ['bed', 'chest'],
        openings: [],
        message: 'Only 62 cm to pass between the bed and the chest',
        measured_mm: 620,
        required_mm: 900,
        at: [1000, 2000],
        between: [
          [1000, 1690],
          [1000, 2310],
        ],
      },
    ]);
    expect(analysisOutputSchema.strict().safeParse(printed).success).toBe(true);
    expect(findingSchema.safeParse({ ...finding, kind: 'too-close' }).success).toBe(false);
  });

  it('prints the settings it was given under their documented names', () => {
    const printed = analysisOutput(
      computeTakeoff(roomShellSchema.parse(example), { coats: 3, coverageM2PerL: 12, wastePercent: 15 }),
      [],
    );
    expect(printed.paint).toEqual({ coats: 3, coverage_m2_per_l: 12, litres: roundQuantity((35.1972 * 3) / 12) });
    expect(printed.flooring).toEqual({ wastePercent: 15, orderArea_m2: roundQuantity(15.12 * 1.15) });
  });
});
