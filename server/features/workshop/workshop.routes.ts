import { Router } from 'express';
import { workshopSettingsSchema } from '../../../shared/schemas/estimates';
import type { AppDeps } from '../../app-deps';
import { input, validate } from '../../http/validate';
import { workshopGuard } from './workshop-guard';
import { readWorkshopSettings, writeWorkshopSettings } from './workshop-settings';

const put = { body: workshopSettingsSchema };

/** `GET/PUT /api/workshop/settings`: the workshop's currency, prices, tax and invoice prefix, for its technicians. */
export function workshopRoutes({ db }: AppDeps): Router {
  const router = Router();
  router.get('/workshop/settings', workshopGuard(db, 'settings.view'), async (_req, res) => {
    res.json(await readWorkshopSettings(db));
  });
  router.put('/workshop/settings', workshopGuard(db, 'settings.edit'), validate(put), async (_req, res) => {
    res.json(await writeWorkshopSettings(db, input(res, put).body));
  });
  return router;
}
