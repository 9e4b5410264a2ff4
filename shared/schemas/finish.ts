// Finishes: photo finishes (a processed photo with the real size its crop covers) and paints.
import { z } from 'zod';
import { nameText, optionalText } from './common';

export const FINISH_CATEGORIES = ['floor', 'wall', 'tile', 'wood', 'stone', 'fabric', 'wallpaper', 'other'] as const;
export const finishCategorySchema = z.enum(FINISH_CATEGORIES, { message: 'Pick a category from the list.' });
export type FinishCategory = z.infer<typeof finishCategorySchema>;

export const SHEENS = ['matt', 'eggshell', 'satin', 'gloss'] as const;
export const sheenSchema = z.enum(SHEENS, { message: 'Pick matt, eggshell, satin or gloss.' });
export type Sheen = z.infer<typeof sheenSchema>;

export const photoStatusSchema = z.enum(['processing', 'ready', 'failed']);
export type PhotoStatus = z.infer<typeof photoStatusSchema>;

export const priceUnitSchema = z.enum(['m2', 'unit', 'litre'], { message: 'Price is per m², per unit or per litre.' });
export type PriceUnit = z.infer<typeof priceUnitSchema>;
/**
 * What each kind of finish is priced by: a paint per litre (the schedule prices the tins bought)
 * or per m² of wall (a painter's rate, all coats); a photo finish per m² or per box, roll or tile.
 */
export const PRICE_UNITS = { paint: ['litre', 'm2'], photo: ['m2', 'unit'] } as const satisfies Record<
  'paint' | 'photo',
  readonly PriceUnit[]
>;
export const paintPriceUnitSchema = z.enum(PRICE_UNITS.paint, { message: 'A paint is priced per litre or per m² of wall.' });

/**
 * How wide a band along each edge is blended with its mirror image so copies join without a seam,
 * as a fraction of the texture's side. `none` suits a crop that already repeats (a tile cut at its
 * grout lines, a wallpaper cut at its pattern repeat).
 */
export const EDGE_BLENDS = ['none', 'narrow', 'wide'] as const;
export const edgeBlendSchema = z.enum(EDGE_BLENDS, { message: 'Pick none, narrow or wide.' });
export type EdgeBlend = z.infer<typeof edgeBlendSchema>;
export const EDGE_BLEND_FRACTION: Record<EdgeBlend, number> = { none: 0, narrow: 0.08, wide: 0.16 };

export const colourHexSchema = z
  .string()
  .trim()
  .regex(/^#[0-9a-fA-F]{6}$/, { message: 'Use a colour like #a0b1c2.' })
  .transform((v) => v.toLowerCase());

/** The smallest crop side, as a fraction of the photo: anything smaller is too few pixels to tile. */
export const MIN_CROP_FRACTION = 0.02;
const CROP_EPSILON = 1e-6;
const fraction = z
  .number({ message: 'Enter a number between 0 and 1.' })
  .finite()
  .min(0, 'Cannot be below 0.')
  .max(1, 'Cannot be above 1.');

/** The part of the photo the real size covers: fractions of the photo after EXIF orientation, origin top left. */
export const cropSchema = z
  .object({
    x: fraction,
    y: fraction,
    width: fraction.min(MIN_CROP_FRACTION, `Keep the crop at least ${MIN_CROP_FRACTION * 100}% of the photo.`),
    height: fraction.min(MIN_CROP_FRACTION, `Keep the crop at least ${MIN_CROP_FRACTION * 100}% of the photo.`),
  })
  .refine((c) => c.x + c.width <= 1 + CROP_EPSILON, { message: 'The crop runs off the right of the photo.', path: ['width'] })
  .refine((c) => c.y + c.height <= 1 + CROP_EPSILON, { message: 'The crop runs off the bottom of the photo.', path: ['height'] });
export type Crop = z.infer<typeof cropSchema>;

/** The largest square in the middle of a photo of the given oriented size, as fractions. */
export function centredSquareCrop(widthPx: number, heightPx: number): Crop {
  const side = Math.min(widthPx, heightPx);
  const width = side / widthPx;
  const height = side / heightPx;
  return { x: (1 - width) / 2, y: (1 - height) / 2, width, height };
}

/** A real repeat size in mm: 1 mm up to 100 m (a sanity bound, not a product rule). */
const repeatMm = z.coerce
  .number({ message: 'Enter a size in mm.' })
  .finite('Enter a size in mm.')
  .min(1, 'Make it at least 1 mm.')
  .max(100_000, 'Keep it under 100 m.');

const nameSchema = nameText(120, 'Keep the name under 120 characters.').min(1, 'Enter a name.');
/** A price a designer types: none, or 0 up to 1,000,000 in the studio's currency. */
export const priceSchema = z
  .number({ message: 'Enter a price.' })
  .finite()
  .nonnegative('A price cannot be negative.')
  .max(1_000_000, 'Keep the price under 1,000,000.')
  .nullable()
  .optional();

export const createPaintSchema = z.object({
  name: nameSchema,
  colourHex: colourHexSchema,
  sheen: sheenSchema.default('matt'),
  supplier: optionalText(120),
  code: optionalText(60),
  price: priceSchema,
  priceUnit: paintPriceUnitSchema.nullable().optional(),
});
export type CreatePaintBody = z.input<typeof createPaintSchema>;

/** Text fields sent with a photo upload (multipart): they apply to every photo of the request. */
export const photoUploadFieldsSchema = z.object({
  category: finishCategorySchema.optional(),
  repeatWidthMm: repeatMm.optional(),
  repeatHeightMm: repeatMm.optional(),
  edgeBlend: edgeBlendSchema.optional(),
});

export const finishPatchSchema = z
  .object({
    name: nameSchema,
    supplier: optionalText(120),
    code: optionalText(60),
    price: priceSchema,
    priceUnit: priceUnitSchema.nullable(),
    // photo finishes
    category: finishCategorySchema,
    repeatWidthMm: repeatMm,
    repeatHeightMm: repeatMm,
    crop: cropSchema,
    edgeBlend: edgeBlendSchema,
    // paints
    colourHex: colourHexSchema,
    sheen: sheenSchema,
  })
  .partial();
export type FinishPatch = z.input<typeof finishPatchSchema>;

export const finishListQuerySchema = z.object({
  q: nameText(120).optional(),
  category: finishCategorySchema.optional(),
  kind: z.enum(['photo', 'paint']).optional(),
});
export type FinishListQuery = z.infer<typeof finishListQuerySchema>;

const finishBase = {
  id: z.string(),
  name: z.string(),
  supplier: z.string().nullable(),
  code: z.string().nullable(),
  price: z.number().nullable(),
  priceUnit: priceUnitSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
};

/** Content-hashed, immutable URLs of a photo finish's processed images (null until processed). */
export const photoFilesSchema = z.object({
  /** 256 px square. */
  swatchUrl: z.string().nullable(),
  /** Longest side 1024 px, tiles seamlessly. */
  textureUrl: z.string().nullable(),
  /** Longest side 2048 px, tiles seamlessly. */
  textureLargeUrl: z.string().nullable(),
  /** The texture repeated 3 × 3, to judge the seams. */
  previewUrl: z.string().nullable(),
  /** The whole photo (oriented, longest side 1600 px), to draw the crop on. */
  photoUrl: z.string().nullable(),
});
export type PhotoFiles = z.infer<typeof photoFilesSchema>;

export const photoFinishSchema = z.object({
  ...finishBase,
  kind: z.literal('photo'),
  category: finishCategorySchema,
  repeatWidthMm: z.number(),
  repeatHeightMm: z.number(),
  crop: cropSchema,
  edgeBlend: edgeBlendSchema,
  status: photoStatusSchema,
  failureReason: z.string().nullable(),
  meanColourHex: z.string().nullable(),
  /** The photo's size in pixels after EXIF orientation. */
  photoWidthPx: z.number().int(),
  photoHeightPx: z.number().int(),
  files: photoFilesSchema,
});
export type PhotoFinish = z.infer<typeof photoFinishSchema>;

export const paintFinishSchema = z.object({
  ...finishBase,
  kind: z.literal('paint'),
  colourHex: z.string(),
  sheen: sheenSchema,
});
export type PaintFinish = z.infer<typeof paintFinishSchema>;

export const finishSchema = z.discriminatedUnion('kind', [photoFinishSchema, paintFinishSchema]);
export type Finish = z.infer<typeof finishSchema>;

/** Upload limits, shared so the page can say them before a file is sent. */
export const UPLOAD_LIMITS = {
  /** Bytes per photo. */
  maxFileBytes: 25 * 1024 * 1024,
  /** Decoded pixels per photo (40 megapixels). */
  maxPixels: 40_000_000,
  maxFilesPerRequest: 10,
  types: ['image/jpeg', 'image/png', 'image/webp'] as const,
};
