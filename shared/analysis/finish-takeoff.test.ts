// Tests for the finish take-off: which finish each surface of a room gets, coats, coverage and whole
// boxes, surfaces with no finish, surface labels, and colours added up across a project's rooms.
import { describe, expect, it } from 'vitest';
import { projectTakeoff, roomTakeoff, surfaceLabel } from './finish-takeoff';
import { shell, library, defaults } from './test-rooms';
import { takeoffSettingsSchema } from './takeoff-settings';

describe('roomTakeoff', () => {
  it('puts the walls paint on every wall but the overridden one, and paints the ceiling', () => {
    const t = roomTakeoff(
      shell,
      { floor: 'boards', walls: 'oat', ceiling: 'oat', wallOverrides: { '1': 'harbour' } },
      library,
      defaults,
    );
    const [oatNeed, harbourNeed] = t.paints;
    expect(oatNeed.surfaces).toEqual({ floor: false, ceiling: true, walls: [0, 2, 3] });
    // walls 0, 2, 3: 8 + 10 + 7.5 = 25.5 m², ceiling 12 m² → 37.5 m² × 2 coats ÷ 10 m²/L = 7.5 L
    expect(oatNeed.areaM2).toBe(37.5);
    expect(oatNeed.litres).toBe(7.5);
    expect(oatNeed.tins.totalL).toBe(7.5);
    expect(harbourNeed).toMatchObject({ areaM2: 7.5, litres: 1.5, surfaces: { walls: [1] } });
    expect(t.coverings[0]).toMatchObject({ finishId: 'boards', areaM2: 12, orderAreaM2: 13.2, units: null });
    expect(t.bare).toEqual({ floorOrderM2: 0, wallsM2: 0, ceilingM2: 0 });
  });

  it('follows the coats and coverage typed, and counts whole boxes when their size is known', () => {
    const settings = takeoffSettingsSchema.parse({
      coats: 3,
      coverageM2PerL: 12,
      wastePercent: 5,
      unitCoverageM2: { boards: 2.5 },
    });
    const t = roomTakeoff(shell, { floor: 'boards', walls: 'oat', ceiling: null, wallOverrides: {} }, library, settings);
    // 33 m² of wall × 3 ÷ 12 = 8.25 L
    expect(t.paints[0].litres).toBe(8.25);
    // 12 m² + 5 % = 12.6 m² → 5.04 boxes → 6
    expect(t.coverings[0]).toMatchObject({ orderAreaM2: 12.6, units: 6, unitCoverageM2: 2.5 });
    expect(t.bare.ceilingM2).toBe(12);
  });

  it('reports surfaces without a finish, and a finish gone from the library', () => {
    const t = roomTakeoff(shell, { floor: null, walls: 'gone', ceiling: null, wallOverrides: {} }, library, defaults);
    expect(t.bare.floorOrderM2).toBe(13.2);
    expect(t.missing).toEqual([
      { kind: 'missing', finishId: 'gone', surfaces: { floor: false, ceiling: false, walls: [0, 1, 2, 3] }, areaM2: 33 },
    ]);
  });
});

describe('surfaceLabel', () => {
  it('reads as a person would write it', () => {
    expect(surfaceLabel({ floor: true, ceiling: false, walls: [] })).toBe('Floor');
    expect(surfaceLabel({ floor: false, ceiling: false, walls: [2] })).toBe('Wall 3');
    expect(surfaceLabel({ floor: false, ceiling: true, walls: [0, 1, 3] })).toBe('Walls 1, 2, 4 and ceiling');
  });
});

describe('projectTakeoff', () => {
  it('adds a colour across rooms and buys its tins once', () => {
    const a = roomTakeoff(shell, { floor: 'boards', walls: 'oat', ceiling: null, wallOverrides: {} }, library, defaults);
    const settings = takeoffSettingsSchema.parse({ unitCoverageM2: { boards: 2.5 } });
    const p = projectTakeoff(
      [
        { name: 'Den', takeoff: a },
        { name: 'Study', takeoff: a },
      ],
      settings,
    );
    // 6.6 L twice = 13.2 L → 10 + 2.5 + 0.75 = 13.25 L
    expect(p.paints[0]).toMatchObject({ rooms: ['Den', 'Study'], litres: 13.2, tins: { totalL: 13.25 } });
    // 13.2 m² twice = 26.4 m² → 10.56 → 11 boxes
    expect(p.coverings[0]).toMatchObject({ orderAreaM2: 26.4, units: 11 });
    expect(p.floorAreaM2).toBe(24);
  });
});
