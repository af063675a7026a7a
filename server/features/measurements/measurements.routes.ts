import { Router, type Request, type Response } from 'express';
import {
  lineUpSchema,
  measurementInputSchema,
  measurementListQuerySchema,
  measurementPatchSchema,
} from '../../../shared/schemas/measurements';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { measurementOrder, measurementsService } from './measurements.service';

const list = { params: idParamsSchema, query: measurementListQuerySchema.extend(pageQuerySchema.shape) };
const create = { params: idParamsSchema, body: measurementInputSchema };
const one = { params: idParamsSchema };
const patch = { params: idParamsSchema, body: measurementPatchSchema };
const lineUp = { params: idParamsSchema, body: lineUpSchema };

/** Readings with verdicts, and the valve line-up. Recording is the technician's; owners see shared readings. */
export function measurementsRoutes({ db }: AppDeps): Router {
  const service = measurementsService(db);
  const ofMeasurement = (_req: Request, res: Response) => service.subjectOf(input(res, one).params.id);
  const router = Router();
  // In the order they were taken, in pages (see shared/schemas/pagination.ts).
  router.get('/restorations/:id/measurements', ...guarded(db, list, 'restoration.view'), async (req, res) => {
    const { params, query } = input(res, list);
    const window = pageWindow(query, measurementOrder.kinds);
    const rows = await service.list(params.id, roleOf(res), query.findingId, window);
    await sendPage(
      req,
      res,
      rows,
      query.limit,
      (m) => [m.measuredAt, m.id],
      (page) => page,
    );
  });
  router.post('/restorations/:id/measurements', ...guarded(db, create, 'measurements.record'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(await service.create(params.id, body, req.user!.id));
  });
  router.patch('/measurements/:id', ...guarded(db, patch, 'measurements.record', ofMeasurement), async (req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body, req.user!.id));
  });
  router.delete('/measurements/:id', ...guarded(db, one, 'measurements.record', ofMeasurement), async (_req, res) => {
    await service.remove(input(res, one).params.id);
    res.status(204).end();
  });
  router.get('/restorations/:id/valves', ...guarded(db, one, 'restoration.view'), async (_req, res) => {
    res.json(await service.lineUp(input(res, one).params.id));
  });
  router.put('/restorations/:id/valves', ...guarded(db, lineUp, 'measurements.record'), async (_req, res) => {
    const { params, body } = input(res, lineUp);
    res.json(await service.setLineUp(params.id, body.valves));
  });
  return router;
}
