// Migration 0010: gives every piece in the stored options a kind from the fixed list, read from its
// old kind or its name (plain-block when nothing matches).
import { sql, type Kysely, type RawBuilder } from 'kysely';

// Frozen once landed: pieces (in each option's jsonb document) get a kind from the fixed list.
// A kind already on that list stays; a catalogue id, an older demo value or a name is read by the
// words it contains, the stored kind first and then the name; anything else becomes plain-block.
// The lists below are this migration's own copy and never change with the app.

const KINDS = [
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
];

// PostgreSQL regular expressions, matched case-insensitively (~*); \y is a word boundary. The
// particular words come before the general ones: "corner sofa" before "sofa", "bedside" before "bed".
const WORDS: [string, string][] = [
  ['corner[- ]?sofa|sofa[- ]corner|l[- ]shaped sofa', 'corner-sofa'],
  ['sofa|settee|couch|loveseat', 'sofa'],
  ['armchair|arm chair|easy chair|recliner', 'armchair'],
  ['dining[- ]table[- ][0-9]|dining[- ]set|table (and|with|&) [0-9]* ?chairs', 'dining-set'],
  ['dining[- ]chair|^chair|[- ]chair', 'dining-chair'],
  ['stool', 'stool'],
  ['bench', 'bench'],
  ['ottoman|pouf|footstool', 'ottoman'],
  ['bedside|night[- ]?(stand|table)', 'bedside-table'],
  ['coffee[- ]table', 'coffee-table'],
  ['side[- ]table|end[- ]table|lamp[- ]table', 'side-table'],
  ['dining[- ]table|kitchen[- ]table|^table', 'dining-table'],
  ['desk', 'desk'],
  ['\\ycot\\y|crib', 'cot'],
  ['\\ybed\\y|^bed-|bed$', 'bed'],
  ['wardrobe|closet|armoire', 'wardrobe'],
  ['chest[- ]of[- ]drawers|drawers|dresser', 'chest-of-drawers'],
  ['sideboard|buffet|credenza', 'sideboard'],
  ['tv[- ]unit|media|tv[- ]stand|television', 'media-unit'],
  ['bookcase|bookshelf', 'bookcase'],
  ['wall[- ]shelf|floating shelf', 'wall-shelf'],
  ['shelving|shelves|shelf', 'open-shelving'],
  ['wall[- ]cabinet|wall[- ]cupboard', 'wall-cabinet'],
  ['wall[- ]unit', 'kitchen-wall-unit'],
  ['base[- ]unit|kitchen[- ]unit|worktop|counter', 'kitchen-base-unit'],
  ['oven', 'oven-housing'],
  ['dishwasher', 'dishwasher'],
  ['rug|carpet|runner', 'rug'],
  ['floor[- ]lamp|standard lamp', 'floor-lamp'],
  ['pendant|ceiling light|chandelier', 'pendant-light'],
  ['lamp', 'table-lamp'],
  ['mirror', 'mirror'],
  ['picture|painting|artwork|print|poster', 'picture'],
  ['plant|tree|\\ypot\\y', 'plant'],
  ['radiator', 'radiator'],
];

// The catalogue's ids as they stood before kinds, each with its kind (words would read
// 'custom-box' as plain-block too, but the round trip is clearer spelled out).
const CATALOGUE_IDS: [string, string][] = [
  ['sofa-2-seat', 'sofa'],
  ['sofa-3-seat', 'sofa'],
  ['sofa-corner', 'corner-sofa'],
  ['tv-unit', 'media-unit'],
  ['dining-table-4', 'dining-set'],
  ['dining-table-6', 'dining-set'],
  ['custom-box', 'plain-block'],
];

function kindOf(piece: RawBuilder<unknown>): RawBuilder<string> {
  const kind = sql`(${piece} ->> 'kind')`;
  const name = sql`(${piece} ->> 'name')`;
  const exact = sql.join(KINDS.map((k) => sql.lit(k)));
  const ids = CATALOGUE_IDS.map(([id, k]) => sql`when ${kind} = ${sql.lit(id)} then ${sql.lit(k)}`);
  const byKind = WORDS.map(([re, k]) => sql`when ${kind} ~* ${sql.lit(re)} then ${sql.lit(k)}`);
  const byName = WORDS.map(([re, k]) => sql`when ${name} ~* ${sql.lit(re)} then ${sql.lit(k)}`);
  return sql<string>`case when ${kind} in (${exact}) then ${kind} ${sql.join([...ids, ...byKind, ...byName], sql` `)} else 'plain-block' end`;
}

export async function up(db: Kysely<unknown>): Promise<void> {
  const piece = sql`t.piece`;
  await sql`
    update options set doc = jsonb_set(doc, '{pieces}', (
      select coalesce(jsonb_agg(jsonb_set(t.piece, '{kind}', to_jsonb(${kindOf(piece)})) order by t.n), '[]'::jsonb)
      from jsonb_array_elements(doc -> 'pieces') with ordinality as t(piece, n)
    ))
    where jsonb_typeof(doc -> 'pieces') = 'array'`.execute(db);
}

// The values before were free text and every kind is still free text to the old code, so going
// down leaves the kinds as they are (the old values cannot be recovered and need not be).
export async function down(): Promise<void> {}
