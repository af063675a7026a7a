import { Router } from 'express';
import { z } from 'zod';
import { workshopSettingsSchema } from '../../../shared/schemas/estimates';
import { addWorkshopAdminSchema } from '../../../shared/schemas/workshop';
import type { AppDeps } from '../../app-deps';
import { ConflictError, NotFoundError } from '../../http/errors';
import { input, validate } from '../../http/validate';
import { usersRepo } from '../auth/users.repo';
import { workshopGuard } from './workshop-guard';
import { workshopAdminsRepo } from './workshop.repo';
import { readWorkshopSettings, writeWorkshopSettings } from './workshop-settings';

const put = { body: workshopSettingsSchema };
const add = { body: addWorkshopAdminSchema };
const remove = { params: z.object({ userId: z.coerce.number().int().positive() }) };

/**
 * `GET/PUT /api/workshop/settings`: the workshop's currency, prices, tax and invoice prefix, read by its technicians
 * and changed by its administrators; `/api/workshop/admins`: who those are, named and removed by one another.
 */
export function workshopRoutes({ db }: AppDeps): Router {
  const router = Router();
  const admins = workshopAdminsRepo(db);
  router.get('/workshop/settings', workshopGuard(db, 'settings.view'), async (_req, res) => {
    res.json(await readWorkshopSettings(db));
  });
  router.put(
    '/workshop/settings',
    workshopGuard(db, 'settings.edit', { admin: true }),
    validate(put),
    async (_req, res) => {
      res.json(await writeWorkshopSettings(db, input(res, put).body));
    },
  );
  router.get('/workshop/admins', workshopGuard(db, 'settings.view'), async (req, res) => {
    const youAreAdmin = await admins.isAdmin(req.user!.id);
    res.json({ admins: await admins.list(youAreAdmin), youAreAdmin });
  });
  router.post(
    '/workshop/admins',
    workshopGuard(db, 'settings.edit', { admin: true }),
    validate(add),
    async (_req, res) => {
      const person = await usersRepo(db).byEmail(input(res, add).body.email);
      if (!person?.emailConfirmedAt)
        throw new NotFoundError('No confirmed account has that address: they sign up first, then you add them.');
      await admins.grant(person.id);
      res.status(201).json({ admins: await admins.list(true), youAreAdmin: true });
    },
  );
  router.delete(
    '/workshop/admins/:userId',
    workshopGuard(db, 'settings.edit', { admin: true }),
    validate(remove),
    async (req, res) => {
      const { userId } = input(res, remove).params;
      if (!(await admins.isAdmin(userId))) throw new NotFoundError('That person is not one of the administrators.');
      if (!(await admins.revoke(userId)))
        throw new ConflictError('The workshop keeps at least one administrator: add another before removing this one.');
      const youAreAdmin = await admins.isAdmin(req.user!.id);
      res.json({ admins: await admins.list(youAreAdmin), youAreAdmin });
    },
  );
  return router;
}
