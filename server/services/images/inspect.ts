// First look at an upload, before anything is stored: its type from its bytes (never its name)
// and its size from its header (before decoding it), so a decompression bomb is refused unread;
// only then is it decoded once, so a damaged or cut-short file is refused too.
import sharp, { type Metadata } from 'sharp';
import { UPLOAD_LIMITS } from '../../../shared/schemas/finish';

export type PhotoType = 'jpeg' | 'png' | 'webp';

/** Why a photo cannot be used: a code for the API, a sentence for the designer, an HTTP status. */
export class PhotoProblem extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

const startsWith = (buf: Buffer, bytes: number[], at = 0) =>
  buf.length >= at + bytes.length && bytes.every((b, i) => buf[at + i] === b);

/** The photo type told by its first bytes (file signatures), or null for anything else. */
export function sniffPhotoType(buf: Buffer): PhotoType | null {
  if (startsWith(buf, [0xff, 0xd8, 0xff])) return 'jpeg';
  if (startsWith(buf, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'png';
  if (startsWith(buf, [0x52, 0x49, 0x46, 0x46]) && startsWith(buf, [0x57, 0x45, 0x42, 0x50], 8)) return 'webp';
  return null;
}

/** EXIF orientations 5–8 turn the picture a quarter, swapping width and height. */
const SWAPS_SIDES = new Set([5, 6, 7, 8]);

export interface PhotoHeader {
  type: PhotoType;
  /** Size after EXIF orientation. */
  widthPx: number;
  heightPx: number;
}

export const megapixels = (px: number) => `${Math.round(px / 100_000) / 10} megapixels`;

/**
 * How strictly photos are decoded, at upload and in processing alike, so that a file the upload
 * accepts is one processing can read (a cut-short JPEG warns "premature end" and is refused).
 */
export const DECODE_FAIL_ON = 'warning' as const;
/** The check decodes at this size: JPEG and WebP shrink on load, yet every byte is still read. */
const CHECK_PX = 64;

/**
 * Decodes the whole photo (within the pixel limit already checked) and throws PhotoProblem when
 * it is damaged or cut short; the pixels are thrown away.
 */
async function assertWhole(buf: Buffer, label: string): Promise<void> {
  try {
    await sharp(buf, { limitInputPixels: UPLOAD_LIMITS.maxPixels, failOn: DECODE_FAIL_ON })
      .resize(CHECK_PX, CHECK_PX, { fit: 'inside' })
      .raw()
      .toBuffer();
  } catch {
    throw new PhotoProblem(
      422,
      'damaged',
      `${label} is damaged or cut short (the file ends early). Export or download it again, then upload it.`,
    );
  }
}

/** Reads type and size from the header, then decodes it once to refuse a damaged file; throws PhotoProblem for anything unusable. */
export async function inspectPhoto(buf: Buffer, fileName: string): Promise<PhotoHeader> {
  const label = `“${fileName}”`;
  if (buf.length === 0) throw new PhotoProblem(400, 'empty_file', `${label} is empty (0 bytes). Choose the photo again.`);
  const type = sniffPhotoType(buf);
  if (!type)
    throw new PhotoProblem(415, 'unsupported_type', `${label} is not a JPEG, PNG or WebP photo, whatever its name says.`);
  let meta: Metadata;
  try {
    // metadata() reads the header only; the pixel limit is checked below so the message can say the size.
    meta = await sharp(buf, { limitInputPixels: false }).metadata();
  } catch {
    throw new PhotoProblem(
      422,
      'unreadable',
      `${label} looks like a ${type.toUpperCase()} but cannot be read. It may be damaged.`,
    );
  }
  if (meta.format !== type || !meta.width || !meta.height) {
    throw new PhotoProblem(
      422,
      'unreadable',
      `${label} looks like a ${type.toUpperCase()} but cannot be read. It may be damaged.`,
    );
  }
  const pixels = meta.width * meta.height;
  if (pixels > UPLOAD_LIMITS.maxPixels) {
    throw new PhotoProblem(
      413,
      'too_many_pixels',
      `${label} is ${meta.width} × ${meta.height} pixels (${megapixels(pixels)}); the limit is ${megapixels(UPLOAD_LIMITS.maxPixels)}. Export it smaller.`,
    );
  }
  await assertWhole(buf, label);
  const swap = SWAPS_SIDES.has(meta.orientation ?? 1);
  return { type, widthPx: swap ? meta.height : meta.width, heightPx: swap ? meta.width : meta.height };
}
