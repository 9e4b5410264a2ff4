// The take-off, each option's schedule (JSON and CSV) and the comparison of options: every role
// reads them, scoped to the caller's studio.
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { takeoffQuerySchema } from '../../../shared/analysis/schedule';
import { ALL_ROLES, requireCaller, type RouteDef, type RouteContext } from '../../http/routes';
import { fileSlug } from '../rooms/rooms.service';
import { compareAnswer, projectTakeoffAnswer, scheduleAnswer, scheduleCsv } from './schedules.service';

const projectParam = z.object({ projectId: z.uuid({ message: 'Not a valid id.' }) });
/** `options`: the option to count for each room, comma-separated ids (one per room). */
const countedQuery = z.object({
  options: z
    .string()
    .optional()
    .transform((v) => (v ? v.split(',').filter(Boolean) : []))
    .pipe(z.array(z.uuid({ message: 'Each counted option must be an option id.' })).max(200)),
});

const settingsOf = (ctx: RouteContext) => takeoffQuerySchema.parse(ctx.req.query);

export const scheduleRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/projects/:projectId/takeoff',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { projectId } = projectParam.parse(ctx.req.params);
      const { options } = countedQuery.parse({ options: ctx.req.query.options });
      return projectTakeoffAnswer(ctx.deps.db, caller.studioId, projectId, settingsOf(ctx), options);
    },
  },
  {
    method: 'get',
    path: '/api/projects/:projectId/compare',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { projectId } = projectParam.parse(ctx.req.params);
      return compareAnswer(ctx.deps.db, caller.studioId, projectId, settingsOf(ctx));
    },
  },
  {
    method: 'get',
    path: '/api/options/:id/schedule',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      return scheduleAnswer(ctx.deps.db, caller.studioId, id, settingsOf(ctx));
    },
  },
  {
    method: 'get',
    path: '/api/options/:id/schedule.csv',
    access: ALL_ROLES,
    async handler(ctx) {
      const caller = requireCaller(ctx);
      const { id } = idParamSchema.parse(ctx.req.params);
      const answer = await scheduleAnswer(ctx.deps.db, caller.studioId, id, settingsOf(ctx));
      const letter = answer.option.label.replace(/ · .*/, '');
      const name = `${fileSlug(answer.project.name)}-${fileSlug(answer.room.name)}-${fileSlug(letter)}-schedule.csv`;
      ctx.res.setHeader('Content-Type', 'text/csv; charset=utf-8; header=present');
      ctx.res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
      ctx.res.setHeader('Cache-Control', 'private, no-store');
      // A byte-order mark so spreadsheet programs read m² and accents as UTF-8.
      ctx.res.send(`\uFEFF${scheduleCsv(answer)}`);
    },
  },
];
