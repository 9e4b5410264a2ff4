// The studio's piece models: the library, one upload per request, changes, the browser-rendered
// thumbnail and deletion. Rules and transactions are in models.service.ts.
import { idParamSchema } from '../../../shared/schemas/common';
import { MODEL_LIMITS, pieceModelPatchSchema } from '../../../shared/schemas/piece-model';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { createModel, deleteModel, getModel, listModels, setThumbnail, updateModel } from './models.service';
import { MODEL_TOO_LARGE, THUMBNAIL_LIMITS, THUMBNAIL_TOO_LARGE, readModelUpload, readThumbnailUpload } from './models.uploads';

export const modelRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/piece-models',
    access: ALL_ROLES,
    handler: (ctx) => listModels(ctx.services.db, ctx.caller.studioId),
  }),
  route({
    method: 'get',
    path: '/api/piece-models/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    handler: async (ctx) => ({ model: await getModel(ctx.services.db, ctx.caller.studioId, ctx.params.id) }),
  }),
  route({
    method: 'post',
    path: '/api/piece-models',
    access: WRITERS,
    handler: (ctx) =>
      ctx.services.uploads.with(ctx.req, MODEL_LIMITS.maxFileBytes, MODEL_TOO_LARGE, async () => {
        const { model, fields } = await readModelUpload(ctx.req, ctx.res);
        const made = await createModel(ctx.services, ctx.caller.studioId, model, fields);
        ctx.res.status(201);
        return { model: made };
      }),
  }),
  route({
    method: 'patch',
    path: '/api/piece-models/:id',
    access: WRITERS,
    params: idParamSchema,
    body: pieceModelPatchSchema,
    handler: async (ctx) => ({ model: await updateModel(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.body) }),
  }),
  route({
    method: 'put',
    path: '/api/piece-models/:id/thumbnail',
    access: WRITERS,
    params: idParamSchema,
    async handler(ctx) {
      // Whose model it is is asked before any bytes are read.
      await getModel(ctx.services.db, ctx.caller.studioId, ctx.params.id);
      return ctx.services.uploads.with(ctx.req, THUMBNAIL_LIMITS.bytes, THUMBNAIL_TOO_LARGE, async () => {
        const webp = await readThumbnailUpload(ctx.req, ctx.res);
        return { model: await setThumbnail(ctx.services, ctx.caller.studioId, ctx.params.id, webp) };
      });
    },
  }),
  route({
    method: 'delete',
    path: '/api/piece-models/:id',
    access: WRITERS,
    params: idParamSchema,
    handler: (ctx) => deleteModel(ctx.services, ctx.caller.studioId, ctx.params.id),
  }),
];
