import { Router } from 'express';
import type { Meta } from '../../../shared/schemas/meta';
import type { AppDeps } from '../../app-deps';
import { DEMO_PASSWORD, demoPeople } from '../../db/seed/demo-scenario';
import { isLoopbackRequest } from '../../http/loopback';
import { readWorkshopSettings } from '../workshop/workshop-settings';

/** GET /api/meta: demo mode, the demo accounts (listed only in demo mode) and the workshop's currency. */
export function metaRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/meta', async (req, res) => {
    const meta: Meta = {
      demo: deps.config.demo,
      // The link to captured mail shows only where the mail can be read (this machine).
      devMail: deps.config.devMail && isLoopbackRequest(req),
      demoAccounts: deps.config.demo
        ? Object.entries(demoPeople).map(([role, p]) => ({
            role,
            name: p.name,
            email: p.email,
            password: DEMO_PASSWORD,
          }))
        : [],
      currency: (await readWorkshopSettings(deps.db)).currency,
    };
    res.json(meta);
  });
  return router;
}
