// The schedule of an option: every placed piece with its price (identical ones on one line), then
// its finishes with the quantities the take-off gives, and the option's budget. Prices stay plain
// numbers in the studio's own currency.
import type { RoomShell } from '../schemas/room';
import { isWebLink, type OptionDoc, type Piece } from '../schemas/option';
import { roundQuantity } from './takeoff';
import type { TakeoffSettings } from './takeoff-settings';
import { describeTins } from './tins';
import {
  roomTakeoff,
  surfaceLabel,
  type CoveringNeed,
  type FinishInfo,
  type FinishLookup,
  type MissingNeed,
  type PaintNeed,
  type RoomTakeoff,
  type SurfaceSet,
} from './finish-takeoff';

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
