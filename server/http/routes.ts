// One route definition: its method, path and access rule, the zod schemas of its params, query
// and body, and a handler that receives them parsed, with a caller that is never null unless the
// route is public, and the request's own logger. Tests walk the whole table (access.test.ts).
import type { Request, Response, Router } from 'express';
import type { z } from 'zod';
import type { Role } from '../../shared/schemas/studio';
import type { AppServices } from '../context';
import type { Logger } from '../services/logging/logger';
import { HttpError } from './errors';

export type Access = 'public' | 'signed-in' | readonly Role[];
export type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

export interface Caller {
  memberId: string;
  studioId: string;
  role: Role;
  sessionId: string;
}

/** What a handler is handed: its parsed inputs, who calls, the app's services and the request's logger. */
export interface RouteContext<Params = unknown, Query = unknown, Body = unknown, C = Caller | null> {
  req: Request;
  res: Response;
  services: AppServices;
  caller: C;
  /** The request's logger: every line carries its request id. */
  log: Logger;
  params: Params;
  query: Query;
  body: Body;
}

/** What helpers shared by a feature's signed-in routes are handed. */
export type SignedInContext = RouteContext<unknown, unknown, unknown, Caller>;

type CallerOf<A extends Access> = A extends 'public' ? Caller | null : Caller;

export interface RouteSpec<A extends Access, Params, Query, Body> {
  method: Method;
  path: string;
  access: A;
  params?: z.ZodType<Params>;
  query?: z.ZodType<Query>;
  body?: z.ZodType<Body>;
  handler: (ctx: RouteContext<Params, Query, Body, CallerOf<A>>) => Promise<unknown> | unknown;
}

/** A route as the table holds it; build one with `route()`. */
export interface RouteDef {
  method: Method;
  path: string;
  access: Access;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  handler: (ctx: RouteContext<never, never, never, never>) => Promise<unknown> | unknown;
}

/**
 * Declares a route. Inputs it does not declare are `undefined` (a route that reads a raw body,
 * such as an upload or a plan file, uses `ctx.req`).
 */
export function route<const A extends Access, Params = undefined, Query = undefined, Body = undefined>(
  spec: RouteSpec<A, Params, Query, Body>,
): RouteDef {
  return spec as unknown as RouteDef;
}

export const ALL_ROLES: readonly Role[] = ['owner', 'designer', 'viewer'];
export const WRITERS: readonly Role[] = ['owner', 'designer'];
export const OWNERS: readonly Role[] = ['owner'];

export function mountRoutes(router: Router, services: AppServices, defs: RouteDef[]): void {
  for (const def of defs) {
    router[def.method](def.path, async (req: Request, res: Response) => {
      const caller = (res.locals.caller as Caller | undefined) ?? null;
      if (def.access !== 'public') {
        if (!caller) throw new HttpError(401, 'signed_out', 'Please sign in.');
        if (def.access !== 'signed-in' && !def.access.includes(caller.role)) {
          throw new HttpError(403, 'forbidden', 'Your role cannot do this. Ask the studio owner.');
        }
      }
      const ctx: RouteContext = {
        req,
        res,
        services,
        caller,
        // Made on first use: most answers never log a line of their own.
        get log() {
          return req.log ?? services.logger;
        },
        params: def.params ? def.params.parse(req.params) : undefined,
        query: def.query ? def.query.parse(req.query) : undefined,
        body: def.body ? def.body.parse(req.body ?? {}) : undefined,
      };
      const result = await (def.handler as (ctx: RouteContext) => unknown)(ctx);
      if (res.headersSent) return;
      if (result === undefined) res.status(204).end();
      else res.json(result);
    });
  }
}
