import express, { Router } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppDeps } from './app-deps';
import { devMailRoutes } from './features/dev-mail/dev-mail.routes';
import { healthRoutes } from './features/health/health.routes';
import { metaRoutes } from './features/meta/meta.routes';
import { restorationsRoutes } from './features/restorations/restorations.routes';
import { apiNotFound, errorMiddleware } from './http/error-middleware';
import { requireSameOrigin } from './http/same-origin';

export type { AppDeps };

/** Builds the Express app (API under /api); the listener and the client are added by the caller. */
export function createApp(deps: AppDeps, options: { trustProxy?: string | boolean; relaxedCsp?: boolean } = {}) {
  const app = express();
  app.disable('x-powered-by');
  if (options.trustProxy !== undefined) app.set('trust proxy', options.trustProxy);
  app.use(
    helmet({
      // Vite's dev server injects an inline React refresh preamble; the production build needs none.
      contentSecurityPolicy: options.relaxedCsp
        ? false
        : { directives: { 'img-src': ["'self'", 'data:', 'blob:', 'http:', 'https:'], 'upgrade-insecure-requests': null } },
    }),
  );
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' || !req.url?.startsWith('/api') },
      // One short line per request; bodies and cookies never reach the log.
      serializers: { req: (req) => ({ method: req.method, url: req.url }), res: (res) => ({ status: res.statusCode }) },
    }),
  );

  const api = Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(requireSameOrigin(deps.config.publicOrigin));
  api.use(healthRoutes(deps));
  api.use(metaRoutes(deps));
  api.use(restorationsRoutes(deps));
  if (deps.config.devMail) api.use(devMailRoutes(deps));
  api.use(apiNotFound);
  api.use(errorMiddleware);
  app.use('/api', api);
  return app;
}
