import { Router } from 'express';
import {
  bringupStepInputSchema,
  intakeCheckInputSchema,
  prePowerCheckInputSchema,
} from '../../../shared/schemas/bringup';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { bringupService } from './bringup.service';

const one = { params: idParamsSchema };
const intake = { params: idParamsSchema, body: intakeCheckInputSchema };
const check = { params: idParamsSchema, body: prePowerCheckInputSchema };
const step = { params: idParamsSchema, body: bringupStepInputSchema };

/**
 * Intake checklist, pre-power checklist with its sign-off, and the staged power-up log. Everyone on the
 * restoration reads it; technicians record it and sign the pre-power checklist off.
 */
export function bringupRoutes({ db }: AppDeps): Router {
  const service = bringupService(db);
  const router = Router();
  router.get('/restorations/:id/bringup', ...guarded(db, one, 'bringup.view'), async (_req, res) => {
    res.json(await service.get(input(res, one).params.id, roleOf(res)));
  });
  router.put('/restorations/:id/bringup/intake', ...guarded(db, intake, 'bringup.record'), async (req, res) => {
    const { params, body } = input(res, intake);
    res.json(await service.setIntake(params.id, body, req.user!.id, roleOf(res)));
  });
  router.put('/restorations/:id/bringup/pre-power', ...guarded(db, check, 'bringup.record'), async (req, res) => {
    const { params, body } = input(res, check);
    res.json(await service.setPrePower(params.id, body, req.user!.id, roleOf(res)));
  });
  router.post(
    '/restorations/:id/bringup/pre-power/sign-off',
    ...guarded(db, one, 'bringup.signoff'),
    async (req, res) => {
      res.json(await service.signOff(input(res, one).params.id, req.user!.id, roleOf(res)));
    },
  );
  router.post('/restorations/:id/bringup/steps', ...guarded(db, step, 'bringup.record'), async (req, res) => {
    const { params, body } = input(res, step);
    res.status(201).json(await service.addStep(params.id, body, req.user!.id, roleOf(res)));
  });
  return router;
}
