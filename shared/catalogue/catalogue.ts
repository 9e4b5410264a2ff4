// Ready-sized pieces to start a layout from. Sizes are plan mm: width along the piece's own x,
// depth along its own y (its front faces +y), height from its underside. Every entry names where its
// size comes from; only mattress sizes have a published source, the rest are trade rules of thumb.
import { MM_PER_INCH } from '../units/length';
import type { Piece } from '../schemas/option';
import type { PieceKind, PieceSettings } from '../schemas/piece-kind';
import type { PlanPoint } from '../schemas/room';

/** Furniture sizes recalled from common practice; no published source was read for them. */
const COMMON_PRACTICE = 'common practice (recalled typical size, no published source)';
const NBF = 'National Bed Federation sizes (summary)';
const CONTINENTAL = 'trade convention for continental mattresses (summary)';
const US_CHARTS = 'sleep-industry consumer charts (summary), inches converted at 1 in = 25.4 mm exactly (NIST SP 811 §B.6)';

/** A bed frame is this much wider than its mattress, 50 mm a side (common practice). */
export const BED_FRAME_WIDTH_ALLOWANCE_MM = 100;
/** A bed frame is this much longer than its mattress, headboard plus foot rail (common practice). */
export const BED_FRAME_LENGTH_ALLOWANCE_MM = 150;
/** Floor to the top of a bed's headboard, mm (common practice); the mattress top is lower (MATTRESS_TOP in the forms' ergonomics). */
export const BED_HEIGHT_MM = 1000;
/** Underside of a wall cabinet above the floor, mm (common practice). */
export const WALL_CABINET_ELEVATION_MM = 1400;

/** Underside of a wall shelf, mm (common practice). */
export const WALL_SHELF_ELEVATION_MM = 1500;
/** Underside of kitchen wall units, mm: worktop 900 plus about 500 clear above it (common practice). */
export const KITCHEN_WALL_UNIT_ELEVATION_MM = 1400;
/** Lowest point of a pendant light over a table, mm (common practice). */
export const PENDANT_ELEVATION_MM = 1500;
/** Underside of a hung picture or mirror, mm (common practice). */
export const PICTURE_ELEVATION_MM = 1200;
/** Underside of a radiator above the floor, mm (common practice). */
export const RADIATOR_ELEVATION_MM = 150;

export const CATALOGUE_GROUPS = ['seating', 'tables', 'beds', 'storage', 'kitchen', 'lighting', 'rugs', 'other'] as const;
export type CatalogueGroup = (typeof CATALOGUE_GROUPS)[number];

export type MattressStandard = 'uk' | 'continental' | 'us';

/** The mattress a bed entry is built round, mm, with the size name it is sold under. */
export interface Mattress {
  standard: MattressStandard;
  sizeName: string;
  widthMm: number;
  lengthMm: number;
  source: string;
}

/** One ready-sized piece: box sizes in mm, where the sizes come from, and for beds the mattress inside. */
export interface CatalogueEntry {
  /** The catalogue's own id, e.g. 'sofa-3-seat' or 'bed-us-queen'. */
  id: string;
  /** What a piece added from this entry is. */
  kind: PieceKind;
  settings?: PieceSettings;
  name: string;
  group: CatalogueGroup;
  width: number;
  depth: number;
  height: number;
  elevation?: number;
  note?: string;
  source: string;
  mattress?: Mattress;
}

function bed<K extends string>(id: K, name: string, mattress: Mattress): CatalogueEntry & { id: K } {
  return {
    id,
    kind: 'bed',
    name,
    group: 'beds',
    width: mattress.widthMm + BED_FRAME_WIDTH_ALLOWANCE_MM,
    depth: mattress.lengthMm + BED_FRAME_LENGTH_ALLOWANCE_MM,
    height: BED_HEIGHT_MM,
    note: `Mattress ${Math.round(mattress.widthMm / 10)} × ${Math.round(mattress.lengthMm / 10)} cm plus a frame; the head goes against the wall.`,
    source: `mattress: ${mattress.source}; frame allowance and height: common practice`,
    mattress,
  };
}

function metricBed<K extends string>(
  id: K,
  name: string,
  standard: 'uk' | 'continental',
  sizeName: string,
  widthCm: number,
  lengthCm: number,
): CatalogueEntry & { id: K } {
  return bed(id, name, {
    standard,
    sizeName,
    widthMm: widthCm * 10,
    lengthMm: lengthCm * 10,
    source: standard === 'uk' ? NBF : CONTINENTAL,
  });
}

function usBed<K extends string>(
  id: K,
  name: string,
  sizeName: string,
  widthIn: number,
  lengthIn: number,
): CatalogueEntry & { id: K } {
  return bed(id, name, {
    standard: 'us',
    sizeName,
    widthMm: widthIn * MM_PER_INCH,
    lengthMm: lengthIn * MM_PER_INCH,
    source: US_CHARTS,
  });
}

function common<K extends string>(
  id: K,
  kind: PieceKind,
  name: string,
  group: CatalogueGroup,
  width: number,
  depth: number,
  height: number,
  extra: Pick<CatalogueEntry, 'note' | 'elevation' | 'settings'> = {},
): CatalogueEntry & { id: K } {
  return { id, kind, name, group, width, depth, height, ...extra, source: COMMON_PRACTICE };
}

/** Every catalogue entry, in the order the Furnish step lists them. */
export const CATALOGUE = [
  common('sofa-2-seat', 'sofa', 'Two-seat sofa', 'seating', 1700, 900, 850),
  common('sofa-3-seat', 'sofa', 'Three-seat sofa', 'seating', 2100, 900, 850),
  common('sofa-corner', 'corner-sofa', 'Corner sofa', 'seating', 2600, 1700, 850, {
    note: 'Drawn as the box round both arms of the L.',
    settings: { hand: 'right' },
  }),
  common('armchair', 'armchair', 'Armchair', 'seating', 850, 850, 900),
  common('dining-chair', 'dining-chair', 'Dining chair', 'seating', 450, 520, 880),
  common('stool', 'stool', 'Stool', 'seating', 380, 380, 650, { settings: { top: 'round' } }),
  common('bench', 'bench', 'Bench', 'seating', 1200, 380, 450),
  common('ottoman', 'ottoman', 'Ottoman', 'seating', 700, 700, 420),
  common('coffee-table', 'coffee-table', 'Coffee table', 'tables', 1100, 600, 420),
  common('side-table', 'side-table', 'Side table', 'tables', 500, 500, 550, { settings: { top: 'round' } }),
  common('desk', 'desk', 'Desk', 'tables', 1200, 600, 740),
  common('dining-table', 'dining-table', 'Dining table', 'tables', 1600, 900, 740),
  common('dining-table-round', 'dining-table', 'Round dining table', 'tables', 1100, 1100, 740, { settings: { top: 'round' } }),
  common('dining-table-4', 'dining-set', 'Dining table with 4 chairs', 'tables', 1200, 1700, 900, {
    note: 'Table 120 × 80 cm with two chairs tucked in on each long side; the height is the chair backs.',
    settings: { chairs: 4 },
  }),
  common('dining-table-6', 'dining-set', 'Dining table with 6 chairs', 'tables', 1800, 1800, 900, {
    note: 'Table 180 × 90 cm with three chairs tucked in on each long side; the height is the chair backs.',
    settings: { chairs: 6 },
  }),
  metricBed('bed-uk-single', 'Single bed', 'uk', 'Single', 90, 190),
  metricBed('bed-uk-small-double', 'Small double bed', 'uk', 'Small double', 120, 190),
  metricBed('bed-uk-double', 'Double bed', 'uk', 'Double', 135, 190),
  metricBed('bed-uk-king', 'King bed', 'uk', 'King', 150, 200),
  metricBed('bed-uk-super-king', 'Super king bed', 'uk', 'Super king', 180, 200),
  metricBed('bed-continental-90', 'Continental single bed 90', 'continental', '90 × 200', 90, 200),
  metricBed('bed-continental-140', 'Continental double bed 140', 'continental', '140 × 200', 140, 200),
  metricBed('bed-continental-160', 'Continental double bed 160', 'continental', '160 × 200', 160, 200),
  metricBed('bed-continental-180', 'Continental double bed 180', 'continental', '180 × 200', 180, 200),
  usBed('bed-us-twin', 'Twin bed', 'Twin', 38, 75),
  usBed('bed-us-twin-xl', 'Twin XL bed', 'Twin XL', 38, 80),
  usBed('bed-us-full', 'Full bed', 'Full', 54, 75),
  usBed('bed-us-queen', 'Queen bed', 'Queen', 60, 80),
  usBed('bed-us-king', 'King bed (US)', 'King', 76, 80),
  usBed('bed-us-california-king', 'California King bed', 'California King', 72, 84),
  common('cot', 'cot', 'Cot', 'beds', 1260, 660, 900, { note: 'For a 120 × 60 cm cot mattress.' }),
  common('bedside-table', 'bedside-table', 'Bedside table', 'storage', 450, 400, 550),
  common('wardrobe', 'wardrobe', 'Wardrobe', 'storage', 1000, 600, 2000, {
    note: 'Two doors; leave room in front for them to open.',
    settings: { count: 2 },
  }),
  common('chest-of-drawers', 'chest-of-drawers', 'Chest of drawers', 'storage', 800, 450, 800),
  common('bookcase', 'bookcase', 'Bookcase', 'storage', 800, 300, 1800),
  common('open-shelving', 'open-shelving', 'Open shelving', 'storage', 1000, 350, 1800),
  common('tv-unit', 'media-unit', 'TV unit', 'storage', 1600, 400, 500),
  common('sideboard', 'sideboard', 'Sideboard', 'storage', 1600, 450, 800),
  common('wall-shelf', 'wall-shelf', 'Wall shelf', 'storage', 1000, 250, 40, { elevation: WALL_SHELF_ELEVATION_MM }),
  common('wall-cabinet', 'wall-cabinet', 'Wall cabinet', 'storage', 800, 350, 700, {
    elevation: WALL_CABINET_ELEVATION_MM,
    note: 'Hung on the wall; the elevation is its underside.',
  }),
  common('kitchen-base-unit', 'kitchen-base-unit', 'Kitchen base unit with worktop', 'kitchen', 600, 600, 900),
  common('kitchen-wall-unit', 'kitchen-wall-unit', 'Kitchen wall unit', 'kitchen', 600, 330, 720, {
    elevation: KITCHEN_WALL_UNIT_ELEVATION_MM,
  }),
  common('oven-housing', 'oven-housing', 'Oven housing', 'kitchen', 600, 600, 2100),
  common('dishwasher', 'dishwasher', 'Dishwasher', 'kitchen', 600, 600, 900),
  common('rug', 'rug', 'Rug', 'rugs', 2000, 1400, 10),
  common('rug-round', 'rug', 'Round rug', 'rugs', 1600, 1600, 10, { settings: { top: 'round' } }),
  common('floor-lamp', 'floor-lamp', 'Floor lamp', 'lighting', 450, 450, 1600),
  common('table-lamp', 'table-lamp', 'Table lamp', 'lighting', 300, 300, 500),
  common('pendant-light', 'pendant-light', 'Pendant light', 'lighting', 400, 400, 700, {
    elevation: PENDANT_ELEVATION_MM,
    note: 'Hangs from the ceiling: the elevation is its lowest point.',
  }),
  common('mirror', 'mirror', 'Mirror', 'other', 600, 30, 900, { elevation: PICTURE_ELEVATION_MM }),
  common('picture', 'picture', 'Picture', 'other', 700, 30, 500, { elevation: PICTURE_ELEVATION_MM }),
  common('plant', 'plant', 'Plant in a pot', 'other', 500, 500, 1200),
  common('radiator', 'radiator', 'Radiator', 'other', 1000, 100, 600, { elevation: RADIATOR_ELEVATION_MM }),
  common('custom-box', 'plain-block', 'Box', 'other', 1000, 600, 800, {
    note: 'Any piece not in the catalogue: set its size and name.',
  }),
];

/** The ids of the catalogue, e.g. 'sofa-3-seat' or 'bed-us-queen'. */
export type CatalogueId = (typeof CATALOGUE)[number]['id'];

/** The catalogue entry of an id; throws for an id the catalogue does not have (a stale saved id). */
export function catalogueEntry(catalogueId: CatalogueId): CatalogueEntry {
  const entry = CATALOGUE.find((e) => e.id === catalogueId);
  if (!entry) throw new Error(`The catalogue has no ${String(catalogueId)}.`);
  return entry;
}

/** A new piece from a catalogue entry centred at `at` (plan mm), unturned, placed in the room; its id comes from the caller. */
export function pieceFromCatalogue(catalogueId: CatalogueId, id: string, at: PlanPoint): Piece {
  const entry = catalogueEntry(catalogueId);
  return {
    id,
    name: entry.name,
    kind: entry.kind,
    ...(entry.settings ? { settings: { ...entry.settings } } : {}),
    x: at[0],
    y: at[1],
    width: entry.width,
    depth: entry.depth,
    height: entry.height,
    rotation: 0,
    elevation: entry.elevation ?? 0,
    status: 'new',
    placed: true,
  };
}
