import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../schemas/room';
import { optionDocSchema, type PieceInput } from '../schemas/option';
import {
  FREE_FLOOR_CELL_MM,
  MAX_FREE_FLOOR_CELLS,
  buildSchedule,
  compareOption,
  freeFloorCellMm,
  freeFloorShare,
  projectTakeoff,
  roomTakeoff,
  surfaceLabel,
  takeoffQuery,
  takeoffQuerySchema,
  takeoffSettingsSchema,
  type FinishInfo,
  type PaintInfo,
  type PhotoInfo,
} from './schedule';

// 4 m × 3 m, 2.5 m high: walls 0 and 2 are 4 m (10 m² each), walls 1 and 3 are 3 m (7.5 m² each).
// A 1 m × 2 m door on wall 0 takes 2 m² off it.
const shell = roomShellSchema.parse({
  wallHeight: 2500,
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 500, width: 1000, height: 2000, hinge: 'start', swing: 'in' }],
});
const base = { supplier: null, code: null, price: null, priceUnit: null };
const oat: PaintInfo = { ...base, id: 'oat', name: 'Oat', kind: 'paint', colourHex: '#e6dcc8', price: 20, priceUnit: 'unit' };
const harbour: PaintInfo = { ...base, id: 'harbour', name: 'Harbour', kind: 'paint', colourHex: '#2f4858' };
const boards: PhotoInfo = {
  ...base,
  id: 'boards',
  name: 'Boards',
  kind: 'photo',
  category: 'wood',
  swatchUrl: null,
  price: 50,
  priceUnit: 'm2',
};
const paper: PhotoInfo = {
  ...base,
  id: 'paper',
  name: 'Paper',
  kind: 'photo',
  category: 'wallpaper',
  swatchUrl: null,
  price: 30,
  priceUnit: 'unit',
};
const library = new Map<string, FinishInfo>([oat, harbour, boards, paper].map((f) => [f.id, f]));
const defaults = takeoffSettingsSchema.parse({});
const piece = (p: Partial<PieceInput> & { id: string }): PieceInput => ({
  name: 'Chair',
  x: 1000,
  y: 1500,
  width: 500,
  depth: 500,
  height: 800,
  status: 'new',
  ...p,
});

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

describe('buildSchedule', () => {
  it('groups identical pieces, lists existing ones at no cost and leaves held pieces out', () => {
    const doc = optionDocSchema.parse({
      pieces: [
        piece({ id: 'c1', price: 120, supplierUrl: 'https://example.com/chair' }),
        piece({ id: 'c2', price: 120, x: 2000 }),
        piece({ id: 'c3', price: 150, x: 3000 }),
        piece({ id: 'sofa', name: 'Sofa', width: 2000, depth: 900, status: 'existing', price: 900 }),
        piece({ id: 'lamp', name: 'Lamp', price: 80, placed: false }),
        piece({ id: 'stool', name: 'Stool', price: null }),
      ],
    });
    const s = buildSchedule(shell, doc, library, defaults);
    const chairs = s.lines.filter((l) => l.name === 'Chair');
    expect(chairs.map((l) => [l.quantity, l.unitPrice, l.total])).toEqual([
      [2, 120, 240],
      [1, 150, 150],
    ]);
    expect(chairs[0].supplierUrl).toBe('https://example.com/chair');
    expect(s.lines.find((l) => l.name === 'Sofa')).toMatchObject({ status: 'existing', total: 0, unitPrice: null });
    expect(s.lines.find((l) => l.name === 'Stool')).toMatchObject({ total: null, unpricedReason: expect.any(String) });
    expect(s.heldPieceCount).toBe(1);
    expect(s.totals).toEqual({
      newPiecesCost: 390,
      finishesCost: 0,
      budget: 390,
      newPieceCount: 4,
      existingPieceCount: 1,
      unpricedCount: 1,
    });
  });

  it('prices paint by the litres in its tins, and boards by the full boxes bought', () => {
    const doc = optionDocSchema.parse({ finishes: { floor: 'boards', walls: 'oat' } });
    const s = buildSchedule(shell, doc, library, takeoffSettingsSchema.parse({ unitCoverageM2: { boards: 2.5 } }));
    const [floor, paint] = s.lines;
    // 13.2 m² → 6 boxes of 2.5 m² = 15 m² × 50 = 750
    expect(floor).toMatchObject({
      name: 'Boards',
      quantity: 15,
      quantityUnit: 'm2',
      total: 750,
      quantityNote: '6 × 2.5 m² for 13.2 m² with 10 % waste',
    });
    // 33 m² × 2 ÷ 10 = 6.6 L; 5 + 0.75 + 0.75 = 6.5 L is short, 5 + 1 + 0.75 = 6.75 L is the least above: × 20 = 135
    expect(paint).toMatchObject({
      quantity: 6.75,
      quantityUnit: 'L',
      total: 135,
      quantityNote: '5 L + 1 L + 0.75 L for 6.6 L',
      colourHex: '#e6dcc8',
    });
    expect(s.totals.budget).toBe(885);
  });

  it('prices a per-unit finish only when what one unit covers is known', () => {
    const doc = optionDocSchema.parse({ finishes: { walls: 'paper' } });
    const unknown = buildSchedule(shell, doc, library, defaults).lines[0];
    expect(unknown).toMatchObject({
      total: null,
      quantityUnit: 'm2',
      unpricedReason: 'Priced per box or roll: enter what one covers.',
    });
    const known = buildSchedule(shell, doc, library, takeoffSettingsSchema.parse({ unitCoverageM2: { paper: 5.3 } })).lines[0];
    // 33 m² + 10 % = 36.3 m² ÷ 5.3 = 6.85 → 7 rolls × 30
    expect(known).toMatchObject({ quantity: 7, quantityUnit: 'unit', total: 210 });
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

describe('freeFloorShare and compareOption', () => {
  it('counts the floor under pieces one walks round, not rugs or wall shelves', () => {
    expect(freeFloorShare(shell, [])).toBe(1);
    const pieces = optionDocSchema.parse({
      pieces: [
        piece({ id: 'bed', x: 1000, y: 1000, width: 2000, depth: 2000, height: 500 }),
        piece({ id: 'rug', x: 3000, y: 1500, width: 1000, depth: 1000, height: 10 }),
        piece({ id: 'shelf', x: 3000, y: 300, width: 1000, depth: 300, height: 300, elevation: 2100 }),
        piece({ id: 'stored', x: 3000, y: 2500, width: 500, depth: 500, placed: false }),
      ],
    }).pieces;
    // 4 m² of 12 m² covered → two thirds free
    expect(freeFloorShare(shell, pieces)).toBeCloseTo(2 / 3, 2);
  });

  it('measures a 1,000 m² room on a grid of at most 250,000 cells, as exactly', () => {
    expect(freeFloorCellMm(shell.outline)).toBe(FREE_FLOOR_CELL_MM);
    const side = 31_600;
    const hall = roomShellSchema.parse({
      outline: [
        [0, 0],
        [side, 0],
        [side, side],
        [0, side],
      ],
    });
    const cell = freeFloorCellMm(hall.outline);
    expect(cell).toBe(64);
    expect((side / cell) ** 2).toBeLessThanOrEqual(MAX_FREE_FLOOR_CELLS);
    // A 10 m × 10 m platform in the middle: 100 m² of 998.56 m² covered (derived) → 89.99 % free.
    const platform = optionDocSchema.parse({
      pieces: [piece({ id: 'stage', x: side / 2, y: side / 2, width: 10_000, depth: 10_000, height: 500 })],
    }).pieces;
    expect(freeFloorShare(hall, platform)).toBeCloseTo(1 - 100 / 998.56, 3);
  });

  it('puts budget, new pieces, findings and free floor side by side', () => {
    const doc = optionDocSchema.parse({ pieces: [piece({ id: 'a', price: 100 }), piece({ id: 'b', price: 100 })] });
    // Both chairs at the same spot overlap: one finding.
    expect(compareOption(shell, doc, library, defaults)).toMatchObject({
      budget: 200,
      newPieceCount: 2,
      findingCount: 1,
      unpricedCount: 0,
    });
    expect(compareOption(shell, doc, library, defaults).freeFloorPercent).toBeCloseTo(100 - (0.25 / 12) * 100, 0);
  });
});

describe('takeoffQuerySchema', () => {
  it('reads the query the client writes', () => {
    const settings = takeoffSettingsSchema.parse({
      coats: 3,
      coverageM2PerL: 12.5,
      wastePercent: 15,
      unitCoverageM2: { boards: 2.2, paper: 5.3 },
    });
    expect(takeoffQuery(settings)).toBe('coats=3&coverage=12.5&waste=15&unitM2=boards%3A2.2&unitM2=paper%3A5.3');
    const written = new URLSearchParams(takeoffQuery(settings));
    const query = Object.fromEntries(
      [...new Set(written.keys())].map((k) => {
        const all = written.getAll(k);
        return [k, all.length > 1 ? all : all[0]];
      }),
    );
    expect(takeoffQuerySchema.parse(query)).toEqual(settings);
    expect(takeoffQuerySchema.parse({})).toEqual(defaults);
    expect(takeoffQuerySchema.parse({ unitM2: 'a:1,b:2.5' }).unitCoverageM2).toEqual({ a: 1, b: 2.5 });
  });

  it('refuses what no paint job has, with a message', () => {
    expect(takeoffQuerySchema.safeParse({ coats: '0' }).error?.issues[0].message).toBe('At least 1 coat.');
    expect(takeoffQuerySchema.safeParse({ coverage: 'lots' }).error?.issues[0].message).toMatch(/Coverage must be a number/);
    expect(takeoffQuerySchema.safeParse({ waste: '500' }).success).toBe(false);
    expect(takeoffQuerySchema.safeParse({ unitM2: 'boards' }).error?.issues[0].message).toMatch(/finishId:m2/);
    expect(takeoffQuerySchema.safeParse({ unitM2: 'boards:0' }).success).toBe(false);
  });
});
