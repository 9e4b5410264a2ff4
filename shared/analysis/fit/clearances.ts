// How much clear floor a person needs to reach the front of a piece, by what the piece is. Most
// pieces need the full walkway; a few are used from close by, and published figures say how close.
import type { Piece } from '../../schemas/option';
import { MM_PER_INCH } from '../../units/length';

/** Clear width of a main walkway, mm: ≈ 900 mm, matching IRC R311.6 hallway 36 in and ADA §403.5.1 (common practice; docs/references.md). */
export const DEFAULT_WALKWAY_MM = 900;
/** The walkway widths the check accepts, mm: narrower is not a route, wider is not a walkway (Parlour's own bounds). */
export const MIN_WALKWAY_MM = 300;
export const MAX_WALKWAY_MM = 2000;

/** Beside a bed on the side people walk: at least 22 in (HUD Manual of Acceptable Practices vol. 4, 1973; summary). */
export const BED_SIDE_MM = 22 * MM_PER_INCH;
/** Behind a seated diner where nobody passes: 32 in (NKBA Kitchen Planning Guideline 8, 2012/13 ed.; summary). */
export const BEHIND_DINER_MM = 32 * MM_PER_INCH;
/** Sofa to coffee table 35–45 cm: the low end, as the least that still works (common practice; an editable default). */
export const COFFEE_TABLE_REACH_MM = 350;
/** A side or bedside table is reached from the seat or bed beside it (common practice, no source). */
export const SIDE_TABLE_REACH_MM = 300;

type Need = { match: RegExp; requiredMm: number };

// Catalogue kinds first (they are exact), then words in the piece's name for pieces typed by hand.
const NEEDS: Need[] = [
  { match: /coffee[- ]table/i, requiredMm: COFFEE_TABLE_REACH_MM },
  { match: /(side|bedside|night)[- ]?(table|stand)/i, requiredMm: SIDE_TABLE_REACH_MM },
  { match: /dining[- ]table|^dining-set$/i, requiredMm: BEHIND_DINER_MM },
  { match: /\bbed\b|^bed-/i, requiredMm: BED_SIDE_MM },
];

/** The clear width (mm) needed to reach this piece's front: the walkway width, or less for pieces used from close by. */
export function reachWidthMm(piece: Pick<Piece, 'kind' | 'name'>, walkwayMm: number): number {
  for (const text of [piece.kind ?? '', piece.name]) {
    const need = NEEDS.find((n) => n.match.test(text));
    if (need) return Math.min(walkwayMm, need.requiredMm);
  }
  return walkwayMm;
}
