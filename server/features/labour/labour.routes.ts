import { Router } from 'express';
import { labourEntryInputSchema, labourTimerInputSchema } from '../../../shared/schemas/labour';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded } from '../../http/guard';
import { input } from '../../http/validate';
import { labourService } from './labour.service';

const one = { params: idParamsSchema };
const typed = { params: idParamsSchema, body: labourEntryInputSchema };
const timer = { params: idParamsSchema, body: labourTimerInputSchema };

/** The labour log: technicians only (owners see time as invoice lines; mentors see no money). */
export function labourRoutes({ db }: AppDeps): Router {
  const service = labourService(db);
  const router = Router();
  router.get('/restorations/:id/labour', ...guarded(db, one, 'labour.record'), async (req, res) => {
    res.json(await service.log(input(res, one).params.id, req.user!.id));
  });
  router.post('/restorations/:id/labour', ...guarded(db, typed, 'labour.record'), async (req, res) => {
    const { params, body } = input(res, typed);
    res.status(201).json(await service.add(params.id, body, req.user!.id));
  });
  router.post('/restorations/:id/labour/timer', ...guarded(db, timer, 'labour.record'), async (req, res) => {
    const { params, body } = input(res, timer);
    res.status(201).json(await service.start(params.id, body, req.user!.id));
  });
  router.post('/restorations/:id/labour/timer/stop', ...guarded(db, one, 'labour.record'), async (req, res) => {
    res.json(await service.stop(input(res, one).params.id, req.user!.id));
  });
  return router;
}
