// Finishes: turning rows into API shapes, the photo processing job, and keeping stored files
// exactly as many as the finishes use (nothing orphaned, nothing shared deleted).
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { FileStorage } from '../../services/storage/storage';
import { processPhoto, type ProcessedImage } from '../../services/images/process-photo';
import { megapixels } from '../../services/images/inspect';
import { cropSchema, UPLOAD_LIMITS, type Finish, type PhotoFiles } from '../../../shared/schemas/finish';
import { derivedKey, fileUrl, masterKey } from '../files/file-keys';
import {
  filesOf,
  finishJobIfCurrent,
  getFinishRowById,
  keysInUse,
  replaceFiles,
  stalledIds,
  updateFinishRow,
  type FinishFileRow,
  type FinishRow,
} from './finishes.repository';

/** Photos processed at once: each needs a few hundred MB at the pixel limit, so keep it small. */
export const PHOTO_CONCURRENCY = 1;
/** A photo still "processing" this long after it was queued was lost (a restart): queue it again. */
const STALLED_AFTER_MS = 2 * 60_000;

const NO_FILES: PhotoFiles = { swatchUrl: null, textureUrl: null, textureLargeUrl: null, previewUrl: null, photoUrl: null };
const URL_OF_PURPOSE = {
  swatch: 'swatchUrl',
  texture: 'textureUrl',
  'texture-large': 'textureLargeUrl',
  preview: 'previewUrl',
  photo: 'photoUrl',
} as const satisfies Partial<Record<FinishFileRow['purpose'], keyof PhotoFiles>>;

export function toFinish(row: FinishRow, files: FinishFileRow[]): Finish {
  const common = {
    id: row.id,
    name: row.name,
    supplier: row.supplier,
    code: row.code,
    price: row.price === null ? null : Number(row.price),
    priceUnit: row.price_unit,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
  };
  if (row.kind === 'paint')
    return { ...common, kind: 'paint', colourHex: row.colour_hex ?? '#ffffff', sheen: row.sheen ?? 'matt' };
  const urls: PhotoFiles = { ...NO_FILES };
  for (const f of files) {
    if (f.finish_id === row.id && f.purpose !== 'master') urls[URL_OF_PURPOSE[f.purpose]] = fileUrl(f.key);
  }
  return {
    ...common,
    kind: 'photo',
    category: row.category ?? 'other',
    repeatWidthMm: row.repeat_width_mm ?? 0,
    repeatHeightMm: row.repeat_height_mm ?? 0,
    crop: cropSchema.parse(row.crop),
    edgeBlend: row.edge_blend ?? 'none',
    status: row.status ?? 'failed',
    failureReason: row.failure_reason,
    meanColourHex: row.mean_colour_hex,
    photoWidthPx: row.photo_width_px ?? 0,
    photoHeightPx: row.photo_height_px ?? 0,
    files: urls,
  };
}

export async function toFinishes(db: Db, rows: FinishRow[]): Promise<Finish[]> {
  const files = await filesOf(
    db,
    rows.filter((r) => r.kind === 'photo').map((r) => r.id),
  );
  return rows.map((r) => toFinish(r, files));
}

/** Deletes the stored files among `keys` that no finish uses any more. */
export async function removeUnreferenced(db: Db, storage: FileStorage, keys: (string | null)[]): Promise<void> {
  const candidates = [...new Set(keys.filter((k): k is string => Boolean(k)))];
  const inUse = await keysInUse(db, candidates);
  await Promise.all(candidates.filter((k) => !inUse.has(k)).map((k) => storage.delete(k)));
}

/** Queues again what a stopped server left half-done, when the page next asks. */
export async function resumeStalled(services: Pick<AppServices, 'db' | 'photos'>, studioId: string): Promise<void> {
  const { db, photos } = services;
  const ids = (await stalledIds(db, studioId, new Date(Date.now() - STALLED_AFTER_MS))).filter((id) => !photos.has(id));
  for (const id of ids) {
    await updateFinishRow(db, studioId, id, { queued_at: new Date() });
    photos.add(id);
  }
}

/** The sentence a designer sees for a photo that could not be processed. */
export function failureReason(err: unknown): string {
  const message = err instanceof Error ? err.message : String(err);
  if (/pixel limit/i.test(message))
    return `This photo is larger than ${megapixels(UPLOAD_LIMITS.maxPixels)}. Export it smaller and upload it again.`;
  if (
    /premature end|truncated|corrupt|end of (file|stream)|read error|invalid|bad (huffman|seek)|unexpected end/i.test(message)
  ) {
    return 'This photo is damaged or cut short (the file ends early). Export or download it again, then upload it.';
  }
  return 'This photo could not be processed. Try exporting it again as a JPEG.';
}

/** Runs `fn` in a transaction, or in the caller's when `db` already is one (the demo seed). */
function inTransaction<T>(db: Db, fn: (trx: Db) => Promise<T>): Promise<T> {
  return db.isTransaction ? fn(db) : db.transaction().execute(fn);
}

type StoredImage = ProcessedImage & { purpose: FinishFileRow['purpose']; key: string };

/**
 * The processing job: reads the finish's original, makes its images, stores them and marks the
 * finish ready, unless the crop changed (or the finish went) while it ran; then it discards its
 * work and the newer job does it again.
 */
export async function runPhotoJob(db: Db, storage: FileStorage, finishId: string): Promise<void> {
  const row = await getFinishRowById(db, finishId);
  if (!row || row.kind !== 'photo' || row.status !== 'processing' || !row.source_key) return;
  const sourceKey = row.source_key;
  const fromUpload = sourceKey.startsWith('uploads/');
  const source = await storage.get(sourceKey);
  if (!source) {
    await finishJobIfCurrent(db, finishId, row.revision, {
      status: 'failed',
      failure_reason: 'The original photo is missing. Upload it again.',
      source_key: null,
    });
    return;
  }
  let processed;
  try {
    processed = await processPhoto(source, {
      crop: cropSchema.parse(row.crop),
      edgeBlend: row.edge_blend ?? 'none',
      keepMaster: fromUpload,
    });
  } catch (err) {
    // A bad upload is not worth keeping; a kept original stays so the crop can be tried again.
    const failed = await finishJobIfCurrent(db, finishId, row.revision, {
      status: 'failed',
      failure_reason: failureReason(err),
      ...(fromUpload ? { source_key: null } : {}),
    });
    if (failed && fromUpload) await removeUnreferenced(db, storage, [sourceKey]);
    return;
  }

  const images: StoredImage[] = [
    { purpose: 'photo', ...processed.photo, key: derivedKey(processed.photo.buffer) },
    { purpose: 'texture', ...processed.texture, key: derivedKey(processed.texture.buffer) },
    { purpose: 'texture-large', ...processed.textureLarge, key: derivedKey(processed.textureLarge.buffer) },
    { purpose: 'swatch', ...processed.swatch, key: derivedKey(processed.swatch.buffer) },
    { purpose: 'preview', ...processed.preview, key: derivedKey(processed.preview.buffer) },
  ];
  const master: StoredImage = processed.master
    ? { purpose: 'master', ...processed.master, key: masterKey(processed.master.buffer) }
    : { purpose: 'master', buffer: source, widthPx: processed.widthPx, heightPx: processed.heightPx, key: sourceKey };
  const toStore = processed.master ? [...images, master] : images;
  await Promise.all(toStore.map((img) => storage.put(img.key, img.buffer)));

  const previous = await inTransaction(db, async (trx) => {
    const saved = await finishJobIfCurrent(trx, finishId, row.revision, {
      status: 'ready',
      failure_reason: null,
      mean_colour_hex: processed.meanColourHex,
      source_key: master.key,
      photo_width_px: processed.widthPx,
      photo_height_px: processed.heightPx,
    });
    if (!saved) return null;
    const before = await filesOf(trx, [finishId]);
    await replaceFiles(
      trx,
      finishId,
      [...images, master].map((img) => ({
        finish_id: finishId,
        studio_id: row.studio_id,
        purpose: img.purpose,
        key: img.key,
        width_px: img.widthPx,
        height_px: img.heightPx,
        bytes: img.buffer.length,
      })),
    );
    return before.map((f) => f.key);
  });
  if (previous === null) {
    await removeUnreferenced(
      db,
      storage,
      toStore.map((img) => img.key),
    );
    return;
  }
  await removeUnreferenced(db, storage, [...previous, fromUpload ? sourceKey : null]);
}
