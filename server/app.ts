// createApp(deps) builds the Express app without listening, so tests can drive it directly.
import express, { type Express, Router } from 'express';
import { existsSync } from 'node:fs';
import { resolve, join } from 'node:path';
import type { AppDeps, AppServices } from './context';
import { createServices } from './compose';
import { errorMiddleware, HttpError } from './http/errors';
import { mountRoutes, type RouteDef } from './http/routes';
import { sessionMiddleware } from './services/auth/session';
import { authRoutes } from './features/auth/auth.routes';
import { studioRoutes } from './features/studio/studio.routes';
import { clientRoutes } from './features/clients/clients.routes';
import { projectRoutes } from './features/projects/projects.routes';
import { outboxRoutes } from './features/outbox/outbox.routes';
import { roomRoutes } from './features/rooms/rooms.routes';
import { finishRoutes } from './features/finishes/finishes.routes';
import { modelRoutes } from './features/models/models.routes';
import { fileRoutes } from './features/files/files.routes';
import { presentationRoutes } from './features/presentations/presentations.routes';
import { clientPresentationRoutes, readyLinkFastPath } from './features/presentations/client.routes';
import { mountPresentationPage } from './features/presentations/client-page';
import { scheduleRoutes } from './features/schedules/schedules.routes';
import { requestLogBeginner, requestLogger } from './services/logging/logger';
import { apiNoStore, securityHeaderList, securityHeaders } from './services/security/headers';
import { originCheck } from './services/security/origin-check';

export type { AppDeps, AppServices } from './context';

const BODY_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Every API route with its access rule: the app mounts exactly this table. */
export function allRoutes(): RouteDef[] {
  // The client's link routes first: a busy link's requests then match at once instead of being
  // tried against every route of the studio's own (no other path can match theirs).
  return [
    ...clientPresentationRoutes,
    ...authRoutes,
    ...studioRoutes,
    ...clientRoutes,
    ...projectRoutes,
    ...roomRoutes,
    ...finishRoutes,
    ...modelRoutes,
    ...fileRoutes,
    ...presentationRoutes,
    ...scheduleRoutes,
    ...outboxRoutes,
  ];
}

export function createApp(deps: AppDeps): Express {
  return createAppWithServices(deps).app;
}

/** The app and the services it was built with (the server closes them on shutdown). */
export function createAppWithServices(deps: AppDeps): { app: Express; services: AppServices } {
  const services = createServices(deps);
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  // A client link's ready answer first, with its own headers and log line (see readyLinkFastPath).
  app.get(
    '/api/p/:token',
    readyLinkFastPath(services.links, {
      beginLog: requestLogBeginner(services.logger),
      security: securityHeaderList({ secure: deps.config.SECURE_COOKIES }),
    }),
  );
  app.use(requestLogger(services.logger));
  app.use(securityHeaders({ secure: deps.config.SECURE_COOKIES }));
  app.use('/api', apiNoStore());
  const json = express.json({ limit: '2mb' });
  // Only writes carry a body: a GET's is never read, so it can never fail as "not valid JSON".
  app.use('/api', (req, res, next) => (BODY_METHODS.has(req.method) ? json(req, res, next) : next()));
  app.use('/api', originCheck(deps.config.publicUrl));
  app.use('/api', sessionMiddleware(deps.db));

  const api = Router();
  mountRoutes(api, services, allRoutes());
  app.use(api);
  app.use('/api', (_req, _res, next) => next(new HttpError(404, 'not_found', 'No such API route.')));

  const dist = resolve(deps.config.CLIENT_DIST);
  if (existsSync(join(dist, 'index.html'))) {
    app.use('/assets', express.static(join(dist, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }));
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    mountPresentationPage(app, dist);
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(join(dist, 'index.html'));
    });
  }
  app.use(errorMiddleware);
  return { app, services };
}
