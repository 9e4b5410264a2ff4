import { z } from 'zod';
import { checkKindSettings, pieceKindSchema, pieceSettingsSchema } from './piece-kind';

const lengthMm = z.number().finite();
const positiveMm = lengthMm.positive({ message: 'must be more than 0 mm' });

/** A furniture piece drawn as a box. x, y: centre in plan mm; width along its own x, depth along its own y; rotation degrees clockwise seen from above. */
export const pieceSchema = z.object({
  id: z.string().min(1),
  name: z.string(),
  x: lengthMm,
  y: lengthMm,
  width: positiveMm,
  depth: positiveMm,
  height: positiveMm,
  rotation: z.number().finite().default(0),
  elevation: lengthMm.nonnegative({ message: 'cannot be below the floor' }).default(0),
  status: z.enum(['existing', 'new']),
  price: z.number().finite().nonnegative().nullable().optional(),
  supplierUrl: z.url().optional(),
  colour: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, { message: 'must be a colour like #a0b1c2' })
    .optional(),
  finishId: z.string().nullable().optional(),
  placed: z.boolean().default(true),
  /** What the piece is; it shapes only what is drawn inside the box. Missing reads as plain-block. */
  kind: pieceKindSchema.optional(),
  /** The kind's own choices (arms, doors, headboard…); a setting the kind does not take is refused. */
  settings: pieceSettingsSchema.optional(),
  /** The second finish (legs, frame, handles): a colour or a library finish, like colour and finishId for the main one. */
  accentColour: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, { message: 'must be a colour like #a0b1c2' })
    .optional(),
  accentFinishId: z.string().nullable().optional(),
});
export type Piece = z.infer<typeof pieceSchema>;
export type PieceInput = z.input<typeof pieceSchema>;

/** Which finish goes on which surface; wallOverrides is keyed by wall index (as a string) and wins over walls. */
export const finishAssignmentsSchema = z.object({
  floor: z.string().nullable().default(null),
  ceiling: z.string().nullable().default(null),
  walls: z.string().nullable().default(null),
  wallOverrides: z.record(z.string().regex(/^\d+$/, { message: 'must be a wall index' }), z.string()).default({}),
});
export type FinishAssignments = z.infer<typeof finishAssignmentsSchema>;

/** The option document stored as jsonb; its name and note live in table columns. */
/** Pieces of an option or a plan file, each with only the settings its kind takes. */
export const piecesSchema = z.array(pieceSchema).superRefine(checkKindSettings);

export const optionDocSchema = z.object({
  pieces: piecesSchema.default([]),
  finishes: finishAssignmentsSchema.default({ floor: null, ceiling: null, walls: null, wallOverrides: {} }),
});
export type OptionDoc = z.infer<typeof optionDocSchema>;
export type OptionDocInput = z.input<typeof optionDocSchema>;
