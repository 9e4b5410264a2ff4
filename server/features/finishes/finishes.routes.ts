// The studio's finishes: paints and photo finishes. Rules and transactions are in finishes.service.ts.
import { idParamSchema } from '../../../shared/schemas/common';
import { createPaintSchema, finishListQuerySchema, finishPatchSchema } from '../../../shared/schemas/finish';
import { ALL_ROLES, WRITERS, route, type RouteDef } from '../../http/routes';
import { createPaint, createPhotoFinishes, deleteFinish, getFinish, listFinishes, updateFinish } from './finishes.service';
import { PHOTO_UPLOAD_CEILING, PHOTO_UPLOAD_TOO_LARGE, readPhotoUpload } from './finishes.uploads';

export const finishRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/api/finishes',
    access: ALL_ROLES,
    query: finishListQuerySchema,
    handler: async (ctx) => ({ finishes: await listFinishes(ctx.services, ctx.caller.studioId, ctx.query) }),
  }),
  route({
    method: 'get',
    path: '/api/finishes/:id',
    access: ALL_ROLES,
    params: idParamSchema,
    handler: async (ctx) => ({ finish: await getFinish(ctx.services.db, ctx.caller.studioId, ctx.params.id) }),
  }),
  route({
    method: 'post',
    path: '/api/finishes/paints',
    access: WRITERS,
    body: createPaintSchema,
    async handler(ctx) {
      const finish = await createPaint(ctx.services.db, ctx.caller.studioId, ctx.body);
      ctx.res.status(201);
      return { finish };
    },
  }),
  route({
    method: 'post',
    path: '/api/finishes/photos',
    access: WRITERS,
    handler: (ctx) =>
      ctx.services.uploads.with(ctx.req, PHOTO_UPLOAD_CEILING, PHOTO_UPLOAD_TOO_LARGE, async () => {
        const { photos, fields } = await readPhotoUpload(ctx.req, ctx.res);
        const finishes = await createPhotoFinishes(ctx.services, ctx.caller.studioId, photos, fields);
        ctx.res.status(201);
        return { finishes };
      }),
  }),
  route({
    method: 'patch',
    path: '/api/finishes/:id',
    access: WRITERS,
    params: idParamSchema,
    body: finishPatchSchema,
    handler: async (ctx) => ({ finish: await updateFinish(ctx.services, ctx.caller.studioId, ctx.params.id, ctx.body) }),
  }),
  route({
    method: 'delete',
    path: '/api/finishes/:id',
    access: WRITERS,
    params: idParamSchema,
    handler: (ctx) => deleteFinish(ctx.services, ctx.caller.studioId, ctx.params.id),
  }),
];
