// The take-off settings the designer can change (coats, coverage, waste, what a box or roll
// covers): their common-practice defaults, their bounds, the one schema that checks them, and the
// query-string codec the take-off, schedule and compare routes read.
import { z } from 'zod';

/** Coats of paint on walls: two is the usual finish over a sound surface (common practice; docs/references.md, paint-estimating guides). */
export const DEFAULT_PAINT_COATS = 2;
/** Square metres one litre covers per coat: many European labels give 10–13 m²/L, 350–400 ft²/gal is 8.6–9.8 m²/L (common practice; docs/references.md, paint makers' guidance — the label wins). */
export const DEFAULT_COVERAGE_M2_PER_L = 10;
/** Flooring ordered over the floor area for cuts: 5–10 % straight lay, 10 % the usual default (common practice; docs/references.md, flooring installers' guides). */
export const DEFAULT_WASTE_PERCENT = 10;

/** Coats beyond this are a typing slip, not a paint job. */
export const MAX_COATS = 10;
/** Coverage outside 1–40 m²/L per coat is no wall paint (labels give roughly 8–13 m²/L). */
export const MIN_COVERAGE_M2_PER_L = 1;
export const MAX_COVERAGE_M2_PER_L = 40;
/** Waste above 100 % would be ordering the floor twice over. */
export const MAX_WASTE_PERCENT = 100;
/** What one box or roll covers, m²: anything above this is a typing slip. */
export const MAX_UNIT_COVERAGE_M2 = 1000;

/** The one schema for take-off settings: the take-off page, the API query (below) and the analysis command all read through it. */
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
