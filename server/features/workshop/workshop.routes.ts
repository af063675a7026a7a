import { Router, type RequestHandler } from 'express';
import { eq } from 'drizzle-orm';
import { can, workshopRole, type Action } from '../../../shared/permissions';
import { workshopSettingsSchema } from '../../../shared/schemas/estimates';
import type { AppDeps } from '../../app-deps';
import type { Database } from '../../db/client';
import { memberships } from '../../db/schema';
import { ForbiddenError, UnauthorizedError } from '../../http/errors';
import { input, validate } from '../../http/validate';
import { readWorkshopSettings, writeWorkshopSettings } from './workshop-settings';

/**
 * The guard for workshop-wide routes: signed in (else 401), and allowed by the policy for the person's workshop
 * role, taken from the roles they hold on restorations (else 403: the settings' existence is no secret).
 */
function workshopGuard(db: Database, action: Action): RequestHandler {
  return async (req, res, next) => {
    if (!req.user) throw new UnauthorizedError();
    const held = await db.selectDistinct({ role: memberships.role }).from(memberships).where(eq(memberships.userId, req.user.id));
    const role = workshopRole(held.map((h) => h.role));
    if (!can(role, action)) throw new ForbiddenError();
    res.locals.role = role;
    next();
  };
}

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
