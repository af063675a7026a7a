import { Router } from 'express';
import { devMailQuerySchema } from '../../../shared/schemas/dev-mail';
import type { AppDeps } from '../../app-deps';
import { NotFoundError } from '../../http/errors';
import { isLoopbackRequest } from '../../http/loopback';
import { input, validate } from '../../http/validate';
import { devMailRepo } from './dev-mail.repo';

const list = { query: devMailQuerySchema };

/**
 * GET /api/dev/mail: what the local SMTP capture caught, newest first. Never mounted in production, and
 * answered only on this machine: captured mail holds sign-in links for every account.
 */
export function devMailRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get(
    '/dev/mail',
    (req, _res, next) => {
      if (!isLoopbackRequest(req))
        throw new NotFoundError('Captured mail is readable only on the machine running Gridleak.');
      next();
    },
    validate(list),
    async (_req, res) => {
      res.json(await devMailRepo(deps.db).newest(input(res, list).query.limit));
    },
  );
  return router;
}
