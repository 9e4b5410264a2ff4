// The take-off and schedule against published worked examples and a schedule worked by hand.
import { describe, expect, it } from 'vitest';
import { roomShellSchema } from '../../shared/schemas/room';
import { optionDocSchema } from '../../shared/schemas/option';
import { buildSchedule } from '../../shared/analysis/schedule-lines';
import { roomTakeoff, type FinishInfo } from '../../shared/analysis/finish-takeoff';
import { takeoffSettingsSchema } from '../../shared/analysis/takeoff-settings';
import { COMMON_TIN_SIZES_L, chooseTins } from '../../shared/analysis/tins';
import { MM_PER_FOOT } from '../../shared/units/length';

const FT2_IN_M2 = 0.09290304; // 16 CFR 500.19
const US_GALLON_L = 3.785411784; // NIST Handbook 44 App. C (231 in³; litres derived)
const ft = (value: number) => value * MM_PER_FOOT;
const none = { supplier: null, code: null, price: null, priceUnit: null };

describe('paint per colour against the published worked example', () => {
  // The Old Farmer's Almanac, "How much paint do you need": room 10 × 15 ft, 8 ft high → 400 ft² gross;
  // 2 doors at 21 ft² and 2 windows at 15 ft² → 328 ft² net → 0.82 gal per coat at 400 ft²/gal.
  // Doors 3 × 7 ft (21 ft²), windows 3 × 5 ft (15 ft²) on a 2 ft 6 in sill.
  const shell = roomShellSchema.parse({
    wallHeight: ft(8),
    outline: [
      [0, 0],
      [ft(15), 0],
      [ft(15), ft(10)],
      [0, ft(10)],
    ],
    openings: [
      { id: 'door-a', type: 'door', wall: 0, offset: ft(1), width: ft(3), height: ft(7), hinge: 'start', swing: 'in' },
      { id: 'door-b', type: 'door', wall: 1, offset: ft(1), width: ft(3), height: ft(7), hinge: 'end', swing: 'in' },
      { id: 'window-a', type: 'window', wall: 2, offset: ft(2), width: ft(3), height: ft(5), sill: ft(2.5) },
      { id: 'window-b', type: 'window', wall: 2, offset: ft(9), width: ft(3), height: ft(5), sill: ft(2.5) },
    ],
  });
  const paint: FinishInfo = { ...none, id: 'paint', name: 'Wall paint', kind: 'paint', colourHex: '#ffffff' };

  it('gives 328 ft² and 0.82 US gal per coat at 400 ft²/gal for the colour on every wall', () => {
    const coverageM2PerL = (400 * FT2_IN_M2) / US_GALLON_L; // 400 ft²/gal = 9.817 m²/L (docs/references.md, derived)
    expect(coverageM2PerL).toBeCloseTo(9.817, 3);
    const settings = takeoffSettingsSchema.parse({ coats: 1, coverageM2PerL });
    const [need] = roomTakeoff(
      shell,
      { floor: null, ceiling: null, walls: 'paint', wallOverrides: {} },
      new Map([['paint', paint]]),
      settings,
    ).paints;
    expect(need.areaM2 / FT2_IN_M2).toBeCloseTo(328, 1);
    expect(need.litres / US_GALLON_L).toBeCloseTo(0.82, 3);
  });

  it('splits the same room between two colours without losing any paint', () => {
    const accent: FinishInfo = { ...paint, id: 'accent', name: 'Accent' };
    const settings = takeoffSettingsSchema.parse({ coats: 1, coverageM2PerL: (400 * FT2_IN_M2) / US_GALLON_L });
    const { paints } = roomTakeoff(
      shell,
      { floor: null, ceiling: null, walls: 'paint', wallOverrides: { '3': 'accent' } },
      new Map([
        ['paint', paint],
        ['accent', accent],
      ]),
      settings,
    );
    // Wall 3 is a plain 10 × 8 ft wall: 80 ft²; the other walls keep 248 ft².
    expect(paints[1].areaM2 / FT2_IN_M2).toBeCloseTo(80, 1);
    expect(paints[0].areaM2 / FT2_IN_M2).toBeCloseTo(248, 1);
    expect((paints[0].litres + paints[1].litres) / US_GALLON_L).toBeCloseTo(0.82, 2);
  });
});

describe('flooring against the published retailer example', () => {
  // Published retailer worked example (summary, docs/references.md): 10 × 12 ft = 120 ft², +10 % = 132 ft²,
  // boxes of 24 ft² → 6 boxes (full boxes only).
  it('orders 132 ft² in 6 boxes of 24 ft²', () => {
    const shell = roomShellSchema.parse({
      outline: [
        [0, 0],
        [ft(12), 0],
        [ft(12), ft(10)],
        [0, ft(10)],
      ],
    });
    const boards: FinishInfo = { ...none, id: 'boards', name: 'Boards', kind: 'photo', category: 'wood', swatchUrl: null };
    const settings = takeoffSettingsSchema.parse({ wastePercent: 10, unitCoverageM2: { boards: 24 * FT2_IN_M2 } });
    const [floor] = roomTakeoff(
      shell,
      { floor: 'boards', ceiling: null, walls: null, wallOverrides: {} },
      new Map([['boards', boards]]),
      settings,
    ).coverings;
    expect(floor.areaM2 / FT2_IN_M2).toBeCloseTo(120, 1);
    expect(floor.orderAreaM2 / FT2_IN_M2).toBeCloseTo(132, 1);
    expect(floor.units).toBe(6);
  });
});

describe('tins (common-practice sizes, hand-worked)', () => {
  it('marks 0.75, 1, 2.5, 5 and 10 L as the sizes and picks the least paint that covers the need', () => {
    expect(COMMON_TIN_SIZES_L).toEqual([0.75, 1, 2.5, 5, 10]);
    // 9 L: 5 + 2.5 + 0.75 + 0.75 is exact in four tins (5 + 4 × 1 is exact in five).
    expect(chooseTins(9).tins).toEqual([
      { sizeL: 5, count: 1 },
      { sizeL: 2.5, count: 1 },
      { sizeL: 0.75, count: 2 },
    ]);
    // 0.82 US gal = 3.104 L: 2.5 + 0.75 = 3.25 L is the least above (4 × 1 L, 2.5 + 1 = 3.5 L waste more).
    expect(chooseTins(0.82 * US_GALLON_L).totalL).toBe(3.25);
  });
});

describe('schedule totals against a hand-worked example', () => {
  // 5 m × 4 m, 2.5 m high, no openings: floor 20 m², walls 18 m × 2.5 m = 45 m².
  const shell = roomShellSchema.parse({
    wallHeight: 2500,
    outline: [
      [0, 0],
      [5000, 0],
      [5000, 4000],
      [0, 4000],
    ],
  });
  const library = new Map<string, FinishInfo>([
    [
      'oak',
      {
        ...none,
        id: 'oak',
        name: 'Oak boards',
        kind: 'photo',
        category: 'wood',
        swatchUrl: null,
        price: 40,
        priceUnit: 'm2',
        supplier: 'Timber yard',
        code: 'OAK-1',
      },
    ],
    ['oat', { ...none, id: 'oat', name: 'Oat', kind: 'paint', colourHex: '#e6dcc8', price: 12.5, priceUnit: 'litre' }],
  ]);
  const at = { y: 2000, depth: 800, height: 800 };
  const doc = optionDocSchema.parse({
    pieces: [
      { id: 'sofa', name: 'Sofa', x: 2500, ...at, width: 2000, status: 'new', price: 1450 },
      { id: 'chair-1', name: 'Side chair', x: 800, ...at, width: 500, status: 'new', price: 189.99 },
      { id: 'chair-2', name: 'Side chair', x: 4200, ...at, width: 500, status: 'new', price: 189.99 },
      { id: 'armchair', name: 'Armchair', x: 2500, y: 3400, width: 800, depth: 800, height: 900, status: 'existing', price: 600 },
    ],
    finishes: { floor: 'oak', walls: 'oat' },
  });
  const s = buildSchedule(shell, doc, library, takeoffSettingsSchema.parse({}));

  it('prices each line', () => {
    const byName = Object.fromEntries(s.lines.map((l) => [l.name, l]));
    expect(byName['Sofa']).toMatchObject({ quantity: 1, total: 1450 });
    // Two identical chairs on one line: 2 × 189.99 = 379.98.
    expect(byName['Side chair']).toMatchObject({ quantity: 2, unitPrice: 189.99, total: 379.98 });
    // The client's own armchair is listed at no cost.
    expect(byName['Armchair']).toMatchObject({ status: 'existing', total: 0 });
    // 20 m² + 10 % waste = 22 m² × 40 = 880.
    expect(byName['Oak boards']).toMatchObject({ quantity: 22, quantityUnit: 'm2', total: 880 });
    // 45 m² × 2 coats ÷ 10 m²/L = 9 L → tins 5 + 2.5 + 2 × 0.75 = 9 L × 12.50 = 112.50.
    expect(byName['Oat']).toMatchObject({ quantity: 9, quantityUnit: 'L', total: 112.5 });
  });

  it('adds up to the hand-worked budget', () => {
    // New pieces 1450 + 379.98 = 1829.98; finishes 880 + 112.50 = 992.50; budget 2822.48.
    expect(s.totals).toEqual({
      newPiecesCost: 1829.98,
      finishesCost: 992.5,
      budget: 2822.48,
      newPieceCount: 3,
      existingPieceCount: 1,
      unpricedCount: 0,
    });
  });
});
