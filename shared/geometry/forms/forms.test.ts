// Tests for piece forms: every kind stays inside its box over catalogue and random sizes, rests or
// hangs, faces +y and keeps its triangle budget; ergonomic defaults lie within their published ranges.
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../catalogue/catalogue';
import { KIND_SETTINGS, PIECE_KINDS, type PieceKind, type PieceSettings } from '../../schemas/piece-kind';
import {
  CHAIR_SEAT_DEPTH,
  CHAIR_SEAT_HEIGHT,
  DESK_HEIGHT,
  DINING_TABLE_HEIGHT,
  MATTRESS_TOP,
  SEAT_CUSHION_MAX_WIDTH,
  SHELF_SPACING,
  SOFA_SEAT_DEPTH,
  SOFA_SEAT_HEIGHT,
  WORKTOP_HEIGHT,
  type RangedDefault,
} from './ergonomics';
import { HANGING_KINDS, formParts, type FormBox, type Part } from './index';
import { formMeshes, formTriangles } from './mesh';
import { seatCushionCount } from './seating';
import { seededRandom, SETTING_VALUES } from './form-test-cases';

const TOL = 1e-6;
const catalogueBox = (kind: PieceKind) => {
  const e = CATALOGUE.find((c) => c.kind === kind)!;
  return { box: { width: e.width, depth: e.depth, height: e.height }, settings: e.settings ?? {} };
};

// A small seeded generator, so a failure names sizes that can be tried again.
/** Every catalogue size of the kind, and twelve random boxes from 0.4× to 2.5× of its first entry per side. */
function boxesOf(kind: PieceKind): { box: FormBox; settings: PieceSettings }[] {
  const own = CATALOGUE.filter((c) => c.kind === kind).map((e) => ({
    box: { width: e.width, depth: e.depth, height: e.height },
    settings: e.settings ?? {},
  }));
  const base = own[0].box;
  const next = seededRandom(PIECE_KINDS.indexOf(kind) + 1);
  const scaled = Array.from({ length: 12 }, () => ({
    box: {
      width: base.width * (0.4 + next() * 2.1),
      depth: base.depth * (0.4 + next() * 2.1),
      height: base.height * (0.4 + next() * 2.1),
    },
    settings: own[0].settings,
  }));
  return [...own, ...scaled];
}

/** Every setting value a kind takes, one at a time, on the kind's catalogue box. */
function settingVariants(kind: PieceKind): PieceSettings[] {
  return KIND_SETTINGS[kind].flatMap((key) => SETTING_VALUES[key].map((v) => ({ [key]: v }) as PieceSettings));
}

const footprint = (p: Part) => {
  const grow = p.shape === 'leg' ? Math.max(1, p.taper ?? 1) : 1;
  return { x0: p.x - (p.w * grow) / 2, x1: p.x + (p.w * grow) / 2, y0: p.y - (p.d * grow) / 2, y1: p.y + (p.d * grow) / 2 };
};

function outside(parts: Part[], box: FormBox): Part[] {
  return parts.filter((p) => {
    const f = footprint(p);
    return (
      f.x0 < -box.width / 2 - TOL ||
      f.x1 > box.width / 2 + TOL ||
      f.y0 < -box.depth / 2 - TOL ||
      f.y1 > box.depth / 2 + TOL ||
      p.z < -TOL ||
      p.z + p.h > box.height + TOL
    );
  });
}

const touching = (a: Part, b: Part) => {
  const fa = footprint(a);
  const fb = footprint(b);
  const gap = 0.5;
  return (
    fa.x0 <= fb.x1 + gap &&
    fb.x0 <= fa.x1 + gap &&
    fa.y0 <= fb.y1 + gap &&
    fb.y0 <= fa.y1 + gap &&
    a.z <= b.z + b.h + gap &&
    b.z <= a.z + a.h + gap
  );
};

/** Parts not held: not on the floor (or, hanging, from the top) and touching nothing that is, however indirectly. */
function floating(parts: Part[], box: FormBox, hanging: boolean): Part[] {
  const held = new Set<number>();
  parts.forEach((p, i) => {
    if (hanging ? Math.abs(p.z + p.h - box.height) < 0.5 : Math.abs(p.z) < 0.5) held.add(i);
  });
  let grew = true;
  while (grew) {
    grew = false;
    parts.forEach((p, i) => {
      if (held.has(i)) return;
      if ([...held].some((j) => touching(p, parts[j]))) {
        held.add(i);
        grew = true;
      }
    });
  }
  return parts.filter((_, i) => !held.has(i));
}

/** Kinds with a front (seat, doors, drawers, the open side of a bed) and, for some, a back. */
const FRONTED: PieceKind[] = [
  'sofa',
  'corner-sofa',
  'armchair',
  'dining-chair',
  'bedside-table',
  'desk',
  'bed',
  'wardrobe',
  'chest-of-drawers',
  'sideboard',
  'media-unit',
  'wall-cabinet',
  'kitchen-base-unit',
  'kitchen-wall-unit',
  'oven-housing',
  'dishwasher',
  'mirror',
  'picture',
  'radiator',
  'cot',
];
const mean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;
/** Rugs and flat wall pieces stay under this many triangles; every other piece under 2,000. */
const FLAT_KINDS: PieceKind[] = ['rug', 'picture', 'mirror', 'wall-shelf'];

describe.each(PIECE_KINDS)('the %s form', (kind) => {
  const cases = [...boxesOf(kind), ...settingVariants(kind).map((settings) => ({ box: catalogueBox(kind).box, settings }))];

  it('stays inside its box with every part sized, over catalogue and random sizes and every setting', () => {
    for (const { box, settings } of cases) {
      const parts = formParts(kind, settings, box);
      expect(parts.length).toBeGreaterThan(0);
      expect(outside(parts, box), JSON.stringify({ box, settings })).toEqual([]);
      for (const p of parts) expect(Math.min(p.w, p.d, p.h), JSON.stringify({ box, settings, p })).toBeGreaterThan(0);
    }
  });

  it(HANGING_KINDS.includes(kind) ? 'hangs every part from its top' : 'rests every part on the floor or on another part', () => {
    for (const { box, settings } of cases) {
      const parts = formParts(kind, settings, box);
      expect(floating(parts, box, HANGING_KINDS.includes(kind)), JSON.stringify({ box, settings })).toEqual([]);
    }
  });

  it(`keeps within ${FLAT_KINDS.includes(kind) ? 100 : 2000} triangles`, () => {
    for (const { box, settings } of cases) {
      const tris = formTriangles(formMeshes(formParts(kind, settings, box), { x: 0, y: 0, rotation: 0, elevation: 0 }));
      expect(tris).toBeLessThanOrEqual(FLAT_KINDS.includes(kind) ? 100 : 2000);
    }
  });

  if (FRONTED.includes(kind)) {
    it('faces its own +y: the seat, doors or drawer fronts lie towards +y, the back towards −y', () => {
      const { box, settings } = catalogueBox(kind);
      const parts = formParts(kind, settings, box);
      const front = parts.filter((p) => p.role === 'front');
      const back = parts.filter((p) => p.role === 'back');
      expect(front.length).toBeGreaterThan(0);
      const frontEdge = Math.max(...front.map((p) => p.y + p.d / 2));
      expect(frontEdge).toBeGreaterThan(box.depth / 2 - box.depth * 0.25);
      if (back.length > 0) expect(mean(front.map((p) => p.y))).toBeGreaterThan(mean(back.map((p) => p.y)));
      else expect(mean(front.map((p) => p.y))).toBeGreaterThanOrEqual(0);
    });
  }
});

describe('backs', () => {
  // A dining set's chairs face the table from every side, so its backs are all round it (tested below).
  it.each(PIECE_KINDS.filter((k) => k !== 'dining-set'))('a %s has its back parts, if any, towards −y', (kind) => {
    const { box, settings } = catalogueBox(kind);
    const back = formParts(kind, settings, box).filter((p) => p.role === 'back');
    if (back.length > 0) expect(mean(back.map((p) => p.y))).toBeLessThan(0);
  });
});

describe('forms in the room', () => {
  it('turns with the piece: a sofa turned 90° clockwise has its front (+y) towards plan −x', () => {
    const parts = formParts('sofa', {}, { width: 2000, depth: 900, height: 850 }).filter((p) => p.role === 'front');
    const turned = formMeshes(parts, { x: 0, y: 0, rotation: 90, elevation: 0 }).main;
    const xs: number[] = [];
    for (let i = 0; i < turned.positions.length; i += 3) xs.push(turned.positions[i]);
    // Local +y is plan (−sin, cos) of the turn: at 90° that is plan −x.
    expect(Math.min(...xs)).toBeCloseTo(-0.45, 3);
    expect(Math.max(...xs)).toBeLessThan(0.45);
  });

  it('winds every triangle to face outwards, whatever the turn', () => {
    for (const kind of ['sofa', 'dining-table', 'plant', 'rug'] as const) {
      for (const rotation of [0, 37, 180, 270]) {
        const m = formMeshes(formParts(kind, {}, catalogueBox(kind).box), { x: 500, y: 700, rotation, elevation: 0 }).main;
        const P = m.positions;
        for (let t = 0; t < m.indices.length; t += 3) {
          const [a, b, c] = [m.indices[t], m.indices[t + 1], m.indices[t + 2]];
          const e1 = [P[b * 3] - P[a * 3], P[b * 3 + 1] - P[a * 3 + 1], P[b * 3 + 2] - P[a * 3 + 2]];
          const e2 = [P[c * 3] - P[a * 3], P[c * 3 + 1] - P[a * 3 + 1], P[c * 3 + 2] - P[a * 3 + 2]];
          const n = [e1[1] * e2[2] - e1[2] * e2[1], e1[2] * e2[0] - e1[0] * e2[2], e1[0] * e2[1] - e1[1] * e2[0]];
          const v = [m.normals[a * 3], m.normals[a * 3 + 1], m.normals[a * 3 + 2]];
          const area = Math.hypot(n[0], n[1], n[2]);
          if (area < 1e-9) continue;
          expect(n[0] * v[0] + n[1] * v[1] + n[2] * v[2], `${kind} at ${rotation}°`).toBeGreaterThan(0);
        }
      }
    }
  });

  it('lifts a wall-hung piece to its elevation and keeps uvs in metres', () => {
    const parts = formParts('wall-cabinet', {}, { width: 800, depth: 350, height: 700 });
    const m = formMeshes(parts, { x: 1000, y: 500, rotation: 0, elevation: 1400 }).main;
    const ys: number[] = [];
    for (let i = 1; i < m.positions.length; i += 3) ys.push(m.positions[i]);
    expect(Math.min(...ys)).toBeCloseTo(1.4, 5);
    expect(Math.max(...ys)).toBeCloseTo(2.1, 5);
    // The carcass front: u runs its 800 mm width as 0.8 m.
    const us = Array.from(m.uvs.filter((_, i) => i % 2 === 0));
    expect(Math.max(...us) - Math.min(...us)).toBeGreaterThanOrEqual(0.8 - 1e-6);
  });
});

describe('sofa cushions', () => {
  it('adds a seat cushion rather than stretching one past the common maximum width (750 mm, common practice)', () => {
    const seats = (width: number) => formParts('sofa', {}, { width, depth: 900, height: 850 }).filter((p) => p.role === 'front');
    expect(seats(1700).length).toBe(2);
    expect(seats(2100).length).toBe(3);
    expect(seats(3000).length).toBe(4);
    expect(formParts('armchair', {}, { width: 850, depth: 850, height: 900 }).filter((p) => p.role === 'front').length).toBe(1);
    for (const width of [1200, 1700, 2100, 2600, 3000, 4000])
      for (const c of seats(width)) expect(c.w).toBeLessThanOrEqual(SEAT_CUSHION_MAX_WIDTH.valueMm);
    expect(seatCushionCount(1500)).toBe(2);
    expect(seatCushionCount(1501)).toBe(3);
  });
});

describe('heights and depths the forms set themselves', () => {
  const ranged: [string, RangedDefault][] = [
    ['sofa seat height', SOFA_SEAT_HEIGHT],
    ['sofa seat depth', SOFA_SEAT_DEPTH],
    ['chair seat height', CHAIR_SEAT_HEIGHT],
    ['chair seat depth', CHAIR_SEAT_DEPTH],
    ['dining table height', DINING_TABLE_HEIGHT],
    ['desk height', DESK_HEIGHT],
    ['worktop height', WORKTOP_HEIGHT],
    ['mattress top', MATTRESS_TOP],
    ['shelf spacing', SHELF_SPACING],
    ['seat cushion width', SEAT_CUSHION_MAX_WIDTH],
  ];
  it.each(ranged)('the %s default lies within its published range', (_, d) => {
    expect(d.valueMm).toBeGreaterThanOrEqual(d.minMm);
    expect(d.valueMm).toBeLessThanOrEqual(d.maxMm);
    expect(d.source.length).toBeGreaterThan(10);
  });

  const top = (parts: Part[]) => Math.max(...parts.map((p) => p.z + p.h));
  it('uses them on catalogue sizes', () => {
    const sofa = formParts('sofa', {}, catalogueBox('sofa').box);
    expect(top(sofa.filter((p) => p.role === 'front'))).toBeCloseTo(SOFA_SEAT_HEIGHT.valueMm, 6);
    const seatDepth = Math.max(...sofa.filter((p) => p.role === 'front').map((p) => p.d));
    expect(seatDepth).toBeCloseTo(SOFA_SEAT_DEPTH.valueMm, 6);
    const chair = formParts('dining-chair', {}, catalogueBox('dining-chair').box);
    expect(top(chair.filter((p) => p.role === 'front'))).toBeCloseTo(CHAIR_SEAT_HEIGHT.valueMm, 6);
    const set = formParts('dining-set', { chairs: 4 }, catalogueBox('dining-set').box);
    expect(top(set.filter((p) => p.role === 'top'))).toBeCloseTo(DINING_TABLE_HEIGHT.valueMm, 6);
    const kitchen = formParts('kitchen-base-unit', {}, catalogueBox('kitchen-base-unit').box);
    expect(top(kitchen.filter((p) => p.role === 'top'))).toBeCloseTo(WORKTOP_HEIGHT.valueMm, 6);
    const bed = formParts('bed', {}, catalogueBox('bed').box);
    const mattress = bed.filter((p) => p.slot === 'own').sort((a, b) => b.w * b.d - a.w * a.d)[0];
    expect(mattress.z + mattress.h).toBeCloseTo(MATTRESS_TOP.valueMm, 6);
    const shelves = formParts('bookcase', {}, catalogueBox('bookcase').box)
      .filter((p) => p.role === 'top')
      .map((p) => p.z);
    for (let i = 1; i < shelves.length; i++) {
      expect(shelves[i] - shelves[i - 1]).toBeGreaterThanOrEqual(SHELF_SPACING.minMm);
      expect(shelves[i] - shelves[i - 1]).toBeLessThanOrEqual(SHELF_SPACING.maxMm);
    }
    // Tables and desks stand at the box's height: the catalogue's sizes are within the ranges.
    expect(catalogueBox('desk').box.height).toBeGreaterThanOrEqual(DESK_HEIGHT.minMm);
    expect(catalogueBox('desk').box.height).toBeLessThanOrEqual(DESK_HEIGHT.maxMm);
    expect(catalogueBox('dining-table').box.height).toBeGreaterThanOrEqual(DINING_TABLE_HEIGHT.minMm);
    expect(catalogueBox('dining-table').box.height).toBeLessThanOrEqual(DINING_TABLE_HEIGHT.maxMm);
  });
});

describe('dining sets', () => {
  it('puts the asked number of chairs round the table, each facing it', () => {
    for (const chairs of [2, 4, 6, 8]) {
      const parts = formParts('dining-set', { chairs }, { width: 1800, depth: 1800, height: 900 });
      expect(parts.filter((p) => p.role === 'back').length).toBe(chairs);
      // Every chair back is further from the middle than its seat.
      const seats = parts.filter((p) => p.role === 'front');
      const backs = parts.filter((p) => p.role === 'back');
      backs.forEach((b, i) => expect(Math.hypot(b.x, b.y)).toBeGreaterThan(Math.hypot(seats[i].x, seats[i].y)));
    }
  });
});
