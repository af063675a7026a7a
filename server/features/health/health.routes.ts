import { Router } from 'express';
import type { Health } from '../../../shared/schemas/health';
import type { AppDeps } from '../../app-deps';
import { databaseAnswers } from './health.repo';

/**
 * GET /api/health probes each service for real. The database and storage decide readiness (503 when
 * either is down, so a load balancer takes the instance out); mail being down is reported but still 200:
 * every instance shares the mail server, and taking them all out would not bring it back.
 */
export function healthRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const [database, storage, mail] = await Promise.all([
      databaseAnswers(deps.db),
      deps.storage.probe(),
      deps.mailer.probe(),
    ]);
    const body: Health = { ok: database && storage, database, storage, mail };
    res.status(body.ok ? 200 : 503).json(body);
  });
  return router;
}
