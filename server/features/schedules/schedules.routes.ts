// The take-off, each option's schedule (JSON and CSV) and the comparison of options: every role
// reads them, scoped to the caller's studio.
import { z } from 'zod';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import { takeoffQuerySchema, type TakeoffSettings } from '../../../shared/analysis/schedule';
import { ALL_ROLES, requireCaller, type RouteDef, type RouteContext } from '../../http/routes';
import { fileSlug } from '../rooms/rooms.service';
import { compareAnswer, projectTakeoffAnswer, scheduleAnswer, scheduleCsv } from './schedules.service';

/** `options`: the option to count for each room, comma-separated ids (one per room). */
const countedQuery = z.object({
  options: z
    .string()
    .optional()
    .transform((v) => (v ? v.split(',').filter(Boolean) : []))
    .pipe(z.array(z.uuid({ message: 'Each counted option must be an option id.' })).max(200)),
});

type Caller = ReturnType<typeof requireCaller>;

/** A read-only route for every role: parsed path params and take-off settings in, the answer out. */
function readRoute<P>(
  path: string,
  params: z.ZodType<P>,
  answer: (ctx: RouteContext, caller: Caller, params: P, settings: TakeoffSettings) => Promise<unknown>,
): RouteDef {
  return {
    method: 'get',
    path,
    access: ALL_ROLES,
    handler: (ctx) => answer(ctx, requireCaller(ctx), params.parse(ctx.req.params), takeoffQuerySchema.parse(ctx.req.query)),
  };
}

export const scheduleRoutes: RouteDef[] = [
  readRoute('/api/projects/:projectId/takeoff', projectIdParamSchema, (ctx, caller, { projectId }, settings) => {
    const { options } = countedQuery.parse({ options: ctx.req.query.options });
    return projectTakeoffAnswer(ctx.deps.db, caller.studioId, projectId, settings, options);
  }),
  readRoute('/api/projects/:projectId/compare', projectIdParamSchema, (ctx, caller, { projectId }, settings) =>
    compareAnswer(ctx.deps.db, caller.studioId, projectId, settings),
  ),
  readRoute('/api/options/:id/schedule', idParamSchema, (ctx, caller, { id }, settings) =>
    scheduleAnswer(ctx.deps.db, caller.studioId, id, settings),
  ),
  readRoute('/api/options/:id/schedule.csv', idParamSchema, async (ctx, caller, { id }, settings) => {
    const answer = await scheduleAnswer(ctx.deps.db, caller.studioId, id, settings);
    const letter = answer.option.label.replace(/ · .*/, '');
    const name = `${fileSlug(answer.project.name)}-${fileSlug(answer.room.name)}-${fileSlug(letter)}-schedule.csv`;
    ctx.res.setHeader('Content-Type', 'text/csv; charset=utf-8; header=present');
    ctx.res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
    ctx.res.setHeader('Cache-Control', 'private, no-store');
    // A byte-order mark so spreadsheet programs read m² and accents as UTF-8.
    ctx.res.send(`\uFEFF${scheduleCsv(answer)}`);
    return undefined;
  }),
];
