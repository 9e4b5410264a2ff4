// What the analysis command prints: the room's quantities and the fit check's findings under the
// field names the README documents (`floorArea_m2`, `measured_mm`…). A public format, so its names
// stay as published; this mapper is the only place they are written.
import { z } from 'zod';
import { planPointSchema } from '../schemas/room';
import { findingKindSchema, type Finding } from './fit/finding';
import type { Takeoff } from './takeoff';

export const analysisFindingSchema = z.object({
  kind: findingKindSchema,
  pieces: z.array(z.string()),
  openings: z.array(z.string()),
  message: z.string(),
  measured_mm: z.number().optional(),
  required_mm: z.number().optional(),
  at: planPointSchema.optional(),
  between: z.tuple([planPointSchema, planPointSchema]).optional(),
  zone: z.array(planPointSchema).optional(),
});

export const analysisWallSchema = z.object({
  index: z.number().int(),
  length_m: z.number(),
  grossArea_m2: z.number(),
  openingsArea_m2: z.number(),
  netArea_m2: z.number(),
});

/** The analysis command's output; areas m², lengths m, paint litres. */
export const analysisOutputSchema = z.object({
  floorArea_m2: z.number(),
  perimeter_m: z.number(),
  ceilingArea_m2: z.number(),
  volume_m3: z.number(),
  walls: z.array(analysisWallSchema),
  netWallArea_m2: z.number(),
  paint: z.object({ coats: z.number(), coverage_m2_per_l: z.number(), litres: z.number() }),
  flooring: z.object({ wastePercent: z.number(), orderArea_m2: z.number() }),
  skirting_m: z.number(),
  findings: z.array(analysisFindingSchema),
});
export type AnalysisOutput = z.infer<typeof analysisOutputSchema>;

function analysisFinding(f: Finding): AnalysisOutput['findings'][number] {
  const { measuredMm, requiredMm, at, between, ...rest } = f;
  const out: AnalysisOutput['findings'][number] = { ...rest };
  if (measuredMm !== undefined) out.measured_mm = measuredMm;
  if (requiredMm !== undefined) out.required_mm = requiredMm;
  if (at !== undefined) out.at = at;
  if (between !== undefined) out.between = between;
  return out;
}

/** A room's take-off and its findings under the documented field names, in the documented order. */
export function analysisOutput(t: Takeoff, findings: readonly Finding[]): AnalysisOutput {
  return {
    floorArea_m2: t.floorAreaM2,
    perimeter_m: t.perimeterM,
    ceilingArea_m2: t.ceilingAreaM2,
    volume_m3: t.volumeM3,
    walls: t.walls.map((w) => ({
      index: w.index,
      length_m: w.lengthM,
      grossArea_m2: w.grossAreaM2,
      openingsArea_m2: w.openingsAreaM2,
      netArea_m2: w.netAreaM2,
    })),
    netWallArea_m2: t.netWallAreaM2,
    paint: { coats: t.paint.coats, coverage_m2_per_l: t.paint.coverageM2PerL, litres: t.paint.litres },
    flooring: { wastePercent: t.flooring.wastePercent, orderArea_m2: t.flooring.orderAreaM2 },
    skirting_m: t.skirtingM,
    findings: findings.map(analysisFinding),
  };
}
