import { Router } from 'express';
import type { Meta } from '../../../shared/schemas/meta';
import type { AppDeps } from '../../app-deps';
import { DEMO_PASSWORD, demoPeople } from '../../db/seed/demo-scenario';

/** GET /api/meta: demo mode and the demo accounts (listed only in demo mode). */
export function metaRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/meta', (_req, res) => {
    const meta: Meta = {
      demo: deps.config.demo,
      devMail: deps.config.devMail,
      demoAccounts: deps.config.demo
        ? Object.entries(demoPeople).map(([role, p]) => ({ role, name: p.name, email: p.email, password: DEMO_PASSWORD }))
        : [],
    };
    res.json(meta);
  });
  return router;
}
