// Take-off by finish: which finish covers how much of a room with one option's assignments, the
// paint and tins per colour, flooring and other photo finishes with waste and whole boxes, and a
// project's totals over its rooms. Pure: the room shell in plan mm, quantities out in m² and litres.
import type { RoomShell } from '../schemas/room';
import type { FinishAssignments } from '../schemas/option';
import type { FinishCategory, PriceUnit } from '../schemas/finish';
import { computeTakeoff, roundQuantity } from './takeoff';
import type { TakeoffSettings } from './takeoff-settings';
import { chooseTins, type TinPlan } from './tins';

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
    add(assignments.floor, takeoff.floorAreaM2, (s) => {
      s.floor = true;
    });
  else bare.floorM2 = takeoff.floorAreaM2;
  for (const wall of takeoff.walls) {
    const finishId = assignments.wallOverrides[String(wall.index)] ?? assignments.walls;
    if (finishId)
      add(finishId, wall.netAreaM2, (s) => {
        s.walls.push(wall.index);
      });
    else bare.wallsM2 += wall.netAreaM2;
  }
  if (assignments.ceiling)
    add(assignments.ceiling, takeoff.ceilingAreaM2, (s) => {
      s.ceiling = true;
    });
  else bare.ceilingM2 = takeoff.ceilingAreaM2;
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
    floorAreaM2: takeoff.floorAreaM2,
    netWallAreaM2: takeoff.netWallAreaM2,
    ceilingAreaM2: takeoff.ceilingAreaM2,
    skirtingM: takeoff.skirtingM,
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
