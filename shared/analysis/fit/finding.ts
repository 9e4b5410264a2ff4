// What the fit check reports: one finding per problem, naming the pieces and openings it concerns.
import { z } from 'zod';
import { planPointSchema } from '../../schemas/room';

export const findingKindSchema = z.enum([
  'overlap',
  'outside-room',
  'door-swing',
  'cannot-open',
  'window-blocked',
  'narrow-walkway',
  'unreachable',
  'too-big-for-door',
  'climbable-near-window',
  'tall-not-fixed',
]);
export type FindingKind = z.infer<typeof findingKindSchema>;

/** One result of the fit check: which pieces and openings it concerns, a sentence, and for gaps the measured and required width or depth (mm). */
export const findingSchema = z.object({
  kind: findingKindSchema,
  pieces: z.array(z.string()),
  openings: z.array(z.string()),
  message: z.string(),
  measuredMm: z.number().optional(),
  requiredMm: z.number().optional(),
  /** Plan point (mm) of a narrow walkway's tightest spot, for the editor to mark. */
  at: planPointSchema.optional(),
  /** Plan points (mm) on either side of that spot, for drawing the gap. */
  between: z.tuple([planPointSchema, planPointSchema]).optional(),
  /** Plan polygon (mm) a blocked front opens into: a door's quarter disc (hinge, then its arc) or a drawer's pull-out rectangle. */
  zone: z.array(planPointSchema).optional(),
});
export type Finding = z.infer<typeof findingSchema>;
