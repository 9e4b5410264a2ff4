// Finishes: turning rows into API shapes, the photo processing job, and keeping stored files
// exactly as many as the finishes use (nothing orphaned, nothing shared deleted), and the rules and
// transactions of making, changing and deleting finishes.
import { isUuid } from '../../../shared/schemas/common';
import type { z } from 'zod';
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { FileStorage } from '../../services/storage/storage';
import { processPhoto, type ProcessedImage } from '../../services/images/process-photo';
import { megapixels } from '../../services/images/inspect';
import { withoutUncleanCharacters } from '../../../shared/schemas/common';
import {
  PRICE_UNITS,
  UPLOAD_LIMITS,
  centredSquareCrop,
  cropSchema,
  photoUploadFieldsSchema,
  type createPaintSchema,
  type EdgeBlend,
  type Finish,
  type FinishListQuery,
  type finishPatchSchema,
  type PhotoFiles,
} from '../../../shared/schemas/finish';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import { derivedKey, fileUrl, masterKey, uploadKey } from '../files/file-keys';
import {
  deleteFinishRow,
  filesOf,
  finishJobIfCurrent,
  getFinishRow,
  getFinishRowById,
  getFinishRowsByIds,
  insertFinishRows,
  keysInUse,
  listFinishRows,
  replaceFiles,
  updateFinishRow,
  type FinishChanges,
  type FinishFileRow,
  type FinishRow,
  type NewFinish,
} from './finishes.repository';
import type { UploadedPhoto } from './finishes.uploads';

/** The job queue's name for processing a photo finish (its kinds are in finishes.jobs.ts). */
export const PHOTO_JOB = 'photo';

/** What a photo job carries: the finish and the revision (crop and edge blend) it processes. */
export interface PhotoJobData {
  finishId: string;
  revision: number;
}

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

/** The studio's finishes among `ids`; ids that are not finish ids at all (typed by hand in a plan file) are skipped. */
export async function finishesByIds(db: Db, studioId: string, ids: Iterable<string>): Promise<Finish[]> {
  const wanted = [...new Set(ids)].filter((id) => isUuid(id));
  return toFinishes(db, await getFinishRowsByIds(db, studioId, wanted));
}

/** Deletes the stored files among `keys` that no finish uses any more. */
export async function removeUnreferenced(db: Db, storage: FileStorage, keys: (string | null)[]): Promise<void> {
  const candidates = [...new Set(keys.filter((k): k is string => Boolean(k)))];
  const inUse = await keysInUse(db, candidates);
  await Promise.all(candidates.filter((k) => !inUse.has(k)).map((k) => storage.delete(k)));
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
 * work and the newer job does it again. With `revision`, a job for an older revision does nothing:
 * the newer one's job is queued too.
 */
export async function runPhotoJob(db: Db, storage: FileStorage, finishId: string, revision?: number): Promise<void> {
  const row = await getFinishRowById(db, finishId);
  if (!row || row.kind !== 'photo' || row.status !== 'processing' || !row.source_key) return;
  if (revision !== undefined && row.revision !== revision) return;
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

/** The size a new photo finish starts with until the designer types its real one (1 m each way). */
const DEFAULT_REPEAT_MM = 1000;
const DEFAULT_EDGE_BLEND: EdgeBlend = 'narrow';

async function rowOrThrow(db: Db, studioId: string, id: string): Promise<FinishRow> {
  return orNotFound(await getFinishRow(db, studioId, id), 'That finish');
}

const withFiles = async (db: Db, row: FinishRow): Promise<Finish> => toFinish(row, await filesOf(db, [row.id]));

/** A readable finish name from a file name: "oak_boards-02.jpg" → "Oak boards 02". */
export function nameFromFileName(fileName: string): string {
  const stem = withoutUncleanCharacters(fileName)
    .replace(/\.[^.]*$/, '')
    .replace(/[_-]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .slice(0, 120);
  return stem ? stem[0].toUpperCase() + stem.slice(1) : 'Photo finish';
}

const PHOTO_ONLY = ['category', 'repeatWidthMm', 'repeatHeightMm', 'crop', 'edgeBlend'] as const;
const PAINT_ONLY = ['colourHex', 'sheen'] as const;

/** Column changes for a patch, refusing fields that belong to the other kind of finish. */
function changesFor(row: FinishRow, patch: z.output<typeof finishPatchSchema>): { changes: FinishChanges; reprocess: boolean } {
  const wrong = (row.kind === 'paint' ? PHOTO_ONLY : PAINT_ONLY).filter((k) => patch[k] !== undefined);
  if (wrong.length > 0) {
    const message = row.kind === 'paint' ? 'A paint has no photo, size or crop.' : 'A photo finish has no paint colour or sheen.';
    throw new HttpError(400, 'invalid', message, Object.fromEntries(wrong.map((k) => [k, message])));
  }
  if (patch.priceUnit && !(PRICE_UNITS[row.kind] as readonly string[]).includes(patch.priceUnit)) {
    const message =
      row.kind === 'paint' ? 'A paint is priced per litre or per m² of wall.' : 'A photo finish is priced per m² or per unit.';
    throw new HttpError(400, 'invalid', message, { priceUnit: message });
  }
  const changes: FinishChanges = {
    name: patch.name,
    supplier: patch.supplier,
    code: patch.code,
    price: patch.price,
    price_unit: patch.priceUnit,
    category: patch.category,
    repeat_width_mm: patch.repeatWidthMm,
    repeat_height_mm: patch.repeatHeightMm,
    crop: patch.crop === undefined ? undefined : JSON.stringify(patch.crop),
    edge_blend: patch.edgeBlend,
    colour_hex: patch.colourHex,
    sheen: patch.sheen,
  };
  const sameCrop = patch.crop === undefined || JSON.stringify(patch.crop) === JSON.stringify(row.crop);
  const sameBlend = patch.edgeBlend === undefined || patch.edgeBlend === row.edge_blend;
  const reprocess = row.kind === 'photo' && !(sameCrop && sameBlend);
  if (reprocess) {
    if (!row.source_key)
      throw new HttpError(409, 'no_original', 'This photo could not be processed, so there is nothing to crop. Upload it again.');
    Object.assign(changes, {
      status: 'processing',
      failure_reason: null,
      revision: row.revision + 1,
      queued_at: new Date(),
    } satisfies FinishChanges);
  }
  return { changes, reprocess };
}

function photoRows(
  studioId: string,
  photos: UploadedPhoto[],
  keys: string[],
  fields: z.output<typeof photoUploadFieldsSchema>,
): NewFinish[] {
  return photos.map((p, i) => ({
    studio_id: studioId,
    kind: 'photo',
    name: nameFromFileName(p.fileName),
    category: fields.category ?? 'other',
    repeat_width_mm: fields.repeatWidthMm ?? DEFAULT_REPEAT_MM,
    repeat_height_mm: fields.repeatHeightMm ?? DEFAULT_REPEAT_MM,
    crop: JSON.stringify(centredSquareCrop(p.header.widthPx, p.header.heightPx)),
    edge_blend: fields.edgeBlend ?? DEFAULT_EDGE_BLEND,
    status: 'processing',
    source_key: keys[i],
    photo_width_px: p.header.widthPx,
    photo_height_px: p.header.heightPx,
    queued_at: new Date(),
  }));
}

// What the routes do with finishes, each with its rules and transaction.

/** The studio's finishes matching the query. */
export async function listFinishes(
  services: Pick<AppServices, 'db'>,
  studioId: string,
  query: FinishListQuery,
): Promise<Finish[]> {
  return toFinishes(services.db, await listFinishRows(services.db, studioId, query));
}

export async function getFinish(db: Db, studioId: string, id: string): Promise<Finish> {
  return withFiles(db, await rowOrThrow(db, studioId, id));
}

export async function createPaint(db: Db, studioId: string, body: z.output<typeof createPaintSchema>): Promise<Finish> {
  const [row] = await insertFinishRows(db, [
    {
      studio_id: studioId,
      kind: 'paint',
      name: body.name,
      colour_hex: body.colourHex,
      sheen: body.sheen,
      supplier: body.supplier ?? null,
      code: body.code ?? null,
      price: body.price ?? null,
      price_unit: body.priceUnit ?? null,
    },
  ]);
  return toFinish(row, []);
}

/**
 * Stores the uploaded photos and makes one finish of each with its processing job, all or nothing
 * (a finish is never left processing without a job). `fields` are the upload's form fields, parsed here.
 */
export async function createPhotoFinishes(
  services: Pick<AppServices, 'db' | 'storage' | 'jobs'>,
  studioId: string,
  photos: UploadedPhoto[],
  fields: unknown,
): Promise<Finish[]> {
  const parsed = photoUploadFieldsSchema.parse(fields);
  const { db, storage, jobs } = services;
  const keys = photos.map((p) => uploadKey(p.header.type === 'jpeg' ? 'jpg' : p.header.type));
  let rows: FinishRow[];
  try {
    await Promise.all(photos.map((p, i) => storage.put(keys[i], p.buffer)));
    rows = await db.transaction().execute(async (trx) => {
      const made = await insertFinishRows(trx, photoRows(studioId, photos, keys, parsed));
      for (const row of made)
        await jobs.send(PHOTO_JOB, { finishId: row.id, revision: row.revision } satisfies PhotoJobData, { db: trx });
      return made;
    });
  } catch (err) {
    // All or nothing: a failure part-way leaves no upload behind.
    await Promise.all(keys.map((k) => storage.delete(k).catch(() => undefined)));
    throw err;
  }
  jobs.wake(PHOTO_JOB);
  return rows.map((r) => toFinish(r, []));
}

/** Changes a finish; a photo's new crop or edge blend is processed again. */
export async function updateFinish(
  services: Pick<AppServices, 'db' | 'jobs'>,
  studioId: string,
  id: string,
  patch: z.output<typeof finishPatchSchema>,
): Promise<Finish> {
  const { db, jobs } = services;
  const row = await rowOrThrow(db, studioId, id);
  const { changes, reprocess } = changesFor(row, patch);
  // The new revision and its job commit together.
  const saved = await db.transaction().execute(async (trx) => {
    const updated = await updateFinishRow(trx, studioId, id, changes);
    if (updated && reprocess)
      await jobs.send(PHOTO_JOB, { finishId: id, revision: updated.revision } satisfies PhotoJobData, { db: trx });
    return updated;
  });
  if (!saved) throw notFound('That finish');
  if (reprocess) jobs.wake(PHOTO_JOB);
  return withFiles(db, saved);
}

/** Deletes a finish, then the stored files no other finish uses. */
export async function deleteFinish(services: Pick<AppServices, 'db' | 'storage'>, studioId: string, id: string): Promise<void> {
  const keys = await services.db.transaction().execute(async (trx) => {
    const files = await filesOf(trx, [id]);
    const row = await deleteFinishRow(trx, studioId, id);
    if (!row) throw notFound('That finish');
    return [...files.map((f) => f.key), row.source_key];
  });
  await removeUnreferenced(services.db, services.storage, keys);
}
