import compression from 'compression';
import express, { Router } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppDeps } from './app-deps';
import { authRoutes } from './features/auth/auth.routes';
import { createPassport } from './features/auth/passport';
import { sessionMiddleware } from './features/auth/session';
import { commentsRoutes } from './features/comments/comments.routes';
import { devMailRoutes } from './features/dev-mail/dev-mail.routes';
import { eventsRoutes } from './features/events/events.routes';
import { findingsRoutes } from './features/findings/findings.routes';
import { healthRoutes } from './features/health/health.routes';
import { helpRoutes } from './features/help/help.routes';
import { readingRequestsRoutes } from './features/reading-requests/reading-requests.routes';
import { symptomChecksRoutes } from './features/symptom-checks/symptom-checks.routes';
import { privateSharedPage, sharedHelpRoutes } from './features/help/shared-help.routes';
import { invitationsRoutes } from './features/invitations/invitations.routes';
import { membersRoutes } from './features/members/members.routes';
import { measurementsRoutes } from './features/measurements/measurements.routes';
import { bringupRoutes } from './features/bringup/bringup.routes';
import { metaRoutes } from './features/meta/meta.routes';
import { notificationsRoutes } from './features/notifications/notifications.routes';
import { partsRoutes } from './features/parts/parts.routes';
import { photosRoutes } from './features/photos/photos.routes';
import { referencesRoutes } from './features/references/references.routes';
import { mismatchesRoutes } from './features/mismatches/mismatches.routes';
import { reportRoutes } from './features/report/report.routes';
import { restorationsRoutes } from './features/restorations/restorations.routes';
import { safetyRoutes } from './features/safety/safety.routes';
import { sheetsRoutes } from './features/sheets/sheets.routes';
import { estimatesRoutes } from './features/estimates/estimates.routes';
import { labourRoutes } from './features/labour/labour.routes';
import { invoicesRoutes } from './features/invoices/invoices.routes';
import { workshopRoutes } from './features/workshop/workshop.routes';
import { paymentsRoutes, paymentWebhookRoute } from './features/payments/payments.routes';
import { apiNotFound, errorMiddleware } from './http/error-middleware';
import { redactedError } from './http/redact-error';
import { requireSameOrigin } from './http/same-origin';

export type { AppDeps };

/** Builds the Express app (API under /api); the listener and the client are added by the caller. */
export function createApp(deps: AppDeps, options: { trustProxy?: string | boolean; relaxedCsp?: boolean } = {}) {
  const app = express();
  app.disable('x-powered-by');
  if (options.trustProxy !== undefined) app.set('trust proxy', parseTrustProxy(options.trustProxy));
  app.use(
    helmet({
      // Vite's dev server injects an inline React refresh preamble; the production build needs none.
      contentSecurityPolicy: options.relaxedCsp
        ? false
        : {
            directives: {
              'img-src': ["'self'", 'data:', 'blob:', 'http:', 'https:'],
              'upgrade-insecure-requests': null,
            },
          },
    }),
  );
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' || !req.url?.startsWith('/api') },
      // One short line per request; bodies and cookies never reach the log.
      // Errors go through redactedError: query parameters (a password hash in a failed insert) never reach the log.
      serializers: {
        req: (req) => ({ method: req.method, url: req.url }),
        res: (res) => ({ status: res.statusCode }),
        err: redactedError,
      },
    }),
  );

  app.use('/shared/help', privateSharedPage);

  const passport = createPassport(deps.db);
  const api = Router();
  // JSON answers above 1 kB are compressed (brotli or gzip, as the client accepts).
  api.use(compression({ threshold: 1024 }));
  // The payment service's events need their raw bytes for the signature check: before the JSON parser, no session.
  api.use(paymentWebhookRoute(deps));
  api.use(express.json({ limit: '1mb' }));
  api.use(requireSameOrigin(deps.config.publicOrigin));
  api.use(healthRoutes(deps));
  api.use(metaRoutes(deps));
  // Read-only help links need no session (and set no cookie).
  api.use(sharedHelpRoutes(deps));
  api.use(sessionMiddleware(deps.pool, deps.config.sessionSecret));
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(authRoutes(deps, passport));
  api.use(restorationsRoutes(deps));
  api.use(membersRoutes(deps));
  api.use(invitationsRoutes(deps));
  api.use(photosRoutes(deps));
  api.use(findingsRoutes(deps));
  api.use(commentsRoutes(deps));
  api.use(notificationsRoutes(deps));
  api.use(measurementsRoutes(deps));
  api.use(partsRoutes(deps));
  api.use(eventsRoutes(deps));
  api.use(reportRoutes(deps));
  api.use(safetyRoutes(deps));
  api.use(bringupRoutes(deps));
  api.use(sheetsRoutes(deps));
  api.use(referencesRoutes(deps));
  api.use(mismatchesRoutes(deps));
  api.use(helpRoutes(deps));
  api.use(symptomChecksRoutes(deps));
  api.use(readingRequestsRoutes(deps));
  api.use(estimatesRoutes(deps));
  api.use(labourRoutes(deps));
  api.use(invoicesRoutes(deps));
  api.use(workshopRoutes(deps));
  api.use(paymentsRoutes(deps));
  if (deps.config.devMail) api.use(devMailRoutes(deps));
  api.use(apiNotFound);
  api.use(errorMiddleware);
  app.use('/api', api);
  return app;
}

function parseTrustProxy(value: string | boolean): string | boolean | number {
  if (typeof value === 'boolean') return value;
  if (value === 'true' || value === 'false') return value === 'true';
  return /^\d+$/.test(value) ? Number(value) : value;
}
