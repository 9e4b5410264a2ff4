import { z } from 'zod';
import { planPointSchema, type RoomShell } from '../schemas/room';
import { areaMm2, perimeterMm } from '../geometry/polygon';
import { distance } from '../geometry/vec';

/** Coats of paint on walls: two is the usual finish over a sound surface (common practice; REFERENCES.md, paint-estimating guides). */
export const DEFAULT_PAINT_COATS = 2;
/** Square metres one litre covers per coat: many European labels give 10–13 m²/L, 350–400 ft²/gal is 8.6–9.8 m²/L (common practice; REFERENCES.md, paint makers' guidance — the label wins). */
export const DEFAULT_COVERAGE_M2_PER_L = 10;
/** Flooring ordered over the floor area for cuts: 5–10 % straight lay, 10 % the usual default (common practice; REFERENCES.md, flooring installers' guides). */
export const DEFAULT_WASTE_PERCENT = 10;
/** Clear width of a main walkway, mm: ≈ 900 mm, matching IRC R311.6 hallway 36 in and ADA §403.5.1 (common practice; REFERENCES.md). */
export const DEFAULT_WALKWAY_MM = 900;

/** Decimal places kept in reported quantities: 3 places of m² is 10 cm², well under what can be measured. */
export const REPORT_DECIMALS = 3;

export const findingKindSchema = z.enum([
  'overlap',
  'outside-room',
  'door-swing',
  'window-blocked',
  'narrow-walkway',
  'unreachable',
  'too-big-for-door',
]);
export type FindingKind = z.infer<typeof findingKindSchema>;

/** One result of the fit check: which pieces and openings it concerns, a sentence, and for gaps the measured and required width (mm). */
export const findingSchema = z.object({
  kind: findingKindSchema,
  pieces: z.array(z.string()),
  openings: z.array(z.string()),
  message: z.string(),
  measured_mm: z.number().optional(),
  required_mm: z.number().optional(),
  /** Plan point (mm) of a narrow walkway's tightest spot, for the editor to mark. */
  at: planPointSchema.optional(),
  /** Plan points (mm) on either side of that spot, for drawing the gap. */
  between: z.tuple([planPointSchema, planPointSchema]).optional(),
});
export type Finding = z.infer<typeof findingSchema>;

export const takeoffOptionsSchema = z.object({
  coats: z.number().int().positive().default(DEFAULT_PAINT_COATS),
  coverage_m2_per_l: z.number().positive().default(DEFAULT_COVERAGE_M2_PER_L),
  wastePercent: z.number().nonnegative().default(DEFAULT_WASTE_PERCENT),
  walkwayMm: z.number().positive().default(DEFAULT_WALKWAY_MM),
});
export type TakeoffOptions = z.infer<typeof takeoffOptionsSchema>;

export const wallTakeoffSchema = z.object({
  index: z.number().int(),
  length_m: z.number(),
  grossArea_m2: z.number(),
  openingsArea_m2: z.number(),
  netArea_m2: z.number(),
});
export type WallTakeoff = z.infer<typeof wallTakeoffSchema>;

/** The analysis output (DESIGN.md "Analysis command"); areas m², lengths m, paint litres. */
export const takeoffSchema = z.object({
  floorArea_m2: z.number(),
  perimeter_m: z.number(),
  ceilingArea_m2: z.number(),
  volume_m3: z.number(),
  walls: z.array(wallTakeoffSchema),
  netWallArea_m2: z.number(),
  paint: z.object({ coats: z.number(), coverage_m2_per_l: z.number(), litres: z.number() }),
  flooring: z.object({ wastePercent: z.number(), orderArea_m2: z.number() }),
  skirting_m: z.number(),
  findings: z.array(findingSchema),
});
export type Takeoff = z.infer<typeof takeoffSchema>;

/** A quantity rounded to REPORT_DECIMALS places. */
export function roundQuantity(value: number): number {
  const factor = 10 ** REPORT_DECIMALS;
  // The small nudge keeps values like 1.6725 (really 1.67249999…) rounding the way a person would.
  return Math.round(value * factor + Math.sign(value) * 1e-7) / factor;
}

const MM2_PER_M2 = 1_000_000;
const MM_PER_M = 1000;

/**
 * Quantities for a validated room shell (plan mm): inside-face areas (m²), lengths (m), paint
 * (litres). Sums use unrounded values; only the reported numbers are rounded. The fit check's
 * findings are passed in and reported as they are.
 */
export function computeTakeoff(
  shell: RoomShell,
  options: Partial<TakeoffOptions> = {},
  findings: readonly Finding[] = [],
): Takeoff {
  const settings = takeoffOptionsSchema.parse(options);
  const n = shell.outline.length;
  const floorMm2 = areaMm2(shell.outline);
  const perimeterLengthMm = perimeterMm(shell.outline);
  const heightMm = shell.wallHeight;

  const openingsMm2 = new Array<number>(n).fill(0);
  let skirtingGapsMm = 0;
  for (const opening of shell.openings) {
    if (opening.wall >= n) continue;
    openingsMm2[opening.wall]! += opening.width * opening.height;
    // Skirting stops at doors and passages (they reach the floor); it runs on under windows.
    if (opening.type !== 'window') skirtingGapsMm += opening.width;
  }

  let netWallMm2 = 0;
  const walls: WallTakeoff[] = shell.outline.map((corner, index) => {
    const lengthMm = distance(corner, shell.outline[(index + 1) % n]!);
    const grossMm2 = lengthMm * heightMm;
    const netMm2 = grossMm2 - openingsMm2[index]!;
    netWallMm2 += netMm2;
    return {
      index,
      length_m: roundQuantity(lengthMm / MM_PER_M),
      grossArea_m2: roundQuantity(grossMm2 / MM2_PER_M2),
      openingsArea_m2: roundQuantity(openingsMm2[index]! / MM2_PER_M2),
      netArea_m2: roundQuantity(netMm2 / MM2_PER_M2),
    };
  });

  const floorM2 = floorMm2 / MM2_PER_M2;
  const netWallM2 = netWallMm2 / MM2_PER_M2;
  return {
    floorArea_m2: roundQuantity(floorM2),
    perimeter_m: roundQuantity(perimeterLengthMm / MM_PER_M),
    ceilingArea_m2: roundQuantity(floorM2),
    volume_m3: roundQuantity((floorMm2 * heightMm) / (MM2_PER_M2 * MM_PER_M)),
    walls,
    netWallArea_m2: roundQuantity(netWallM2),
    paint: {
      coats: settings.coats,
      coverage_m2_per_l: settings.coverage_m2_per_l,
      litres: roundQuantity((netWallM2 * settings.coats) / settings.coverage_m2_per_l),
    },
    flooring: {
      wastePercent: settings.wastePercent,
      orderArea_m2: roundQuantity(floorM2 * (1 + settings.wastePercent / 100)),
    },
    skirting_m: roundQuantity((perimeterLengthMm - skirtingGapsMm) / MM_PER_M),
    findings: [...findings],
  };
}
