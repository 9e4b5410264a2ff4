// Piece models: turning rows into API shapes, the rules and transactions of uploading (within the
// studio's quota), changing and deleting them (refused while a live project wears one), and the
// processing job that normalises an upload and keeps only what it made.
import type { z } from 'zod';
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { FileStorage } from '../../services/storage/storage';
import { isUuid } from '../../../shared/schemas/common';
import { pieceKindSchema } from '../../../shared/schemas/piece-kind';
import {
  MODEL_LIMITS,
  modelTurnSchema,
  type ModelSize,
  type PieceModel,
  type PieceModelList,
  type pieceModelPatchSchema,
} from '../../../shared/schemas/piece-model';
import { HttpError, orNotFound } from '../../http/errors';
import { normaliseModel, type NormalisedModel } from '../../services/gltf/normalise-model';
import { ModelProblem } from '../../services/gltf/check-gltf';
import { derivedKey, derivedModelKey, fileUrl, uploadKey } from '../files/file-keys';
import { nameFromFileName } from '../finishes/finishes.service';
import {
  deleteModelRow,
  finishModelJob,
  getModelRow,
  getModelRowById,
  insertModelRow,
  listModelRows,
  lockStudioModels,
  modelKeyInUse,
  optionsWearingModel,
  readyModelRowsByIds,
  studioModelBytes,
  updateModelRow,
  type PieceModelChanges,
  type PieceModelRow,
} from './models.repository';
import type { UploadedModel } from './models.uploads';
import { optionLabel } from '../../../shared/schemas/room-api';

/** The job queue's name for normalising a model (its kinds are in models.jobs.ts). */
export const MODEL_JOB = 'piece-model';

export interface ModelJobData {
  modelId: string;
}

const MB = 1024 * 1024;
const kindOf = (value: string | null) => {
  const parsed = pieceKindSchema.safeParse(value);
  return parsed.success ? parsed.data : null;
};

/** The size the designer sees: the model's bounds with the unit fix applied, turned a quarter when asked. */
export function shownSize(
  row: Pick<PieceModelRow, 'width_mm' | 'depth_mm' | 'height_mm' | 'scale' | 'turn_deg'>,
): ModelSize | null {
  if (row.width_mm === null || row.depth_mm === null || row.height_mm === null) return null;
  const s = row.scale;
  const across = row.turn_deg === 90 || row.turn_deg === 270;
  const round = (mm: number) => Math.round(mm * s * 10) / 10;
  return {
    widthMm: round(across ? row.depth_mm : row.width_mm),
    depthMm: round(across ? row.width_mm : row.depth_mm),
    heightMm: round(row.height_mm),
  };
}

const rowBytes = (row: PieceModelRow) =>
  (row.source_key ? row.source_bytes : 0) + (row.model_bytes ?? 0) + (row.thumbnail_bytes ?? 0);

export function toPieceModel(row: PieceModelRow): PieceModel {
  return {
    id: row.id,
    name: row.name,
    supplier: row.supplier,
    link: row.link,
    price: row.price === null ? null : Number(row.price),
    kind: kindOf(row.kind),
    turnDeg: modelTurnSchema.parse(row.turn_deg),
    scale: row.scale === 0.01 ? 0.01 : row.scale === 0.001 ? 0.001 : 1,
    status: row.status,
    failureReason: row.failure_reason,
    fileName: row.file_name,
    size: row.status === 'ready' ? shownSize(row) : null,
    unitHint: row.scale === 1 ? row.unit_hint : null,
    triangles: row.triangles,
    materials: row.materials,
    bytes: rowBytes(row),
    modelUrl: row.status === 'ready' && row.model_key ? fileUrl(row.model_key) : null,
    thumbnailUrl: row.thumbnail_key ? fileUrl(row.thumbnail_key) : null,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
  };
}

/** Deletes stored files among `keys` that no model uses any more. */
async function removeUnused(db: Db, storage: FileStorage, keys: (string | null)[]): Promise<void> {
  for (const key of new Set(keys.filter((k): k is string => Boolean(k))))
    if (!(await modelKeyInUse(db, key))) await storage.delete(key).catch(() => undefined);
}

/** The sentence a designer sees for a model that could not be processed. */
export function modelFailureReason(err: unknown): string {
  if (err instanceof ModelProblem) return err.message;
  return 'This model could not be processed. Export it again as glTF 2.0 (.glb) and upload it.';
}

/** The columns of a model normalised into the stored file `key`: what it measures and holds. */
export function readyColumns(model: NormalisedModel, key: string) {
  return {
    model_key: key,
    model_bytes: model.glb.length,
    width_mm: model.size.widthMm,
    depth_mm: model.size.depthMm,
    height_mm: model.size.heightMm,
    min_mm: JSON.stringify(model.minMm),
    triangles: model.triangles,
    source_triangles: model.sourceTriangles,
    materials: model.materials,
    unit_hint: model.unitHint,
  } satisfies PieceModelChanges;
}

/**
 * The processing job: reads the model's original, normalises it, stores the .glb and marks the model
 * ready with its measured size; a model that cannot be normalised is marked failed with the reason and
 * its original removed. A model deleted while it ran keeps nothing.
 */
export async function runModelJob(db: Db, storage: FileStorage, modelId: string): Promise<void> {
  const row = await getModelRowById(db, modelId);
  if (!row || row.status !== 'processing' || !row.source_key) return;
  const sourceKey = row.source_key;
  const source = await storage.get(sourceKey);
  if (!source) {
    await finishModelJob(db, modelId, {
      status: 'failed',
      failure_reason: 'The uploaded file is missing. Upload it again.',
      source_key: null,
    });
    return;
  }
  const started = performance.now();
  let model;
  try {
    model = await normaliseModel(source);
  } catch (err) {
    if (!(err instanceof ModelProblem)) throw err; // storage or the process: the queue tries again
    const failed = await finishModelJob(db, modelId, {
      status: 'failed',
      failure_reason: modelFailureReason(err),
      source_key: null,
    });
    if (failed) await removeUnused(db, storage, [sourceKey]);
    return;
  }
  const key = derivedModelKey(model.glb);
  await storage.put(key, model.glb);
  const saved = await finishModelJob(db, modelId, {
    status: 'ready',
    failure_reason: null,
    source_key: null,
    ...readyColumns(model, key),
    processed_ms: Math.round(performance.now() - started),
  });
  await removeUnused(db, storage, saved ? [sourceKey] : [key, sourceKey]);
}

async function rowOrThrow(db: Db, studioId: string, id: string): Promise<PieceModelRow> {
  return orNotFound(isUuid(id) ? await getModelRow(db, studioId, id) : undefined, 'That model');
}

export async function listModels(db: Db, studioId: string): Promise<PieceModelList> {
  const [rows, usedBytes] = await Promise.all([listModelRows(db, studioId), studioModelBytes(db, studioId)]);
  return { models: rows.map(toPieceModel), usedBytes, quotaBytes: MODEL_LIMITS.studioQuotaBytes };
}

export async function getModel(db: Db, studioId: string, id: string): Promise<PieceModel> {
  return toPieceModel(await rowOrThrow(db, studioId, id));
}

/** The studio's ready models among `ids`, for the editor and the client's link; other ids are skipped. */
export async function readyModelsByIds(db: Db, studioId: string, ids: Iterable<string>): Promise<PieceModelRow[]> {
  return readyModelRowsByIds(
    db,
    studioId,
    [...new Set(ids)].filter((id) => isUuid(id)),
  );
}

/**
 * Stores the uploaded model's original and makes its row with the processing job, all or nothing,
 * refused when it would take the studio past its quota (uploads of one studio take turns for that).
 */
export async function createModel(
  services: Pick<AppServices, 'db' | 'storage' | 'jobs'>,
  studioId: string,
  upload: UploadedModel,
  fields: Record<string, unknown>,
): Promise<PieceModel> {
  const { db, storage, jobs } = services;
  const key = uploadKey(upload.header.container);
  const name =
    typeof fields.name === 'string' && fields.name.trim()
      ? fields.name.trim().slice(0, MODEL_LIMITS.nameLength)
      : nameFromFileName(upload.fileName).slice(0, MODEL_LIMITS.nameLength);
  let row: PieceModelRow;
  try {
    await storage.put(key, upload.buffer);
    row = await db.transaction().execute(async (trx) => {
      await lockStudioModels(trx, studioId);
      const used = await studioModelBytes(trx, studioId);
      if (used + upload.buffer.length > MODEL_LIMITS.studioQuotaBytes)
        throw new HttpError(
          413,
          'quota_full',
          `The studio's models would take more than its ${MODEL_LIMITS.studioQuotaBytes / 1024 / MB} GB (${Math.round(used / MB)} MB used). Delete models you no longer need.`,
        );
      const made = await insertModelRow(trx, {
        studio_id: studioId,
        name,
        kind: kindOf(typeof fields.kind === 'string' ? fields.kind : null),
        file_name: upload.fileName.slice(0, 200),
        source_key: key,
        source_bytes: upload.buffer.length,
        status: 'processing',
        queued_at: new Date(),
      });
      await jobs.send(MODEL_JOB, { modelId: made.id } satisfies ModelJobData, { db: trx });
      return made;
    });
  } catch (err) {
    await storage.delete(key).catch(() => undefined);
    throw err;
  }
  jobs.wake(MODEL_JOB);
  return toPieceModel(row);
}

export async function updateModel(
  db: Db,
  studioId: string,
  id: string,
  patch: z.output<typeof pieceModelPatchSchema>,
): Promise<PieceModel> {
  await rowOrThrow(db, studioId, id);
  const changes: PieceModelChanges = {
    name: patch.name,
    supplier: patch.supplier,
    link: patch.link,
    price: patch.price,
    kind: patch.kind,
    turn_deg: patch.turnDeg,
    scale: patch.scale,
  };
  return toPieceModel(orNotFound(await updateModelRow(db, studioId, id, changes), 'That model'));
}

/** Keeps the still the browser rendered of a ready model (replacing the one before). */
export async function setThumbnail(
  services: Pick<AppServices, 'db' | 'storage'>,
  studioId: string,
  id: string,
  webp: Buffer,
): Promise<PieceModel> {
  const row = await rowOrThrow(services.db, studioId, id);
  if (row.status !== 'ready') throw new HttpError(409, 'not_ready', 'A thumbnail can be kept once the model is ready.');
  const key = derivedKey(webp);
  await services.storage.put(key, webp);
  const saved = orNotFound(
    await updateModelRow(services.db, studioId, id, { thumbnail_key: key, thumbnail_bytes: webp.length }),
    'That model',
  );
  if (row.thumbnail_key && row.thumbnail_key !== key) await removeUnused(services.db, services.storage, [row.thumbnail_key]);
  return toPieceModel(saved);
}

/** Deletes a model and its files, unless pieces of a live project wear it (then the answer lists where). */
export async function deleteModel(services: Pick<AppServices, 'db' | 'storage'>, studioId: string, id: string): Promise<void> {
  const row = await services.db.transaction().execute(async (trx) => {
    await rowOrThrow(trx, studioId, id);
    // Options are named as the designer sees them: "Option A", "Option B · Calm".
    const worn = (await optionsWearingModel(trx, studioId, id)).map((w) => ({
      projectName: w.projectName,
      roomName: w.roomName,
      optionName: optionLabel(w.optionPosition, w.optionName),
    }));
    if (worn.length > 0) {
      const where = worn.map((w) => `${w.projectName} · ${w.roomName} · ${w.optionName}`);
      throw new HttpError(
        409,
        'model_in_use',
        `Pieces wear this model in ${where.length === 1 ? 'one option' : `${where.length} options`}: ${where.join('; ')}. Take it off them first.`,
        undefined,
        { wornBy: worn },
      );
    }
    return orNotFound(await deleteModelRow(trx, studioId, id), 'That model');
  });
  await removeUnused(services.db, services.storage, [row.source_key, row.model_key, row.thumbnail_key]);
}
