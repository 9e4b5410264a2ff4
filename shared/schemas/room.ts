import { z } from 'zod';

/** Default wall height in mm: a usual ceiling height for a living room (common practice, no source). */
export const DEFAULT_WALL_HEIGHT_MM = 2600;
/** Default wall thickness in mm: interior walls are commonly about 10 cm thick (common practice, no source). */
export const DEFAULT_WALL_THICKNESS_MM = 100;

const lengthMm = z.number().finite();
const positiveMm = lengthMm.positive({ message: 'must be more than 0 mm' });
const nonNegativeMm = lengthMm.nonnegative({ message: 'cannot be negative' });

/** A plan point [x, y] in mm, x to the right, y down the page. */
export const planPointSchema = z.tuple([lengthMm, lengthMm]);
export type PlanPoint = z.infer<typeof planPointSchema>;

// Fields every opening shares: where it sits on its wall (offset along the inside face from the
// wall's start corner to the near edge) and its size.
const openingBase = {
  id: z.string().min(1),
  wall: z.number().int().nonnegative(),
  offset: nonNegativeMm,
  width: positiveMm,
  height: positiveMm,
};

export const doorSchema = z.object({
  ...openingBase,
  type: z.literal('door'),
  hinge: z.enum(['start', 'end']),
  swing: z.enum(['in', 'out']),
});

export const windowSchema = z.object({
  ...openingBase,
  type: z.literal('window'),
  sill: nonNegativeMm,
});

export const passageSchema = z.object({
  ...openingBase,
  type: z.literal('passage'),
});

export const openingSchema = z.discriminatedUnion('type', [doorSchema, windowSchema, passageSchema]);
export type Opening = z.infer<typeof openingSchema>;
export type Door = z.infer<typeof doorSchema>;
export type Window = z.infer<typeof windowSchema>;
export type Passage = z.infer<typeof passageSchema>;

/** The room's shell, shared by all its options. Lengths in mm; outline is the inside face, corner by corner. */
export const roomShellSchema = z.object({
  wallHeight: positiveMm.default(DEFAULT_WALL_HEIGHT_MM),
  wallThickness: positiveMm.default(DEFAULT_WALL_THICKNESS_MM),
  // Per-wall override by wall index; null (or a missing entry) means the room's wallThickness.
  wallThicknesses: z.array(positiveMm.nullable()).optional(),
  outline: z.array(planPointSchema).min(3, { message: 'needs at least 3 corners' }),
  openings: z.array(openingSchema).default([]),
});
export type RoomShell = z.infer<typeof roomShellSchema>;
/** What callers may pass before defaults are filled in. */
export type RoomShellInput = z.input<typeof roomShellSchema>;
