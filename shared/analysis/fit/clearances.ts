// How much clear floor a person needs to reach a piece, by what the piece is (its kind): most pieces
// need the full walkway at their front; a few are used from close by, and published figures say how
// close. A piece typed by hand with no kind is judged by its shape (a low table before a seat).
import type { Piece } from '../../schemas/option';
import type { PieceKind } from '../../schemas/piece-kind';
import { MM_PER_INCH } from '../../units/length';

/** Clear width of a main walkway, mm: ≈ 900 mm, matching IRC R311.6 hallway 36 in and ADA §403.5.1 (common practice; docs/references.md). */
export const DEFAULT_WALKWAY_MM = 900;
/** The walkway widths the check accepts, mm: narrower is not a route, wider is not a walkway (Parlour's own bounds). */
export const MIN_WALKWAY_MM = 300;
export const MAX_WALKWAY_MM = 2000;

/** Beside a bed on the side people walk: at least 22 in (HUD Manual of Acceptable Practices vol. 4, 1973; summary). */
export const BED_SIDE_MM = 22 * MM_PER_INCH;
/** Beside a double bed on its least-used side: at least 12 in (HUD Manual of Acceptable Practices vol. 4, 1973; summary). */
export const BED_LEAST_USED_SIDE_MM = 12 * MM_PER_INCH;
/**
 * A bed at least this wide (mm) is a double, slept in by two and reached from both long sides: the
 * narrowest double mattress, the UK small double 120 cm (National Bed Federation sizes, summary;
 * docs/references.md). The box is taken as the mattress's width: a frame adds only a few centimetres.
 * A narrower bed (a single) may stand with one long side against a wall.
 */
export const DOUBLE_BED_MIN_WIDTH_MM = 1200;
/** Behind a seated diner where nobody passes: 32 in (NKBA Kitchen Planning Guideline 8, 2012/13 ed.; summary). */
export const BEHIND_DINER_MM = 32 * MM_PER_INCH;
/** Sofa to coffee table 35–45 cm: the low end, as the least that still works (common practice; an editable default). */
export const COFFEE_TABLE_REACH_MM = 350;
/** A side or bedside table is reached from the seat or bed beside it (common practice, no source). */
export const SIDE_TABLE_REACH_MM = 300;

/** What a piece of each kind needs beside it, mm, where that is less than a walkway; every other kind needs the walkway. */
const KIND_REACH_MM: Partial<Record<PieceKind, number>> = {
  'coffee-table': COFFEE_TABLE_REACH_MM,
  'side-table': SIDE_TABLE_REACH_MM,
  'bedside-table': SIDE_TABLE_REACH_MM,
  'dining-table': BEHIND_DINER_MM,
  'dining-set': BEHIND_DINER_MM,
  bed: BED_SIDE_MM,
};

/**
 * The clear width (mm) needed to reach this piece: the walkway width, or less for kinds used from
 * close by. Only the kind counts, never the name; a piece with no kind is a plain block.
 */
export function reachWidthMm(piece: Pick<Piece, 'kind'>, walkwayMm: number): number {
  const needMm = KIND_REACH_MM[piece.kind ?? 'plain-block'];
  return needMm === undefined ? walkwayMm : Math.min(walkwayMm, needMm);
}

/** Kinds a person sits on facing their front. */
export const SEAT_KINDS: readonly PieceKind[] = ['sofa', 'corner-sofa', 'armchair', 'bench', 'dining-chair'];
/**
 * A low table's top is at most this high above the floor, mm: 480 mm, the top of the usual sofa
 * seat height 400–480 mm (coffee tables stand 350–450 mm; both docs/references.md, status memory).
 * A top no higher than the seat is used from it (common practice).
 */
export const LOW_TABLE_MAX_HEIGHT_MM = 480;
/** Kinds that, when low and before a seat, are used from the seat; a piece with no kind counts by its shape alone. */
export const USED_FROM_SEAT_KINDS: readonly PieceKind[] = ['coffee-table', 'side-table', 'ottoman', 'plain-block'];
/** A low table this far (mm) or nearer in front of a seat is used from it: the high end of sofa to coffee table 35–45 cm (common practice). */
export const SEAT_TO_TABLE_MAX_MM = 450;
/** Kinds used from any side a person sits or stands at: tables, desks and ottomans. */
export const ANY_SIDE_KINDS: readonly PieceKind[] = [
  'dining-table',
  'dining-set',
  'coffee-table',
  'side-table',
  'bedside-table',
  'desk',
  'ottoman',
];
/**
 * How wide a stretch of a seat's front must be clear for a person to sit down there, mm: an adult's
 * shoulders with the arms at the sides and a little room to turn, 600 mm (common practice).
 */
export const PERSON_WIDTH_MM = 600;
