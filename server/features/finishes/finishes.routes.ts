import { idParamSchema, withoutUncleanCharacters } from '../../../shared/schemas/common';
import {
  centredSquareCrop,
  createPaintSchema,
  finishListQuerySchema,
  finishPatchSchema,
  photoUploadFieldsSchema,
  PRICE_UNITS,
  type EdgeBlend,
} from '../../../shared/schemas/finish';
import { ALL_ROLES, WRITERS, requireCaller, type RouteDef } from '../../http/routes';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import type { Db } from '../../db/database';
import { uploadKey } from '../files/file-keys';
import {
  deleteFinishRow,
  filesOf,
  getFinishRow,
  insertFinishRows,
  listFinishRows,
  updateFinishRow,
  type FinishChanges,
  type FinishRow,
  type NewFinish,
} from './finishes.repository';
import { finishServices, removeUnreferenced, resumeStalled, toFinish, toFinishes } from './finishes.service';
import { readPhotoUpload, type UploadedPhoto } from './finishes.uploads';

/** The size a new photo finish starts with until the designer types its real one (1 m each way). */
const DEFAULT_REPEAT_MM = 1000;
const DEFAULT_EDGE_BLEND: EdgeBlend = 'narrow';

async function rowOrThrow(db: Db, studioId: string, id: string): Promise<FinishRow> {
  return orNotFound(await getFinishRow(db, studioId, id), 'That finish');
}

async function finishResponse(db: Db, row: FinishRow) {
  return { finish: toFinish(row, await filesOf(db, [row.id])) };
}

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
function changesFor(
  row: FinishRow,
  patch: ReturnType<typeof finishPatchSchema.parse>,
): { changes: FinishChanges; reprocess: boolean } {
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
  fields: ReturnType<typeof photoUploadFieldsSchema.parse>,
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

export const finishRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/finishes',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const query = finishListQuerySchema.parse(ctx.req.query);
      await resumeStalled(ctx.deps, caller.studioId);
      return { finishes: await toFinishes(ctx.deps.db, await listFinishRows(ctx.deps.db, caller.studioId, query)) };
    },
  },
  {
    method: 'get',
    path: '/api/finishes/:id',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      return finishResponse(ctx.deps.db, await rowOrThrow(ctx.deps.db, caller.studioId, id));
    },
  },
  {
    method: 'post',
    path: '/api/finishes/paints',
    access: WRITERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const body = createPaintSchema.parse(ctx.req.body);
      const [row] = await insertFinishRows(ctx.deps.db, [
        {
          studio_id: caller.studioId,
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
      ctx.res.status(201);
      return { finish: toFinish(row, []) };
    },
  },
  {
    method: 'post',
    path: '/api/finishes/photos',
    access: WRITERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { photos, fields } = await readPhotoUpload(ctx.req, ctx.res);
      const parsed = photoUploadFieldsSchema.parse(fields);
      const { storage, queue } = finishServices(ctx.deps);
      const keys = photos.map((p) => uploadKey(p.header.type === 'jpeg' ? 'jpg' : p.header.type));
      let rows: FinishRow[];
      try {
        await Promise.all(photos.map((p, i) => storage.put(keys[i], p.buffer)));
        rows = await ctx.deps.db
          .transaction()
          .execute((trx) => insertFinishRows(trx, photoRows(caller.studioId, photos, keys, parsed)));
      } catch (err) {
        // All or nothing: a failure part-way leaves no upload behind.
        await Promise.all(keys.map((k) => storage.delete(k).catch(() => undefined)));
        throw err;
      }
      for (const row of rows) queue.add(row.id);
      ctx.res.status(201);
      return { finishes: rows.map((r) => toFinish(r, [])) };
    },
  },
  {
    method: 'patch',
    path: '/api/finishes/:id',
    access: WRITERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      const patch = finishPatchSchema.parse(ctx.req.body);
      const row = await rowOrThrow(ctx.deps.db, caller.studioId, id);
      const { changes, reprocess } = changesFor(row, patch);
      const saved = await updateFinishRow(ctx.deps.db, caller.studioId, id, changes);
      if (!saved) throw notFound('That finish');
      if (reprocess) finishServices(ctx.deps).queue.add(id);
      return finishResponse(ctx.deps.db, saved);
    },
  },
  {
    method: 'delete',
    path: '/api/finishes/:id',
    access: WRITERS,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      const keys = await ctx.deps.db.transaction().execute(async (trx) => {
        const files = await filesOf(trx, [id]);
        const row = await deleteFinishRow(trx, caller.studioId, id);
        if (!row) throw notFound('That finish');
        return [...files.map((f) => f.key), row.source_key];
      });
      await removeUnreferenced(ctx.deps.db, finishServices(ctx.deps).storage, keys);
      return undefined;
    },
  },
];
