// The take-off, each option's schedule (JSON and CSV) and the comparison of options: every role
// reads them, scoped to the caller's studio.
import { z } from 'zod';
import { idParamSchema, projectIdParamSchema } from '../../../shared/schemas/common';
import { takeoffQuerySchema, type TakeoffSettings } from '../../../shared/analysis/takeoff-settings';
import { ALL_ROLES, route, type Caller, type RouteDef, type RouteContext } from '../../http/routes';
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

/** A read-only route for every role: parsed path params and take-off settings in, the answer out. */
function readRoute<P>(
  path: string,
  params: z.ZodType<P>,
  answer: (ctx: RouteContext<P, TakeoffSettings, undefined, Caller>) => Promise<unknown>,
): RouteDef {
  return route({ method: 'get', path, access: ALL_ROLES, params, query: takeoffQuerySchema, handler: answer });
}

export const scheduleRoutes: RouteDef[] = [
  readRoute('/api/projects/:projectId/takeoff', projectIdParamSchema, (ctx) => {
    const { caller, query: settings } = ctx;
    const { projectId } = ctx.params;
    const { options } = countedQuery.parse({ options: ctx.req.query.options });
    return projectTakeoffAnswer(ctx.services.db, caller.studioId, projectId, settings, options);
  }),
  readRoute('/api/projects/:projectId/compare', projectIdParamSchema, (ctx) =>
    compareAnswer(ctx.services.db, ctx.caller.studioId, ctx.params.projectId, ctx.query),
  ),
  readRoute('/api/options/:id/schedule', idParamSchema, (ctx) =>
    scheduleAnswer(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.query),
  ),
  readRoute('/api/options/:id/schedule.csv', idParamSchema, async (ctx) => {
    const answer = await scheduleAnswer(ctx.services.db, ctx.caller.studioId, ctx.params.id, ctx.query);
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
