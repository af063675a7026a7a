import { Router, type Request, type Response } from 'express';
import {
  estimateDecisionInputSchema,
  estimateInputSchema,
  estimateParamsSchema,
} from '../../../shared/schemas/estimates';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { estimatesService } from './estimates.service';

const one = { params: idParamsSchema };
const create = { params: idParamsSchema, body: estimateInputSchema };
const byId = { params: estimateParamsSchema };
const decide = { params: estimateParamsSchema, body: estimateDecisionInputSchema };

/** Estimates: technicians write and send versions; the owner reads the sent ones and answers; mentors see none. */
export function estimatesRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = estimatesService(deps);
  const ofEstimate = (_req: Request, res: Response) => service.restorationOf(input(res, byId).params.estimateId);
  const router = Router();
  // The prices a new estimate on this set will carry (currency, labour rate, markup, tax), for the technician's form.
  router.get('/restorations/:id/money-settings', ...guarded(db, one, 'money.edit'), async (_req, res) => {
    res.json(await readWorkshopSettings(db));
  });
  router.get('/restorations/:id/estimates', ...guarded(db, one, 'money.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id, roleOf(res)));
  });
  router.post('/restorations/:id/estimates', ...guarded(db, create, 'money.edit'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(await service.create(params.id, body, req.user!.id, roleOf(res)));
  });
  router.post('/estimates/:estimateId/send', ...guarded(db, byId, 'money.edit', ofEstimate), async (req, res) => {
    res.json(await service.send(input(res, byId).params.estimateId, req.user!.id, roleOf(res)));
  });
  router.post(
    '/estimates/:estimateId/decision',
    ...guarded(db, decide, 'estimates.decide', ofEstimate),
    async (req, res) => {
      const { params, body } = input(res, decide);
      res.json(await service.decide(params.estimateId, body, req.user!.id, roleOf(res)));
    },
  );
  return router;
}
