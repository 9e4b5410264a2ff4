// Take-off by finish and the schedule of an option: which finish covers how much of the room, the
// paint and tins per colour, flooring with waste and boxes, every piece with its price, and the
// option's budget. Pure: the room shell and option document in plan mm, quantities out in m², m,
// litres; prices stay plain numbers in the studio's own currency.
import { z } from 'zod';
import type { RoomShell } from '../schemas/room';
import { boundsMm } from '../geometry/polygon';
import { isWebLink, type FinishAssignments, type OptionDoc, type Piece } from '../schemas/option';
import type { FinishCategory, PriceUnit } from '../schemas/finish';
import { checkFit } from './fit';
import { blocksWalking, placedBoxes } from './fit/boxes';
import { FREE, WALL, rasteriseFloor } from './fit/floor-grid';
import { DEFAULT_COVERAGE_M2_PER_L, DEFAULT_PAINT_COATS, DEFAULT_WASTE_PERCENT, computeTakeoff, roundQuantity } from './takeoff';
import { chooseTins, describeTins, type TinPlan } from './tins';
import type { MoneySettings } from '../units/money';

// ——— Settings the designer can change on the take-off page ———

/** Coats beyond this are a typing slip, not a paint job. */
export const MAX_COATS = 10;
/** Coverage outside 1–40 m²/L per coat is no wall paint (labels give roughly 8–13 m²/L). */
export const MIN_COVERAGE_M2_PER_L = 1;
export const MAX_COVERAGE_M2_PER_L = 40;
/** Waste above 100 % would be ordering the floor twice over. */
export const MAX_WASTE_PERCENT = 100;
/** What one box or roll covers, m²: anything above this is a typing slip. */
export const MAX_UNIT_COVERAGE_M2 = 1000;

export const takeoffSettingsSchema = z.object({
  coats: z
    .number()
    .int('Coats are whole numbers.')
    .min(1, 'At least 1 coat.')
    .max(MAX_COATS, `At most ${MAX_COATS} coats.`)
    .default(DEFAULT_PAINT_COATS),
  coverageM2PerL: z
    .number()
    .min(MIN_COVERAGE_M2_PER_L, `Coverage is at least ${MIN_COVERAGE_M2_PER_L} m² per litre.`)
    .max(MAX_COVERAGE_M2_PER_L, `Coverage is at most ${MAX_COVERAGE_M2_PER_L} m² per litre.`)
    .default(DEFAULT_COVERAGE_M2_PER_L),
  wastePercent: z
    .number()
    .min(0, 'Waste cannot be negative.')
    .max(MAX_WASTE_PERCENT, `Waste is at most ${MAX_WASTE_PERCENT} %.`)
    .default(DEFAULT_WASTE_PERCENT),
  /** m² one unit (a box of boards, a roll of paper) covers, by finish id; finishes without one are ordered by area. */
  unitCoverageM2: z
    .record(z.string(), z.number().positive('A box or roll covers more than 0 m².').max(MAX_UNIT_COVERAGE_M2))
    .default({}),
});
export type TakeoffSettings = z.infer<typeof takeoffSettingsSchema>;
export type TakeoffSettingsInput = z.input<typeof takeoffSettingsSchema>;

const numberText = (message: string) => z.coerce.number({ message }).finite(message);
const unitCoverageEntry = /^([^:]+):([0-9]*\.?[0-9]+)$/;

/**
 * The settings as query parameters: `coats`, `coverage` (m²/L), `waste` (%), and `unitM2` as
 * `finishId:m2`, repeated or comma-separated. The same names the analyze command takes.
 */
export const takeoffQuerySchema = z
  .object({
    coats: numberText('Coats must be a number.').optional(),
    coverage: numberText('Coverage must be a number of m² per litre.').optional(),
    waste: numberText('Waste must be a percentage.').optional(),
    unitM2: z.union([z.string(), z.array(z.string())]).optional(),
  })
  .transform((q, ctx) => {
    const unitCoverageM2: Record<string, number> = {};
    const entries = (Array.isArray(q.unitM2) ? q.unitM2 : q.unitM2 ? [q.unitM2] : [])
      .flatMap((v) => v.split(','))
      .filter(Boolean);
    for (const entry of entries) {
      const match = unitCoverageEntry.exec(entry.trim());
      if (!match) {
        ctx.addIssue({
          code: 'custom',
          path: ['unitM2'],
          message: 'Give the m² per box or roll as finishId:m2, e.g. 1a2b…:2.2.',
        });
        return z.NEVER;
      }
      unitCoverageM2[match[1]!] = Number(match[2]);
    }
    const settings: TakeoffSettingsInput = { unitCoverageM2 };
    if (q.coats !== undefined) settings.coats = q.coats;
    if (q.coverage !== undefined) settings.coverageM2PerL = q.coverage;
    if (q.waste !== undefined) settings.wastePercent = q.waste;
    return settings;
  })
  .pipe(takeoffSettingsSchema);

/**
 * The query string the take-off and schedule routes read (see takeoffQuerySchema), without the
 * leading `?`: coats, coverage and waste, then one `unitM2=finishId:m2` per unit finish in id order.
 */
export function takeoffQuery(settings: TakeoffSettings): string {
  const pairs: [string, string][] = [
    ['coats', String(settings.coats)],
    ['coverage', String(settings.coverageM2PerL)],
    ['waste', String(settings.wastePercent)],
  ];
  for (const [id, m2] of Object.entries(settings.unitCoverageM2).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
    pairs.push(['unitM2', `${id}:${m2}`]);
  return pairs.map(([key, value]) => `${key}=${encodeURIComponent(value)}`).join('&');
}

// ——— Finishes as the take-off needs them ———

interface FinishInfoBase {
  id: string;
  name: string;
  supplier: string | null;
  code: string | null;
  price: number | null;
  priceUnit: PriceUnit | null;
}
export interface PaintInfo extends FinishInfoBase {
  kind: 'paint';
  colourHex: string;
}
export interface PhotoInfo extends FinishInfoBase {
  kind: 'photo';
  category: FinishCategory;
  swatchUrl: string | null;
}
/** The parts of a library finish the take-off and schedule use. */
export type FinishInfo = PaintInfo | PhotoInfo;
export type FinishLookup = ReadonlyMap<string, FinishInfo>;

// ——— Surfaces ———

/** Which surfaces of a room one finish is on; walls by index (0-based, as in the outline). */
export interface SurfaceSet {
  floor: boolean;
  ceiling: boolean;
  walls: number[];
}

/** "Floor", "Walls 1, 2, 4 and ceiling": walls numbered from 1, as the room editor shows them. */
export function surfaceLabel(s: SurfaceSet): string {
  const parts: string[] = [];
  if (s.floor) parts.push('floor');
  if (s.walls.length === 1) parts.push(`wall ${s.walls[0]! + 1}`);
  if (s.walls.length > 1) parts.push(`walls ${s.walls.map((w) => w + 1).join(', ')}`);
  if (s.ceiling) parts.push('ceiling');
  const text = parts.length <= 1 ? parts.join('') : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

interface FinishArea {
  finishId: string;
  surfaces: SurfaceSet;
  /** The surfaces' net area (inside faces, openings taken off), m², unrounded. */
  areaM2: number;
}

function areasByFinish(
  shell: RoomShell,
  assignments: FinishAssignments,
): {
  byFinish: FinishArea[];
  bare: { floorM2: number; ceilingM2: number; wallsM2: number };
  takeoff: ReturnType<typeof computeTakeoff>;
} {
  const takeoff = computeTakeoff(shell);
  const byId = new Map<string, FinishArea>();
  const add = (finishId: string, areaM2: number, mark: (s: SurfaceSet) => void) => {
    const entry = byId.get(finishId) ?? { finishId, surfaces: { floor: false, ceiling: false, walls: [] }, areaM2: 0 };
    entry.areaM2 += areaM2;
    mark(entry.surfaces);
    byId.set(finishId, entry);
  };
  const bare = { floorM2: 0, ceilingM2: 0, wallsM2: 0 };
  if (assignments.floor)
    add(assignments.floor, takeoff.floorArea_m2, (s) => {
      s.floor = true;
    });
  else bare.floorM2 = takeoff.floorArea_m2;
  for (const wall of takeoff.walls) {
    const finishId = assignments.wallOverrides[String(wall.index)] ?? assignments.walls;
    if (finishId)
      add(finishId, wall.netArea_m2, (s) => {
        s.walls.push(wall.index);
      });
    else bare.wallsM2 += wall.netArea_m2;
  }
  if (assignments.ceiling)
    add(assignments.ceiling, takeoff.ceilingArea_m2, (s) => {
      s.ceiling = true;
    });
  else bare.ceilingM2 = takeoff.ceilingArea_m2;
  return { byFinish: [...byId.values()], bare, takeoff };
}

// ——— Quantities ———

/** Litres of paint for an area (m²) at `coats` coats and a coverage per coat (m²/L). */
export function paintLitres(areaM2: number, coats: number, coverageM2PerL: number): number {
  return (areaM2 * coats) / coverageM2PerL;
}

export interface CoveringOrder {
  /** Area to order with waste, m². */
  orderAreaM2: number;
  /** Full boxes or rolls to buy, when what one covers is known. */
  units: number | null;
}

/** Area with waste (%), and whole units (boxes, rolls) of `unitCoverageM2` each when it is known. */
export function coveringOrder(areaM2: number, wastePercent: number, unitCoverageM2: number | null): CoveringOrder {
  const orderAreaM2 = areaM2 * (1 + wastePercent / 100);
  // The allowance keeps an exact fit (132 ft² in 24 ft² boxes is 5.5, 144 ft² is 6) from floating up a box.
  const units = unitCoverageM2 ? Math.ceil(orderAreaM2 / unitCoverageM2 - 1e-9) : null;
  return { orderAreaM2, units };
}

export interface PaintNeed {
  kind: 'paint';
  finishId: string;
  finish: PaintInfo;
  surfaces: SurfaceSet;
  areaM2: number;
  coats: number;
  coverageM2PerL: number;
  litres: number;
  tins: TinPlan;
}

export interface CoveringNeed extends CoveringOrder {
  kind: 'photo';
  finishId: string;
  finish: PhotoInfo;
  surfaces: SurfaceSet;
  areaM2: number;
  wastePercent: number;
  unitCoverageM2: number | null;
}

/** A surface whose finish is no longer in the library (deleted after it was chosen). */
export interface MissingNeed {
  kind: 'missing';
  finishId: string;
  surfaces: SurfaceSet;
  areaM2: number;
}

export type FinishNeed = PaintNeed | CoveringNeed | MissingNeed;

/** One room with one option's finishes: quantities per finish (m², litres), rounded for reporting. */
export interface RoomTakeoff {
  floorAreaM2: number;
  netWallAreaM2: number;
  ceilingAreaM2: number;
  skirtingM: number;
  paints: PaintNeed[];
  coverings: CoveringNeed[];
  missing: MissingNeed[];
  /** Net areas with no finish chosen yet, m²; the floor's with waste, as it would be ordered. */
  bare: { floorOrderM2: number; wallsM2: number; ceilingM2: number };
}

/**
 * The take-off of a room (plan mm) furnished with an option's finish assignments: paint by colour
 * (the walls finish on every wall, a wall override on its wall, the ceiling), flooring and other
 * photo finishes by area with waste and whole units. Paint and coverings come in the order the
 * surfaces are met: floor, walls, ceiling.
 */
export function roomTakeoff(
  shell: RoomShell,
  assignments: FinishAssignments,
  finishes: FinishLookup,
  settings: TakeoffSettings,
): RoomTakeoff {
  const { byFinish, bare, takeoff } = areasByFinish(shell, assignments);
  const paints: PaintNeed[] = [];
  const coverings: CoveringNeed[] = [];
  const missing: MissingNeed[] = [];
  for (const area of byFinish) {
    const finish = finishes.get(area.finishId);
    if (!finish) missing.push({ kind: 'missing', ...area, areaM2: roundQuantity(area.areaM2) });
    else if (finish.kind === 'paint') paints.push(paintNeed(finish, area.surfaces, area.areaM2, settings));
    else coverings.push(coveringNeed(finish, area.surfaces, area.areaM2, settings));
  }
  return {
    floorAreaM2: takeoff.floorArea_m2,
    netWallAreaM2: takeoff.netWallArea_m2,
    ceilingAreaM2: takeoff.ceilingArea_m2,
    skirtingM: takeoff.skirting_m,
    paints,
    coverings,
    missing,
    bare: {
      floorOrderM2: roundQuantity(coveringOrder(bare.floorM2, settings.wastePercent, null).orderAreaM2),
      wallsM2: roundQuantity(bare.wallsM2),
      ceilingM2: roundQuantity(bare.ceilingM2),
    },
  };
}

function paintNeed(finish: PaintInfo, surfaces: SurfaceSet, areaM2: number, settings: TakeoffSettings): PaintNeed {
  const litres = paintLitres(areaM2, settings.coats, settings.coverageM2PerL);
  return {
    kind: 'paint',
    finishId: finish.id,
    finish,
    surfaces,
    areaM2: roundQuantity(areaM2),
    coats: settings.coats,
    coverageM2PerL: settings.coverageM2PerL,
    litres: roundQuantity(litres),
    tins: chooseTins(roundQuantity(litres)),
  };
}

function coveringNeed(finish: PhotoInfo, surfaces: SurfaceSet, areaM2: number, settings: TakeoffSettings): CoveringNeed {
  const unitCoverageM2 = settings.unitCoverageM2[finish.id] ?? null;
  const order = coveringOrder(areaM2, settings.wastePercent, unitCoverageM2);
  return {
    kind: 'photo',
    finishId: finish.id,
    finish,
    surfaces,
    areaM2: roundQuantity(areaM2),
    wastePercent: settings.wastePercent,
    unitCoverageM2,
    orderAreaM2: roundQuantity(order.orderAreaM2),
    units: order.units,
  };
}

/** The rooms that use a finish, for the project's totals. */
export interface ProjectPaint {
  finish: PaintInfo;
  rooms: string[];
  litres: number;
  tins: TinPlan;
}
export interface ProjectCovering {
  finish: PhotoInfo;
  rooms: string[];
  orderAreaM2: number;
  unitCoverageM2: number | null;
  units: number | null;
}
export interface ProjectTakeoff {
  floorAreaM2: number;
  skirtingM: number;
  paints: ProjectPaint[];
  coverings: ProjectCovering[];
}

/**
 * A project's totals from its rooms' take-offs: paint per colour summed and bought as one set of
 * tins (one colour's tins serve every room), coverings per finish with whole units over the sum.
 */
export function projectTakeoff(
  rooms: readonly { name: string; takeoff: RoomTakeoff }[],
  settings: TakeoffSettings,
): ProjectTakeoff {
  const paints = new Map<string, { finish: PaintInfo; rooms: string[]; litres: number }>();
  const coverings = new Map<string, { finish: PhotoInfo; rooms: string[]; orderAreaM2: number }>();
  let floorAreaM2 = 0;
  let skirtingM = 0;
  for (const { name, takeoff } of rooms) {
    floorAreaM2 += takeoff.floorAreaM2;
    skirtingM += takeoff.skirtingM;
    for (const p of takeoff.paints) {
      const entry = paints.get(p.finishId) ?? { finish: p.finish, rooms: [], litres: 0 };
      entry.rooms.push(name);
      entry.litres += p.litres;
      paints.set(p.finishId, entry);
    }
    for (const c of takeoff.coverings) {
      const entry = coverings.get(c.finishId) ?? { finish: c.finish, rooms: [], orderAreaM2: 0 };
      entry.rooms.push(name);
      entry.orderAreaM2 += c.orderAreaM2;
      coverings.set(c.finishId, entry);
    }
  }
  return {
    floorAreaM2: roundQuantity(floorAreaM2),
    skirtingM: roundQuantity(skirtingM),
    paints: [...paints.values()].map((p) => ({
      ...p,
      litres: roundQuantity(p.litres),
      tins: chooseTins(roundQuantity(p.litres)),
    })),
    coverings: [...coverings.values()].map((c) => {
      const unitCoverageM2 = settings.unitCoverageM2[c.finish.id] ?? null;
      // Waste is already in each room's order area: only the whole units are worked out again.
      const { units } = coveringOrder(c.orderAreaM2, 0, unitCoverageM2);
      return { ...c, orderAreaM2: roundQuantity(c.orderAreaM2), unitCoverageM2, units };
    }),
  };
}

// ——— The schedule ———

/** What a schedule quantity counts: pieces, m², units (boxes, rolls) or litres. */
export type QuantityUnit = 'piece' | 'm2' | 'unit' | 'L';

export interface ScheduleLine {
  /** Stable within one schedule: piece ids or finish ids. */
  key: string;
  section: 'piece' | 'finish';
  name: string;
  /** Pieces only. */
  status: 'existing' | 'new' | null;
  /** Pieces: size in mm (width × depth × height). */
  sizeMm: { width: number; depth: number; height: number } | null;
  /** Pieces: the finish on the piece (a fabric), by name. Finishes: where it goes ("Walls 1, 2 and ceiling"). */
  detail: string;
  quantity: number;
  quantityUnit: QuantityUnit;
  /** How the quantity is made up: "5 L + 2.5 L for 7.04 L", "6 boxes of 2.23 m²". */
  quantityNote: string | null;
  unitPrice: number | null;
  priceUnit: QuantityUnit | null;
  /** Price × quantity (2 decimals); 0 for existing pieces; null when there is no price to go on. */
  total: number | null;
  /** Why there is no total, when there is none. */
  unpricedReason: string | null;
  supplier: string | null;
  supplierUrl: string | null;
  code: string | null;
  /** Paints: the colour, for a chip beside the name. */
  colourHex: string | null;
}

/** Short names of the quantity units, as the schedule page and its CSV print them. */
export const QUANTITY_UNIT_LABELS: Record<QuantityUnit, string> = { piece: 'pcs', m2: 'm²', unit: 'units', L: 'L' };

const MM_PER_CM = 10;
const cm = (mm: number) => String(Math.round((mm / MM_PER_CM) * 10) / 10);

/** "200 × 90 × 80 cm": a piece's width × depth × height. */
export function sizeText(size: { width: number; depth: number; height: number }): string {
  return `${cm(size.width)} × ${cm(size.depth)} × ${cm(size.height)} cm`;
}

export interface ScheduleTotals {
  newPiecesCost: number;
  finishesCost: number;
  /** New pieces and finishes; existing pieces cost nothing. */
  budget: number;
  newPieceCount: number;
  existingPieceCount: number;
  /** Lines without a total: the budget leaves them out. */
  unpricedCount: number;
}

export interface Schedule {
  lines: ScheduleLine[];
  totals: ScheduleTotals;
  /** Pieces waiting in the holding area: not part of the layout, so not counted. */
  heldPieceCount: number;
  takeoff: RoomTakeoff;
}

/** Money to two decimals; the nudge keeps 0.125 (really 0.12499…) rounding up as a person would. */
export function roundMoney(value: number): number {
  return Math.round(value * 100 + Math.sign(value) * 1e-7) / 100;
}

const groupKey = (p: Piece) => JSON.stringify([p.status, p.name.trim(), p.width, p.depth, p.height, p.price ?? null]);

function pieceLines(pieces: readonly Piece[], finishes: FinishLookup): ScheduleLine[] {
  const groups = new Map<string, { first: Piece; count: number }>();
  for (const piece of pieces) {
    const key = groupKey(piece);
    const group = groups.get(key);
    if (group) group.count += 1;
    else groups.set(key, { first: piece, count: 1 });
  }
  return [...groups.values()].map(({ first: p, count }) => {
    const price = p.price ?? null;
    const existing = p.status === 'existing';
    return {
      key: p.id,
      section: 'piece',
      name: p.name.trim() || 'Unnamed piece',
      status: p.status,
      sizeMm: { width: p.width, depth: p.depth, height: p.height },
      detail: (p.finishId && finishes.get(p.finishId)?.name) || '',
      quantity: count,
      quantityUnit: 'piece',
      quantityNote: null,
      unitPrice: existing ? null : price,
      priceUnit: existing || price === null ? null : 'piece',
      total: existing ? 0 : price === null ? null : roundMoney(price * count),
      unpricedReason: !existing && price === null ? 'No price on the piece yet.' : null,
      supplier: null,
      supplierUrl: p.supplierUrl && isWebLink(p.supplierUrl) ? p.supplierUrl : null,
      code: null,
      colourHex: null,
    };
  });
}

// Two places of a litre (10 mL) in words: finer than any tin, and what a person reads.
const litreText = (l: number) => `${Math.round(l * 100) / 100} L`;

function paintLine(need: PaintNeed): ScheduleLine {
  const { finish } = need;
  const perM2 = finish.priceUnit === 'm2';
  // A paint's price is per litre unless it is given per m² of wall (a painter's rate, all coats).
  const quantity = perM2 ? need.areaM2 : need.tins.totalL;
  return {
    ...finishLineBase(finish, need.surfaces),
    detail: `${surfaceLabel(need.surfaces)} · ${need.coats} coat${need.coats === 1 ? '' : 's'} at ${need.coverageM2PerL} m²/L`,
    quantity,
    quantityUnit: perM2 ? 'm2' : 'L',
    quantityNote: `${describeTins(need.tins)} for ${litreText(need.litres)}`,
    unitPrice: finish.price,
    priceUnit: finish.price === null ? null : perM2 ? 'm2' : 'L',
    total: finish.price === null ? null : roundMoney(finish.price * quantity),
    unpricedReason: finish.price === null ? 'No price on the paint yet.' : null,
    colourHex: finish.colourHex,
  };
}

function coveringLine(need: CoveringNeed): ScheduleLine {
  const { finish } = need;
  const boughtM2 = need.units !== null && need.unitCoverageM2 !== null ? need.units * need.unitCoverageM2 : need.orderAreaM2;
  const unitsNote =
    need.units !== null
      ? `${need.units} × ${need.unitCoverageM2} m² for ${need.orderAreaM2} m² with ${need.wastePercent} % waste`
      : `${need.areaM2} m² + ${need.wastePercent} % waste`;
  const base = {
    ...finishLineBase(finish, need.surfaces),
    detail: surfaceLabel(need.surfaces),
    quantityNote: unitsNote,
    colourHex: null,
  };
  if (finish.priceUnit === 'unit') {
    const total = finish.price !== null && need.units !== null ? roundMoney(finish.price * need.units) : null;
    return {
      ...base,
      quantity: need.units ?? need.orderAreaM2,
      quantityUnit: need.units !== null ? 'unit' : 'm2',
      unitPrice: finish.price,
      priceUnit: finish.price === null ? null : 'unit',
      total,
      unpricedReason:
        finish.price === null
          ? 'No price on the finish yet.'
          : need.units === null
            ? 'Priced per box or roll: enter what one covers.'
            : null,
    };
  }
  // Priced per m² (or not yet priced): full boxes are what is paid for, when their size is known.
  const quantity = roundQuantity(boughtM2);
  return {
    ...base,
    quantity,
    quantityUnit: 'm2',
    unitPrice: finish.price,
    priceUnit: finish.price === null ? null : 'm2',
    total: finish.price === null ? null : roundMoney(finish.price * quantity),
    unpricedReason: finish.price === null ? 'No price on the finish yet.' : null,
  };
}

function finishLineBase(finish: FinishInfo, surfaces: SurfaceSet) {
  return {
    key: finish.id,
    section: 'finish' as const,
    name: finish.name,
    status: null,
    sizeMm: null,
    detail: surfaceLabel(surfaces),
    supplier: finish.supplier,
    supplierUrl: null,
    code: finish.code,
  };
}

function missingLine(need: MissingNeed): ScheduleLine {
  return {
    key: need.finishId,
    section: 'finish',
    name: 'A finish no longer in the library',
    status: null,
    sizeMm: null,
    detail: surfaceLabel(need.surfaces),
    quantity: need.areaM2,
    quantityUnit: 'm2',
    quantityNote: null,
    unitPrice: null,
    priceUnit: null,
    total: null,
    unpricedReason: 'Choose another finish for these surfaces.',
    supplier: null,
    supplierUrl: null,
    code: null,
    colourHex: null,
  };
}

/**
 * The schedule of an option in its room (plan mm): placed pieces (identical name, size, price and
 * status grouped), then finishes by surface order, with quantities, unit prices and totals (2
 * decimals). The budget is new pieces plus finishes; lines without a price are left out of it and
 * counted.
 */
export function buildSchedule(shell: RoomShell, doc: OptionDoc, finishes: FinishLookup, settings: TakeoffSettings): Schedule {
  const placed = doc.pieces.filter((p) => p.placed);
  const takeoff = roomTakeoff(shell, doc.finishes, finishes, settings);
  const pieces = pieceLines(placed, finishes);
  const finishRows = [
    ...takeoff.coverings.map(coveringLine),
    ...takeoff.paints.map(paintLine),
    ...takeoff.missing.map(missingLine),
  ];
  const sum = (lines: ScheduleLine[]) => roundMoney(lines.reduce((s, l) => s + (l.total ?? 0), 0));
  const newPieces = pieces.filter((l) => l.status === 'new');
  const newPiecesCost = sum(newPieces);
  const finishesCost = sum(finishRows);
  const lines = [...pieces, ...finishRows];
  return {
    lines,
    totals: {
      newPiecesCost,
      finishesCost,
      budget: roundMoney(newPiecesCost + finishesCost),
      newPieceCount: placed.filter((p) => p.status === 'new').length,
      existingPieceCount: placed.filter((p) => p.status === 'existing').length,
      unpricedCount: lines.filter((l) => l.total === null).length,
    },
    heldPieceCount: doc.pieces.length - placed.length,
    takeoff,
  };
}

// ——— Comparing options ———

/** Grid cell for measuring free floor, mm: 2 cm keeps the share within a fraction of a per cent. */
export const FREE_FLOOR_CELL_MM = 20;
/**
 * The most cells the free-floor grid may have: a 10 m × 10 m box at 2 cm. A larger room gets
 * coarser cells, so a 1,000 m² room costs what a 100 m² one does (its share, to one decimal, is
 * no less exact: each cell is a smaller part of the floor).
 */
export const MAX_FREE_FLOOR_CELLS = 250_000;

/** The free-floor grid's cell for an outline (plan mm): 20 mm, or coarser to stay within MAX_FREE_FLOOR_CELLS. */
export function freeFloorCellMm(outline: readonly (readonly [number, number])[]): number {
  const { minX, minY, maxX, maxY } = boundsMm(outline);
  return Math.max(FREE_FLOOR_CELL_MM, Math.ceil(Math.sqrt(((maxX - minX) * (maxY - minY)) / MAX_FREE_FLOOR_CELLS)));
}

/**
 * The share (0–1) of a room's floor (plan mm) not under a placed piece one walks round: rugs and
 * pieces mounted overhead leave the floor free, as in the fit check.
 */
export function freeFloorShare(shell: RoomShell, pieces: readonly Piece[]): number {
  const obstacles = placedBoxes(pieces).filter((b) => blocksWalking(b.piece));
  const grid = rasteriseFloor(shell.outline, obstacles, freeFloorCellMm(shell.outline));
  let inside = 0;
  let free = 0;
  for (const label of grid.label) {
    if (label === WALL) continue;
    inside++;
    if (label === FREE) free++;
  }
  return inside === 0 ? 0 : free / inside;
}

export interface OptionComparison {
  budget: number;
  unpricedCount: number;
  newPieceCount: number;
  findingCount: number;
  /** Free floor as a percentage, one decimal. */
  freeFloorPercent: number;
}

/** The figures the compare table puts side by side for one option of a room (plan mm). */
export function compareOption(
  shell: RoomShell,
  doc: OptionDoc,
  finishes: FinishLookup,
  settings: TakeoffSettings,
): OptionComparison {
  const { totals } = buildSchedule(shell, doc, finishes, settings);
  return {
    budget: totals.budget,
    unpricedCount: totals.unpricedCount,
    newPieceCount: totals.newPieceCount,
    findingCount: checkFit(shell, doc.pieces).length,
    freeFloorPercent: Math.round(freeFloorShare(shell, doc.pieces) * 1000) / 10,
  };
}

// ——— API answers (shared so the client reads the same shapes) ———

export interface OptionRef {
  id: string;
  label: string;
}

export interface ProjectTakeoffAnswer {
  project: { id: string; name: string };
  settings: TakeoffSettings;
  rooms: {
    id: string;
    name: string;
    options: OptionRef[];
    counted: OptionRef | null;
    chosenOptionId: string | null;
    takeoff: RoomTakeoff | null;
  }[];
  totals: ProjectTakeoff;
}

export interface ScheduleAnswer {
  project: { id: string; name: string };
  /** The studio's currency and locale for the prices. */
  money?: MoneySettings;
  /** Whom the project is for, for the printed schedule's header. */
  client?: { name: string };
  room: { id: string; name: string };
  option: OptionRef & { note: string };
  settings: TakeoffSettings;
  schedule: Schedule;
}

export interface CompareAnswer {
  project: { id: string; name: string };
  money?: MoneySettings;
  settings: TakeoffSettings;
  rooms: {
    id: string;
    name: string;
    chosenOptionId: string | null;
    options: (OptionRef & OptionComparison & { chosen: boolean })[];
  }[];
}
