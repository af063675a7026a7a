import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import { safetyOverrideInputSchema, safetyTestInputSchema, soakStopSchema } from '../../../shared/schemas/safety';
import type { AppDeps } from '../../app-deps';
import { guarded } from '../../http/guard';
import { input } from '../../http/validate';
import { handBackService } from './hand-back.service';
import { safetyTestsService } from './safety-tests.service';
import { soakService } from './soak.service';

const one = { params: idParamsSchema };
const record = { params: idParamsSchema, body: safetyTestInputSchema };
const override = { params: idParamsSchema, body: safetyOverrideInputSchema };
const stop = { params: idParamsSchema, body: soakStopSchema };

/** The final safety test, the Returned override, soak sessions and sending the hand-back report. */
export function safetyRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const tests = safetyTestsService(db);
  const soak = soakService(db);
  const handBack = handBackService(deps);
  const router = Router();
  router.get('/restorations/:id/safety-tests', ...guarded(db, one, 'safety.view'), async (_req, res) => {
    res.json(await tests.status(input(res, one).params.id));
  });
  router.post('/restorations/:id/safety-tests', ...guarded(db, record, 'safety.record'), async (req, res) => {
    const { params, body } = input(res, record);
    res.status(201).json(await tests.record(params.id, body, req.user!.id));
  });
  router.post('/restorations/:id/safety-override', ...guarded(db, override, 'safety.override'), async (req, res) => {
    const { params, body } = input(res, override);
    res.status(201).json(await tests.override(params.id, body.reason, req.user!.id));
  });
  router.get('/restorations/:id/soak-sessions', ...guarded(db, one, 'safety.view'), async (_req, res) => {
    res.json(await soak.log(input(res, one).params.id));
  });
  router.post('/restorations/:id/soak-sessions', ...guarded(db, one, 'safety.record'), async (req, res) => {
    res.status(201).json(await soak.start(input(res, one).params.id, req.user!.id));
  });
  router.patch('/restorations/:id/soak-sessions/running', ...guarded(db, stop, 'safety.record'), async (req, res) => {
    const { params, body } = input(res, stop);
    res.json(await soak.stop(params.id, body, req.user!.id));
  });
  router.get('/restorations/:id/report/preview', ...guarded(db, one, 'report.send'), async (req, res) => {
    res.json(await handBack.preview(input(res, one).params.id, req.user!.name));
  });
  router.post('/restorations/:id/report/send', ...guarded(db, one, 'report.send'), async (req, res) => {
    res.json(await handBack.send(input(res, one).params.id, { id: req.user!.id, name: req.user!.name }));
  });
  return router;
}
