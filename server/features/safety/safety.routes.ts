import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import { safetyOverrideInputSchema, safetyTestInputSchema, soakStopSchema } from '../../../shared/schemas/safety';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser } from '../../http/guard';
import { input, validate } from '../../http/validate';
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
  router.get(
    '/restorations/:id/safety-tests',
    requireUser,
    validate(one),
    guard(db, 'safety.view'),
    async (_req, res) => {
      res.json(await tests.status(input(res, one).params.id));
    },
  );
  router.post(
    '/restorations/:id/safety-tests',
    requireUser,
    validate(record),
    guard(db, 'safety.record'),
    async (req, res) => {
      const { params, body } = input(res, record);
      res.status(201).json(await tests.record(params.id, body, req.user!.id));
    },
  );
  router.post(
    '/restorations/:id/safety-override',
    requireUser,
    validate(override),
    guard(db, 'safety.override'),
    async (req, res) => {
      const { params, body } = input(res, override);
      res.status(201).json(await tests.override(params.id, body.reason, req.user!.id));
    },
  );
  router.get(
    '/restorations/:id/soak-sessions',
    requireUser,
    validate(one),
    guard(db, 'safety.view'),
    async (_req, res) => {
      res.json(await soak.log(input(res, one).params.id));
    },
  );
  router.post(
    '/restorations/:id/soak-sessions',
    requireUser,
    validate(one),
    guard(db, 'safety.record'),
    async (req, res) => {
      res.status(201).json(await soak.start(input(res, one).params.id, req.user!.id));
    },
  );
  router.patch(
    '/restorations/:id/soak-sessions/running',
    requireUser,
    validate(stop),
    guard(db, 'safety.record'),
    async (req, res) => {
      const { params, body } = input(res, stop);
      res.json(await soak.stop(params.id, body, req.user!.id));
    },
  );
  router.get(
    '/restorations/:id/report/preview',
    requireUser,
    validate(one),
    guard(db, 'report.send'),
    async (req, res) => {
      res.json(await handBack.preview(input(res, one).params.id, req.user!.name));
    },
  );
  router.post(
    '/restorations/:id/report/send',
    requireUser,
    validate(one),
    guard(db, 'report.send'),
    async (req, res) => {
      res.json(await handBack.send(input(res, one).params.id, { id: req.user!.id, name: req.user!.name }));
    },
  );
  return router;
}
