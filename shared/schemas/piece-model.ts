// Piece models: the limits an uploaded glTF file must keep, the settings a designer gives a model,
// and the model as the API answers it. glTF 2.0 (Khronos Group) is in metres, Y up.
import { z } from 'zod';
import { nameText } from './common';

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
