import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import { computeTakeoff, findingSchema, roundQuantity } from './takeoff';
import { designExampleRoom as example, designExampleTakeoff, designExampleWall0 } from '../../tests/reference/rooms';

describe('computeTakeoff', () => {
  it('gives exactly the numbers of the design example', () => {
    const takeoff = computeTakeoff(roomShellSchema.parse(example));
    expect(takeoff).toMatchObject(designExampleTakeoff);
    expect(takeoff.walls[0]).toEqual(designExampleWall0);
    expect(takeoff.walls.map((w) => w.openingsArea_m2)).toEqual([1.673, 0, 1.8, 1.89]);
  });

  it('follows the coats, coverage and waste options', () => {
    const takeoff = computeTakeoff(roomShellSchema.parse(example), { coats: 3, coverage_m2_per_l: 12, wastePercent: 15 });
    expect(takeoff.paint).toEqual({ coats: 3, coverage_m2_per_l: 12, litres: roundQuantity((35.1972 * 3) / 12) });
    expect(takeoff.flooring.orderArea_m2).toBe(roundQuantity(15.12 * 1.15));
  });

  it('runs the skirting under windows but not across doors and passages', () => {
    const noWindow = computeTakeoff(
      roomShellSchema.parse({ ...example, openings: example.openings!.filter((o) => o.type !== 'window') }),
    );
    expect(noWindow.skirting_m).toBe(13.88);
    const noOpenings = computeTakeoff(roomShellSchema.parse({ ...example, openings: [] }));
    expect(noOpenings.skirting_m).toBe(15.6);
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
    expect(takeoff.floorArea_m2).toBe(17);
    expect(takeoff.perimeter_m).toBe(18);
    expect(takeoff.netWallArea_m2).toBe(45);
    expect(takeoff.volume_m3).toBe(42.5);
  });

  it('passes findings through in the shared finding shape', () => {
    const finding = findingSchema.parse({
      kind: 'narrow-walkway',
      pieces: ['bed', 'chest'],
      openings: [],
      message: 'Only 62 cm to pass between the bed and the chest',
      measured_mm: 620,
      required_mm: 900,
    });
    expect(computeTakeoff(roomShellSchema.parse(example), {}, [finding]).findings).toEqual([finding]);
    expect(findingSchema.safeParse({ ...finding, kind: 'too-close' }).success).toBe(false);
  });
});
