// Stored file names: content-hashed for everything derived (so a URL never changes meaning and can
// be cached for ever), random for a fresh upload. Only derived files (images, normalised models)
// have a URL.
import { createHash, randomUUID } from 'node:crypto';

const sha256 = (buf: Buffer) => createHash('sha256').update(buf).digest('hex');

/** A processed WebP image (texture, swatch, preview, photo view). */
export const derivedKey = (webp: Buffer) => `derived/${sha256(webp)}.webp`;
/** A normalised piece model (one .glb). */
export const derivedModelKey = (glb: Buffer) => `derived/${sha256(glb)}.glb`;
/** The private original kept for re-cropping. */
export const masterKey = (jpeg: Buffer) => `masters/${sha256(jpeg)}.jpg`;
/** An upload waiting to be processed. */
export const uploadKey = (ext: string) => `uploads/${randomUUID()}.${ext}`;

const DERIVED_NAME = /^[0-9a-f]{64}\.(webp|glb)$/;

/** The URL a derived file (an image, a normalised model) is served at. */
export function fileUrl(key: string): string {
  if (!key.startsWith('derived/')) throw new Error(`Only derived images have a URL (got ${key}).`);
  return `/api/files/${key.slice('derived/'.length)}`;
}

/** The storage key behind a file name in a URL, or null for a name that cannot be one of ours. */
export function keyFromFileName(name: string): string | null {
  return DERIVED_NAME.test(name) ? `derived/${name}` : null;
}

/** The content hash in a derived key: it doubles as the file's ETag. */
export const hashOfKey = (key: string) => key.slice(key.lastIndexOf('/') + 1, key.lastIndexOf('.'));
