// The room schemas: default wall height and thickness, the bounds no real room reaches, plan points,
// doors, windows and passages, the room shell shared by its options, and the outline size check.
import { z } from 'zod';
import { docIdText, nameText } from './common';

/** Default wall height in mm: a usual ceiling height for a living room (common practice, no source). */
export const DEFAULT_WALL_HEIGHT_MM = 2600;
/** Default wall thickness in mm: interior walls are commonly about 10 cm thick (common practice, no source). */
export const DEFAULT_WALL_THICKNESS_MM = 100;

/**
 * Bounds no real room reaches, checked by the schema before any geometry runs, so no request can
 * make the server work for long (a crossing check grows with the square of the corners, a floor
 * grid with the area). Plan mm unless named otherwise; the figures are generous sanity bounds
 * (common practice, not a building rule).
 */
export const ROOM_LIMITS = {
  corners: 200,
  openings: 60,
  /** Every coordinate, outline and pieces, within ±100 m of the plan's origin. */
  coordinateMm: 100_000,
  /** The outline's bounding box, each side. */
  sideMm: 50_000,
  floorM2: 1_000,
  wallHeightMm: 20_000,
  wallThicknessMm: 2_000,
  nameLength: 80,
} as const;

const mm = (value: number) => `${value.toLocaleString('en-GB')} mm`;
/** A finite length in mm; `max` bounds its size either way (±max when it may be negative). */
export const boundedMm = (max: number) =>
  z
    .number({ message: 'must be a finite number (mm)' })
    .finite('must be a finite number (mm)')
    .min(-max, `must be at least −${mm(max)}`)
    .max(max, `must be at most ${mm(max)}`);
const coordinateMm = boundedMm(ROOM_LIMITS.coordinateMm);
const positiveMm = (max: number) => boundedMm(max).positive({ message: 'must be more than 0 mm' });
const nonNegativeMm = (max: number) => boundedMm(max).nonnegative({ message: 'cannot be negative' });

/** A room's name up to 80 characters, one line; may be empty where a default takes over (plan files). */
export const roomNameText = nameText(ROOM_LIMITS.nameLength, `Keep the name under ${ROOM_LIMITS.nameLength} characters.`);
export const roomNameSchema = roomNameText.min(1, 'Give the room a name.');

/** A plan point [x, y] in mm, x to the right, y down the page, within ±100 m. */
export const planPointSchema = z.tuple([coordinateMm, coordinateMm]);
export type PlanPoint = z.infer<typeof planPointSchema>;

// Fields every opening shares: where it sits on its wall (offset along the inside face from the
// wall's start corner to the near edge) and its size.
// A wall is at most the bounding box's diagonal long, so an offset or width is below 2 × side.
const openingBase = {
  id: docIdText,
  wall: z
    .number()
    .int('must be a whole wall number')
    .nonnegative()
    .max(ROOM_LIMITS.corners - 1, `must be below ${ROOM_LIMITS.corners} (a room has at most ${ROOM_LIMITS.corners} walls)`),
  offset: nonNegativeMm(2 * ROOM_LIMITS.sideMm),
  width: positiveMm(2 * ROOM_LIMITS.sideMm),
  height: positiveMm(ROOM_LIMITS.wallHeightMm),
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
  sill: nonNegativeMm(ROOM_LIMITS.wallHeightMm),
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
export const roomShellSchema = z
  .object({
    wallHeight: positiveMm(ROOM_LIMITS.wallHeightMm).default(DEFAULT_WALL_HEIGHT_MM),
    wallThickness: positiveMm(ROOM_LIMITS.wallThicknessMm).default(DEFAULT_WALL_THICKNESS_MM),
    // Per-wall override by wall index; null (or a missing entry) means the room's wallThickness.
    wallThicknesses: z
      .array(positiveMm(ROOM_LIMITS.wallThicknessMm).nullable())
      .max(ROOM_LIMITS.corners, `has more than ${ROOM_LIMITS.corners} entries (a room has at most ${ROOM_LIMITS.corners} walls)`)
      .optional(),
    outline: z
      .array(planPointSchema)
      .min(3, { message: 'needs at least 3 corners' })
      .max(ROOM_LIMITS.corners, `has more than ${ROOM_LIMITS.corners} corners (a room has at most ${ROOM_LIMITS.corners})`),
    openings: z
      .array(openingSchema)
      .max(ROOM_LIMITS.openings, `has more than ${ROOM_LIMITS.openings} openings (a room has at most ${ROOM_LIMITS.openings})`)
      .default([]),
    /** The designer marks the room as a child's: the fit check then warns of climbable pieces near its windows. */
    childRoom: z.boolean().default(false),
  })
  .superRefine((shell, ctx) => {
    const problem = outlineSizeProblem(shell.outline);
    if (problem) ctx.addIssue({ code: 'custom', path: ['outline'], message: problem });
  });
export type RoomShell = z.infer<typeof roomShellSchema>;
/** What callers may pass before defaults are filled in. */
export type RoomShellInput = z.input<typeof roomShellSchema>;

/**
 * Why an outline (plan mm) is too big for a room, or null: its bounding box wider or deeper than
 * 50 m, or its floor (shoelace area) over 1,000 m². Linear in the corners.
 */
export function outlineSizeProblem(outline: readonly (readonly [number, number])[]): string | null {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  let twiceArea = 0;
  for (let i = 0; i < outline.length; i++) {
    const [x, y] = outline[i]!;
    const [nx, ny] = outline[(i + 1) % outline.length]!;
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
    twiceArea += x * ny - nx * y;
  }
  const { sideMm, floorM2 } = ROOM_LIMITS;
  if (maxX - minX > sideMm || maxY - minY > sideMm) {
    return `is ${mm(Math.round(maxX - minX))} × ${mm(Math.round(maxY - minY))}, more than ${sideMm / 1000} m × ${sideMm / 1000} m`;
  }
  const areaM2 = Math.abs(twiceArea) / 2 / 1e6;
  if (areaM2 > floorM2)
    return `encloses ${Math.round(areaM2).toLocaleString('en-GB')} m², more than ${floorM2.toLocaleString('en-GB')} m²`;
  return null;
}
