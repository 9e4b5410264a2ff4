// Heights and depths a form sets by itself, each beside the published range it must fall in. The
// form uses the default when the box allows and shrinks it in proportion when the box is smaller;
// forms.test.ts holds every default to its range.

export interface RangedDefault {
  valueMm: number;
  minMm: number;
  maxMm: number;
  source: string;
}

const MEMORY = 'memory, not read here';

/** Sofa and armchair seat: floor to the top of the seat cushion. */
export const SOFA_SEAT_HEIGHT: RangedDefault = {
  valueMm: 440,
  minMm: 400,
  maxMm: 480,
  source: `trade convention for upholstered seating, 400–480 mm (${MEMORY}); Panero & Zelnik, Human Dimension & Interior Space (1979), lounge seating`,
};
/** Sofa and armchair seat: front edge of the cushion to the backrest. */
export const SOFA_SEAT_DEPTH: RangedDefault = {
  valueMm: 550,
  minMm: 500,
  maxMm: 600,
  source: `trade convention for upholstered seating, 500–600 mm (${MEMORY})`,
};
/** Dining chair seat height. */
export const CHAIR_SEAT_HEIGHT: RangedDefault = {
  valueMm: 450,
  minMm: 430,
  maxMm: 480,
  source: `trade convention for dining chairs, 430–480 mm (${MEMORY}); BS EN 1729-1:2015 size mark 6 seat height 430 mm is at the low end (${MEMORY})`,
};
/** Dining chair seat depth. */
export const CHAIR_SEAT_DEPTH: RangedDefault = {
  valueMm: 420,
  minMm: 380,
  maxMm: 460,
  source: `common practice for dining chairs, 380–460 mm (${MEMORY})`,
};
/** Dining table top above the floor. */
export const DINING_TABLE_HEIGHT: RangedDefault = {
  valueMm: 740,
  minMm: 720,
  maxMm: 760,
  source: `trade convention for dining tables, 720–760 mm (${MEMORY})`,
};
/** A work desk's top above the floor. */
export const DESK_HEIGHT: RangedDefault = {
  valueMm: 740,
  minMm: 720,
  maxMm: 760,
  source: `EN 527-1 (office work tables), non-adjustable desk 740 ± 20 mm (${MEMORY})`,
};
/** Kitchen worktop above the floor. */
export const WORKTOP_HEIGHT: RangedDefault = {
  valueMm: 900,
  minMm: 870,
  maxMm: 940,
  source: `trade convention, 900 mm in the UK and EU (36 in, 914 mm, in the US) (${MEMORY})`,
};
/** Top of the mattress above the floor on a framed bed. */
export const MATTRESS_TOP: RangedDefault = {
  valueMm: 500,
  minMm: 450,
  maxMm: 550,
  source: `common practice for a standard bed frame, 450–550 mm (${MEMORY})`,
};
/** Shelf pitch of a bookcase or open shelving, board to board. */
export const SHELF_SPACING: RangedDefault = {
  valueMm: 330,
  minMm: 250,
  maxMm: 400,
  source: `common practice: ordinary hardbacks stand 240–300 mm tall, shelves 250–400 mm apart (${MEMORY})`,
};
/** A seat cushion is at most this wide; a longer sofa gets another cushion rather than wider ones. */
export const SEAT_CUSHION_MAX_WIDTH: RangedDefault = {
  valueMm: 750,
  minMm: 550,
  maxMm: 800,
  source: `common practice: one sitter per cushion, 550–800 mm a cushion (${MEMORY})`,
};

/** The default when the box has room for it, else the same share of what there is. */
export function fitDefault(d: RangedDefault, available: number, share: number): number {
  return Math.min(d.valueMm, available * share);
}
