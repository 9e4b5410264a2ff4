// Turns a photo into a photo finish's images: orient by EXIF, drop every piece of metadata (GPS
// included: outputs carry none unless asked, and we never ask), convert to sRGB, crop, blend the
// edges so it repeats, then write textures, a swatch, a 3 × 3 preview and the mean colour.
import sharp, { type Sharp } from 'sharp';
import { EDGE_BLEND_FRACTION, UPLOAD_LIMITS, type Crop, type EdgeBlend } from '../../../shared/schemas/finish';
import { blendEdgesMirrored } from './seamless';
import { DECODE_FAIL_ON } from './inspect';

/** Longest side of the editor's texture and of the large (presentation) texture, in pixels. */
export const TEXTURE_PX = 1024;
export const TEXTURE_LARGE_PX = 2048;
export const SWATCH_PX = 256;
/** Longest side of one copy in the 3 × 3 preview (the preview is three times this). */
export const PREVIEW_TILE_PX = 512;
/** Longest side of the whole-photo view the crop box is drawn on. */
export const PHOTO_VIEW_PX = 1600;
/** Quality of the kept original: high enough that a later re-crop loses nothing visible (common practice). */
const MASTER_JPEG_QUALITY = 92;
/** WebP quality for textures: artefacts stay below what a texture on a wall shows (common practice). */
const WEBP_QUALITY = 82;
/** Effort 0–6 trades encode time for size; 2 keeps a 12 MP photo well inside the time budget. */
const WEBP_EFFORT = 2;

export interface ProcessedImage {
  buffer: Buffer;
  widthPx: number;
  heightPx: number;
}

export interface ProcessedPhoto {
  /** The oriented, sRGB, metadata-free original kept privately for re-cropping (when asked for). */
  master: ProcessedImage | null;
  photo: ProcessedImage;
  texture: ProcessedImage;
  textureLarge: ProcessedImage;
  swatch: ProcessedImage;
  preview: ProcessedImage;
  meanColourHex: string;
  /** The photo's size after orientation. */
  widthPx: number;
  heightPx: number;
}

interface Raw {
  data: Buffer;
  width: number;
  height: number;
  channels: 1 | 2 | 3 | 4;
}

const fromRaw = (r: Raw) => sharp(r.data, { raw: { width: r.width, height: r.height, channels: r.channels } });
const webp = async (pipeline: Sharp): Promise<ProcessedImage> => {
  const { data, info } = await pipeline
    .webp({ quality: WEBP_QUALITY, effort: WEBP_EFFORT })
    .toBuffer({ resolveWithObject: true });
  return { buffer: data, widthPx: info.width, heightPx: info.height };
};
// libvips keeps recent operations to reuse them; each photo is processed once, so the cache only
// holds memory.
sharp.cache(false);

const fitInside = (px: number) => ({ width: px, height: px, fit: 'inside' as const, withoutEnlargement: true });

/** The crop as whole pixels inside a photo of the given size (at least 1 × 1). */
export function cropPixels(crop: Crop, widthPx: number, heightPx: number) {
  const left = Math.min(widthPx - 1, Math.max(0, Math.round(crop.x * widthPx)));
  const top = Math.min(heightPx - 1, Math.max(0, Math.round(crop.y * heightPx)));
  const width = Math.max(1, Math.min(widthPx - left, Math.round(crop.width * widthPx)));
  const height = Math.max(1, Math.min(heightPx - top, Math.round(crop.height * heightPx)));
  return { left, top, width, height };
}

/**
 * Decodes `source` (refusing more than the pixel limit before decoding, and damaged or cut-short
 * files), and makes every image a photo finish needs. Throws sharp's error for a bad file.
 * With `keepMaster`, the source is first rewritten as the master (oriented, sRGB, no metadata) and
 * everything else is made from that, so a later re-crop from the master gives the same pixels.
 */
export async function processPhoto(
  source: Buffer,
  opts: { crop: Crop; edgeBlend: EdgeBlend; keepMaster: boolean },
): Promise<ProcessedPhoto> {
  // Each step streams through libvips from compressed bytes rather than holding the whole decoded
  // photo in JavaScript, and steps run one at a time: peak memory stays near one decoded photo.
  const normalised = (input: Buffer) =>
    sharp(input, { limitInputPixels: UPLOAD_LIMITS.maxPixels, failOn: DECODE_FAIL_ON })
      .rotate()
      .flatten({ background: '#ffffff' })
      .toColourspace('srgb');
  const master = opts.keepMaster
    ? await normalised(source)
        // Huffman optimisation would buffer the whole photo's coefficients: off, for memory.
        .jpeg({ quality: MASTER_JPEG_QUALITY, chromaSubsampling: '4:4:4', optimiseCoding: false })
        .toBuffer({ resolveWithObject: true })
    : null;
  const base = master ? master.data : source;
  const { width, height } = master ? master.info : await orientedSize(base);

  const photo = await webp(normalised(base).resize(fitInside(PHOTO_VIEW_PX)));
  const cropped = await normalised(base)
    .extract(cropPixels(opts.crop, width, height))
    .resize(fitInside(TEXTURE_LARGE_PX))
    .raw()
    .toBuffer({ resolveWithObject: true });
  const large: Raw = {
    data: cropped.data,
    width: cropped.info.width,
    height: cropped.info.height,
    channels: cropped.info.channels,
  };
  blendEdgesMirrored(large.data, large.width, large.height, large.channels, EDGE_BLEND_FRACTION[opts.edgeBlend]);

  const previewTile = await fromRaw(large).resize(fitInside(PREVIEW_TILE_PX)).raw().toBuffer({ resolveWithObject: true });
  const tile: Raw = {
    data: previewTile.data,
    width: previewTile.info.width,
    height: previewTile.info.height,
    channels: previewTile.info.channels,
  };
  const textureLarge = await webp(fromRaw(large));
  const texture = await webp(fromRaw(large).resize(fitInside(TEXTURE_PX)));
  const swatch = await webp(fromRaw(large).resize(SWATCH_PX, SWATCH_PX, { fit: 'cover' }));
  const preview = await webp(fromRaw(repeat3x3(tile)));
  return {
    master: master ? { buffer: master.data, widthPx: master.info.width, heightPx: master.info.height } : null,
    photo,
    texture,
    textureLarge,
    swatch,
    preview,
    meanColourHex: meanColourHex(large),
    widthPx: width,
    heightPx: height,
  };
}

/** Width and height after EXIF orientation, from the header. */
async function orientedSize(input: Buffer): Promise<{ width: number; height: number }> {
  const meta = await sharp(input, { limitInputPixels: UPLOAD_LIMITS.maxPixels }).metadata();
  if (!meta.width || !meta.height) throw new Error('The photo has no size.');
  return meta.autoOrient ?? { width: meta.width, height: meta.height };
}

/** The image repeated three times across and three times down. */
function repeat3x3(r: Raw): Raw {
  const rowBytes = r.width * r.channels;
  const out = Buffer.alloc(rowBytes * 3 * r.height * 3);
  for (let y = 0; y < r.height * 3; y++) {
    const src = r.data.subarray((y % r.height) * rowBytes, ((y % r.height) + 1) * rowBytes);
    for (let k = 0; k < 3; k++) src.copy(out, y * rowBytes * 3 + k * rowBytes);
  }
  return { data: out, width: r.width * 3, height: r.height * 3, channels: r.channels };
}

// sRGB transfer function (IEC 61966-2-1): the mean is taken in linear light, as a renderer's
// mipmaps average a texture seen from afar.
const toLinear = Array.from({ length: 256 }, (_, v) => {
  const c = v / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
});
const toSrgbByte = (l: number) => {
  const c = l <= 0.0031308 ? l * 12.92 : 1.055 * l ** (1 / 2.4) - 0.055;
  return Math.max(0, Math.min(255, Math.round(c * 255)));
};

/** The average colour of an sRGB image (grey images count as grey), as #rrggbb. */
export function meanColourHex(r: Raw): string {
  const colour = r.channels >= 3;
  const sums = [0, 0, 0];
  const pixels = r.width * r.height;
  for (let i = 0; i < pixels; i++) {
    const at = i * r.channels;
    for (let c = 0; c < 3; c++) sums[c] += toLinear[r.data[at + (colour ? c : 0)]];
  }
  return `#${sums
    .map((s) =>
      toSrgbByte(s / pixels)
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}
