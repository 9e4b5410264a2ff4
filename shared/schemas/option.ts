// The option schemas: limits on an option and its pieces, its name and note, supplier links (web
// links only), the piece, the finish assignments of its surfaces, the fit-check findings marked as
// seen, and the stored option document.
import { z } from 'zod';
import { docIdText, isCleanName, nameText, noteText } from './common';
import { ROOM_LIMITS, boundedMm } from './room';
import { checkKindSettings, pieceKindSchema, pieceSettingsSchema } from './piece-kind';

/** Bounds on an option and its pieces (plan mm): sanity bounds no real option reaches (common practice). */
export const OPTION_LIMITS = {
  pieces: 400,
  /** A piece's width or depth: at most a room's side. */
  pieceSideMm: ROOM_LIMITS.sideMm,
  pieceHeightMm: ROOM_LIMITS.wallHeightMm,
  /** Rotation in degrees either way (the editor stores [0, 360)). */
  rotationDeg: 3_600,
  price: 1_000_000,
  nameLength: 80,
  noteLength: 2_000,
  pieceNameLength: 120,
  urlLength: 2_000,
} as const;

const coordinateMm = boundedMm(ROOM_LIMITS.coordinateMm);
const positiveMm = (max: number) => boundedMm(max).positive({ message: 'must be more than 0 mm' });

/** An option's name (may be empty: the label "Option A" stands alone then), up to 80 characters. */
export const optionNameSchema = nameText(OPTION_LIMITS.nameLength, `Keep the name under ${OPTION_LIMITS.nameLength} characters.`);
/** An option's note for the client: up to 2,000 characters, line breaks allowed. */
export const optionNoteSchema = noteText(
  OPTION_LIMITS.noteLength,
  `Keep the note under ${OPTION_LIMITS.noteLength.toLocaleString('en-GB')} characters.`,
);

/** Whether a link is a web address (http or https); the only links Parlour stores or writes out. */
export function isWebLink(link: string): boolean {
  try {
    const { protocol } = new URL(link);
    return protocol === 'http:' || protocol === 'https:';
  } catch {
    return false;
  }
}

/**
 * A stored option document with any supplier link that is not a web link left out: rows saved
 * before links were limited to http(s) still read, and such a link is never shown or exported.
 */
export function withoutNonWebLinks(doc: unknown): unknown {
  if (typeof doc !== 'object' || doc === null || !Array.isArray((doc as { pieces?: unknown }).pieces)) return doc;
  const pieces = (doc as { pieces: unknown[] }).pieces.map((p) => {
    if (typeof p !== 'object' || p === null || !('supplierUrl' in p)) return p;
    const { supplierUrl, ...rest } = p as { supplierUrl: unknown };
    return typeof supplierUrl === 'string' && isWebLink(supplierUrl) ? p : rest;
  });
  return { ...doc, pieces };
}

/** A supplier's page: http(s) only, so a link in the schedule or its CSV can never run script. */
export const supplierUrlSchema = z
  .string()
  .trim()
  .max(OPTION_LIMITS.urlLength, `Keep the link under ${OPTION_LIMITS.urlLength.toLocaleString('en-GB')} characters.`)
  .pipe(z.url({ protocol: /^https?$/, message: 'must be a web link starting with http:// or https://' }));

/** A furniture piece drawn as a box. x, y: centre in plan mm; width along its own x, depth along its own y; rotation degrees clockwise seen from above. */
export const pieceSchema = z.object({
  id: docIdText,
  name: nameText(OPTION_LIMITS.pieceNameLength, `Keep the name under ${OPTION_LIMITS.pieceNameLength} characters.`),
  x: coordinateMm,
  y: coordinateMm,
  width: positiveMm(OPTION_LIMITS.pieceSideMm),
  depth: positiveMm(OPTION_LIMITS.pieceSideMm),
  height: positiveMm(OPTION_LIMITS.pieceHeightMm),
  rotation: z.number().finite().min(-OPTION_LIMITS.rotationDeg).max(OPTION_LIMITS.rotationDeg).default(0),
  elevation: boundedMm(ROOM_LIMITS.wallHeightMm).nonnegative({ message: 'cannot be below the floor' }).default(0),
  status: z.enum(['existing', 'new']),
  price: z
    .number()
    .finite()
    .nonnegative()
    .max(OPTION_LIMITS.price, `must be at most ${OPTION_LIMITS.price.toLocaleString('en-GB')}`)
    .nullable()
    .optional(),
  supplierUrl: supplierUrlSchema.optional(),
  colour: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, { message: 'must be a colour like #a0b1c2' })
    .optional(),
  finishId: docIdText.nullable().optional(),
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
  accentFinishId: docIdText.nullable().optional(),
  /** The designer marks the piece as fixed to the wall against tipping; the fit check warns of tall storage that is not. */
  fixedToWall: z.boolean().optional(),
  /** A model from the studio's library, drawn in 3D instead of the form (the form stays the plan symbol and the fallback). */
  modelId: docIdText.nullable().optional(),
  /** The designer chose to fit the model into the box (scaled uniformly, centred) though its measured size differs. */
  modelFitted: z.boolean().optional(),
  /** Whether the model's materials named “main” and “accent” wear the piece's finishes; by default the model keeps its own. */
  modelWearsFinishes: z.boolean().optional(),
});
export type Piece = z.infer<typeof pieceSchema>;
export type PieceInput = z.input<typeof pieceSchema>;

/** Which finish goes on which surface; wallOverrides is keyed by wall index (as a string) and wins over walls. */
const finishRef = docIdText.nullable().default(null);
export const finishAssignmentsSchema = z.object({
  floor: finishRef,
  ceiling: finishRef,
  walls: finishRef,
  // A wall index below the corner cap, so the record holds at most one entry per possible wall.
  wallOverrides: z
    .record(
      z
        .string()
        .regex(/^(0|[1-9]\d{0,2})$/, { message: 'must be a wall index' })
        .refine((k) => Number(k) < ROOM_LIMITS.corners, `must be below ${ROOM_LIMITS.corners}`),
      docIdText,
    )
    .default({}),
});
export type FinishAssignments = z.infer<typeof finishAssignmentsSchema>;

/**
 * Bounds on an option's seen marks: more marks than any option has findings, a note of a line or
 * two, and a finding's key (findingKey keeps to it) — common practice.
 */
export const SEEN_LIMITS = { marks: 200, noteLength: 200, keyLength: 500 } as const;

/**
 * A fit-check finding the designer has seen and means to keep: the finding's stable key (findingKey),
 * a short note saying why, and when it was marked (ISO 8601). A mark whose finding no longer occurs
 * is kept, unshown, in case the finding comes back.
 */
export const seenMarkSchema = z.object({
  key: z
    .string()
    .min(1, 'must name a finding')
    .max(SEEN_LIMITS.keyLength, `must be at most ${SEEN_LIMITS.keyLength} characters`)
    .refine(isCleanName, 'must hold no control characters'),
  note: nameText(SEEN_LIMITS.noteLength, `must be at most ${SEEN_LIMITS.noteLength} characters`),
  at: z.iso.datetime({ offset: true, message: 'must be a date and time (ISO 8601)' }),
});
export type SeenMark = z.infer<typeof seenMarkSchema>;

/** An option's seen marks, oldest first, at most one per finding. */
export const seenMarksSchema = z
  .array(seenMarkSchema)
  .max(SEEN_LIMITS.marks, `has more than ${SEEN_LIMITS.marks} seen marks`)
  .superRefine((marks, ctx) => {
    const keys = new Set<string>();
    marks.forEach((mark, index) => {
      if (keys.has(mark.key)) ctx.addIssue({ code: 'custom', path: [index, 'key'], message: 'marks this finding twice' });
      keys.add(mark.key);
    });
  });

/** Pieces of an option or a plan file, each with only the settings its kind takes. */
export const piecesSchema = z
  .array(pieceSchema)
  .max(OPTION_LIMITS.pieces, `has more than ${OPTION_LIMITS.pieces} pieces (an option has at most ${OPTION_LIMITS.pieces})`)
  .superRefine(checkKindSettings);

/** The option document stored as jsonb; its name and note live in table columns. Documents saved before seen marks read with none. */
export const optionDocSchema = z.object({
  pieces: piecesSchema.default([]),
  finishes: finishAssignmentsSchema.default({ floor: null, ceiling: null, walls: null, wallOverrides: {} }),
  seen: seenMarksSchema.default([]),
});
export type OptionDoc = z.infer<typeof optionDocSchema>;
export type OptionDocInput = z.input<typeof optionDocSchema>;
