// What a piece is (its kind) and the few choices that change how it is drawn (its settings). The
// box (width, depth, height) stays what every check measures; the kind only shapes what is drawn
// inside it.
import { z } from 'zod';

export const PIECE_KINDS = [
  'sofa',
  'corner-sofa',
  'armchair',
  'dining-chair',
  'stool',
  'bench',
  'ottoman',
  'dining-table',
  'dining-set',
  'coffee-table',
  'side-table',
  'bedside-table',
  'desk',
  'bed',
  'cot',
  'wardrobe',
  'chest-of-drawers',
  'sideboard',
  'media-unit',
  'open-shelving',
  'bookcase',
  'wall-shelf',
  'wall-cabinet',
  'kitchen-base-unit',
  'kitchen-wall-unit',
  'oven-housing',
  'dishwasher',
  'rug',
  'floor-lamp',
  'table-lamp',
  'pendant-light',
  'mirror',
  'picture',
  'plant',
  'radiator',
  'plain-block',
] as const;

export const pieceKindSchema = z.enum(PIECE_KINDS, { message: 'must be one of the piece kinds, e.g. sofa, bed or plain-block' });
export type PieceKind = z.infer<typeof pieceKindSchema>;

/** Every choice a kind may offer; which ones a kind takes is in KIND_SETTINGS. */
export const pieceSettingsSchema = z.object({
  /** Seating: arms on both ends or none. */
  arms: z.enum(['both', 'none']).optional(),
  /** Standing on legs or on a closed plinth. */
  base: z.enum(['legs', 'plinth']).optional(),
  /** Corner sofa: the side the long return runs to, seen from the front. */
  hand: z.enum(['left', 'right']).optional(),
  /** Tables, stools, ottomans and rugs: a round or a square-cornered top. */
  top: z.enum(['rectangular', 'round']).optional(),
  /** Storage: doors or drawers on the front. */
  fronts: z.enum(['doors', 'drawers']).optional(),
  /** Storage: how many doors, drawers or shelves. */
  count: z.number().int().min(1, { message: 'must be at least 1' }).max(12, { message: 'must be 12 or fewer' }).optional(),
  /** Dining set: how many chairs round the table. */
  chairs: z.number().int().min(2, { message: 'must be at least 2' }).max(12, { message: 'must be 12 or fewer' }).optional(),
  /** Bed: headboard height above the floor, mm. */
  headboardHeight: z
    .number()
    .finite()
    .min(0, { message: 'cannot be below the floor' })
    .max(2000, { message: 'must be 2000 mm or less' })
    .optional(),
  /** Bed: a raised board at the foot. */
  footboard: z.boolean().optional(),
});
export type PieceSettings = z.infer<typeof pieceSettingsSchema>;
export type PieceSettingKey = keyof PieceSettings;

/** The settings each kind takes; any other setting on a piece of that kind is refused. */
export const KIND_SETTINGS: Record<PieceKind, readonly PieceSettingKey[]> = {
  sofa: ['arms', 'base'],
  'corner-sofa': ['hand', 'arms', 'base'],
  armchair: ['arms', 'base'],
  'dining-chair': [],
  stool: ['top'],
  bench: ['base'],
  ottoman: ['top'],
  'dining-table': ['top'],
  'dining-set': ['top', 'chairs'],
  'coffee-table': ['top'],
  'side-table': ['top'],
  'bedside-table': ['count'],
  desk: ['count'],
  bed: ['headboardHeight', 'footboard', 'base'],
  cot: [],
  wardrobe: ['count'],
  'chest-of-drawers': ['count'],
  sideboard: ['fronts', 'count'],
  'media-unit': ['fronts', 'count'],
  'open-shelving': ['count'],
  bookcase: ['count'],
  'wall-shelf': [],
  'wall-cabinet': ['count'],
  'kitchen-base-unit': ['fronts', 'count'],
  'kitchen-wall-unit': ['count'],
  'oven-housing': [],
  dishwasher: [],
  rug: ['top'],
  'floor-lamp': [],
  'table-lamp': [],
  'pendant-light': [],
  mirror: [],
  picture: [],
  plant: [],
  radiator: [],
  'plain-block': [],
};

/** The kind's name as the designer reads it in lists. */
export const KIND_LABELS: Record<PieceKind, string> = {
  sofa: 'Sofa',
  'corner-sofa': 'Corner sofa',
  armchair: 'Armchair',
  'dining-chair': 'Dining chair',
  stool: 'Stool',
  bench: 'Bench',
  ottoman: 'Ottoman',
  'dining-table': 'Dining table',
  'dining-set': 'Dining table with chairs',
  'coffee-table': 'Coffee table',
  'side-table': 'Side table',
  'bedside-table': 'Bedside table',
  desk: 'Desk',
  bed: 'Bed',
  cot: 'Cot',
  wardrobe: 'Wardrobe',
  'chest-of-drawers': 'Chest of drawers',
  sideboard: 'Sideboard',
  'media-unit': 'Media unit',
  'open-shelving': 'Open shelving',
  bookcase: 'Bookcase',
  'wall-shelf': 'Wall shelf',
  'wall-cabinet': 'Wall cabinet',
  'kitchen-base-unit': 'Kitchen base unit',
  'kitchen-wall-unit': 'Kitchen wall unit',
  'oven-housing': 'Oven housing',
  dishwasher: 'Dishwasher',
  rug: 'Rug',
  'floor-lamp': 'Floor lamp',
  'table-lamp': 'Table lamp',
  'pendant-light': 'Pendant light',
  mirror: 'Mirror',
  picture: 'Picture',
  plant: 'Plant in a pot',
  radiator: 'Radiator',
  'plain-block': 'Plain block',
};

type SettingsIssueSink = { addIssue: (issue: { code: 'custom'; path: PropertyKey[]; message: string }) => void };

/** Refuses settings the piece's kind does not take, naming the field (`pieces[2].settings.hand`). */
export function checkKindSettings(
  pieces: readonly { kind?: PieceKind; settings?: PieceSettings }[],
  ctx: SettingsIssueSink,
): void {
  pieces.forEach((piece, index) => {
    if (!piece.settings) return;
    const allowed = KIND_SETTINGS[piece.kind ?? 'plain-block'];
    for (const key of Object.keys(piece.settings) as PieceSettingKey[]) {
      if (piece.settings[key] === undefined || allowed.includes(key)) continue;
      ctx.addIssue({
        code: 'custom',
        path: [index, 'settings', key],
        message: `a ${piece.kind ?? 'plain-block'} takes no ${key}`,
      });
    }
  });
}

// Words in a name (or in an older kind value) and the kind they stand for, first match wins: the
// more particular words come before the general ones ("corner sofa" before "sofa", "bedside" before
// "bed"). The migration 0010 holds its own frozen copy of this list in SQL.
export const KIND_WORDS: readonly [RegExp, PieceKind][] = [
  [/corner[- ]?sofa|sofa[- ]corner|l[- ]shaped sofa/i, 'corner-sofa'],
  [/sofa|settee|couch|loveseat/i, 'sofa'],
  [/armchair|arm chair|easy chair|recliner/i, 'armchair'],
  [/dining[- ]table[- ]\d|dining[- ]set|table (and|with|&) \d* ?chairs/i, 'dining-set'],
  [/dining[- ]chair|^chair|[- ]chair/i, 'dining-chair'],
  [/stool/i, 'stool'],
  [/bench/i, 'bench'],
  [/ottoman|pouf|footstool/i, 'ottoman'],
  [/bedside|night[- ]?(stand|table)/i, 'bedside-table'],
  [/coffee[- ]table/i, 'coffee-table'],
  [/side[- ]table|end[- ]table|lamp[- ]table/i, 'side-table'],
  [/dining[- ]table|kitchen[- ]table|^table/i, 'dining-table'],
  [/desk/i, 'desk'],
  [/\bcot\b|crib/i, 'cot'],
  [/\bbed\b|^bed-|bed$/i, 'bed'],
  [/wardrobe|closet|armoire/i, 'wardrobe'],
  [/chest[- ]of[- ]drawers|drawers|dresser/i, 'chest-of-drawers'],
  [/sideboard|buffet|credenza/i, 'sideboard'],
  [/tv[- ]unit|media|tv[- ]stand|television/i, 'media-unit'],
  [/bookcase|bookshelf/i, 'bookcase'],
  [/wall[- ]shelf|floating shelf/i, 'wall-shelf'],
  [/shelving|shelves|shelf/i, 'open-shelving'],
  [/wall[- ]cabinet|wall[- ]cupboard/i, 'wall-cabinet'],
  [/wall[- ]unit/i, 'kitchen-wall-unit'],
  [/base[- ]unit|kitchen[- ]unit|worktop|counter/i, 'kitchen-base-unit'],
  [/oven/i, 'oven-housing'],
  [/dishwasher/i, 'dishwasher'],
  [/rug|carpet|runner/i, 'rug'],
  [/floor[- ]lamp|standard lamp/i, 'floor-lamp'],
  [/pendant|ceiling light|chandelier/i, 'pendant-light'],
  [/lamp/i, 'table-lamp'],
  [/mirror/i, 'mirror'],
  [/picture|painting|artwork|print|poster/i, 'picture'],
  [/plant|tree|\bpot\b/i, 'plant'],
  [/radiator/i, 'radiator'],
];

/** The kind a stored value or a name stands for: a kind as it is, else by the words it contains, else plain-block. */
export function kindFromWords(...texts: readonly (string | null | undefined)[]): PieceKind {
  for (const text of texts) {
    if (!text) continue;
    const exact = pieceKindSchema.safeParse(text);
    if (exact.success) return exact.data;
    const found = KIND_WORDS.find(([words]) => words.test(text));
    if (found) return found[1];
  }
  return 'plain-block';
}
