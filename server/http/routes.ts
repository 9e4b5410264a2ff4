// Every API route declares who may call it beside its path; tests walk the whole table.
import type { Request, Response, Router } from 'express';
import type { Role } from '../../shared/schemas/studio';
import type { AppDeps } from '../context';
import { HttpError } from './errors';

export type Access = 'public' | 'signed-in' | readonly Role[];

export interface Caller {
  memberId: string;
  studioId: string;
  role: Role;
  sessionId: string;
}

export interface RouteContext {
  req: Request;
  res: Response;
  deps: AppDeps;
  caller: Caller | null;
}

export interface RouteDef {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  access: Access;
  handler: (ctx: RouteContext) => Promise<unknown> | unknown;
}

export const ALL_ROLES: readonly Role[] = ['owner', 'designer', 'viewer'];
export const WRITERS: readonly Role[] = ['owner', 'designer'];
export const OWNERS: readonly Role[] = ['owner'];

/** The caller of a route whose access is not public. */
export function requireCaller(ctx: RouteContext): Caller {
  if (!ctx.caller) throw new HttpError(401, 'signed_out', 'Please sign in.');
  return ctx.caller;
}

export function mountRoutes(router: Router, deps: AppDeps, defs: RouteDef[]): void {
  for (const def of defs) {
    router[def.method](def.path, async (req: Request, res: Response) => {
      const caller = (res.locals.caller as Caller | undefined) ?? null;
      if (def.access !== 'public') {
        if (!caller) throw new HttpError(401, 'signed_out', 'Please sign in.');
        if (def.access !== 'signed-in' && !def.access.includes(caller.role)) {
          throw new HttpError(403, 'forbidden', 'Your role cannot do this. Ask the studio owner.');
        }
      }
      const result = await def.handler({ req, res, deps, caller });
      if (res.headersSent) return;
      if (result === undefined) res.status(204).end();
      else res.json(result);
    });
  }
}
