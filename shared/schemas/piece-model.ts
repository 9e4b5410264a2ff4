// Piece models: the limits an uploaded glTF file must keep, the settings a designer gives a model,
// and the model as the API answers it. glTF 2.0 (Khronos Group) is in metres, Y up.
import { z } from 'zod';
import { nameText, optionalText } from './common';
import { priceSchema } from './finish';
import { pieceKindSchema } from './piece-kind';
import { supplierUrlSchema } from './option';

/**
 * Bounds on what one upload may hold, checked on the upload request from the file's own header and
 * JSON (nothing decoded, nothing fetched), so no file makes the server work for long. Generous for a
 * piece of furniture (common practice, not a standard).
 */
export const MODEL_LIMITS = {
  maxFileBytes: 25 * 1024 * 1024,
  maxFilesPerRequest: 8,
  /** The JSON part of a model: its scene description, not its data. */
  maxJsonBytes: 4 * 1024 * 1024,
  maxVertices: 500_000,
  maxMeshes: 500,
  maxNodes: 2_000,
  maxAccessors: 5_000,
  maxMaterials: 200,
  maxTextures: 32,
  maxImages: 32,
  maxTexturePixels: 40_000_000,
  /** After normalising: triangles kept per model, materials, texture side in px. */
  keptTriangles: 30_000,
  keptMaterials: 6,
  keptTexturePx: 1024,
  /** Each studio's room for models (normalised files and originals together). */
  studioQuotaBytes: 2 * 1024 * 1024 * 1024,
  nameLength: 80,
} as const;

/**
 * The budget for a room (one option) with piece models in the client's view, from the piece-models
 * issue: on top of a typical room's < 60 draw calls and ≤ 150,000 triangles, models may bring it to these.
 */
export const MODEL_BUDGET = { drawCalls: 90, triangles: 300_000 } as const;

/** A quarter-turn correction for a model that does not face +Z: 0, 90, 180 or 270 degrees about Y. */
export const modelTurnSchema = z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]);
export type ModelTurn = z.infer<typeof modelTurnSchema>;

export const modelNameSchema = nameText(
  MODEL_LIMITS.nameLength,
  `Keep the name under ${MODEL_LIMITS.nameLength} characters.`,
).min(1, 'Give the model a name.');

/** A model's measured size in mm, read from its bounds: width along X, depth along Z, height along Y. */
export const modelSizeSchema = z.object({
  widthMm: z.number().nonnegative(),
  depthMm: z.number().nonnegative(),
  heightMm: z.number().nonnegative(),
});
export type ModelSize = z.infer<typeof modelSizeSchema>;

export const modelStatusSchema = z.enum(['processing', 'ready', 'failed']);
export type ModelStatus = z.infer<typeof modelStatusSchema>;

/** The one-click fix for a model authored in centimetres or millimetres but read as metres. */
export const modelScaleSchema = z.union([z.literal(1), z.literal(0.01), z.literal(0.001)]);

/** What a designer changes on a model: its words, its kind, the quarter turn and the unit fix. */
export const pieceModelPatchSchema = z
  .object({
    name: modelNameSchema,
    supplier: optionalText(120),
    link: supplierUrlSchema.nullable(),
    price: priceSchema,
    kind: pieceKindSchema.nullable(),
    turnDeg: modelTurnSchema,
    scale: modelScaleSchema,
  })
  .partial();
export type PieceModelPatch = z.input<typeof pieceModelPatchSchema>;

/** A model as the API answers it. Sizes are as the designer sees them: the unit fix and turn applied. */
export const pieceModelSchema = z.object({
  id: z.string(),
  name: z.string(),
  supplier: z.string().nullable(),
  link: z.string().nullable(),
  price: z.number().nullable(),
  kind: pieceKindSchema.nullable(),
  turnDeg: modelTurnSchema,
  scale: modelScaleSchema,
  status: modelStatusSchema,
  failureReason: z.string().nullable(),
  fileName: z.string(),
  /** Measured size after the unit fix and turn (width along the piece's own x, depth along y), or null until processed. */
  size: modelSizeSchema.nullable(),
  /** A size that looks authored in centimetres or millimetres: the fix to offer (null once fixed or when it looks right). */
  unitHint: z.enum(['cm', 'mm']).nullable(),
  triangles: z.number().nullable(),
  materials: z.number().nullable(),
  /** Bytes the model takes in the studio's storage (original while kept, normalised file, thumbnail). */
  bytes: z.number(),
  modelUrl: z.string().nullable(),
  thumbnailUrl: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type PieceModel = z.infer<typeof pieceModelSchema>;

/** The library's answer: the models and how much of the studio's room they use. */
export const pieceModelListSchema = z.object({
  models: z.array(pieceModelSchema),
  usedBytes: z.number(),
  quotaBytes: z.number(),
});
export type PieceModelList = z.infer<typeof pieceModelListSchema>;

/**
 * A model as the client's page draws it on a piece: its file behind the link's own route, its bounds
 * in mm with the unit fix applied (as authored: width along X, depth along Z, height along Y, not yet
 * turned), the quarter turn, and whether its “main” and “accent” materials wear the piece's finishes.
 * The scene fits it into the piece's box, uniformly, centred, standing at the piece's elevation.
 */
export const clientModelSchema = z.object({
  url: z.string(),
  sizeMm: modelSizeSchema,
  minMm: z.tuple([z.number(), z.number(), z.number()]),
  turnDeg: modelTurnSchema,
  wearsFinishes: z.boolean(),
});
export type ClientModel = z.infer<typeof clientModelSchema>;
