import { Router, type Request, type Response } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import {
  referenceMarkInputSchema,
  referenceMarkParamsSchema,
  referenceMarksQuerySchema,
} from '../../../shared/schemas/sheets';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { referencesService } from './references.service';

const one = { params: idParamsSchema };
const listMarks = { params: idParamsSchema, query: referenceMarksQuerySchema };
const create = { params: idParamsSchema, body: referenceMarkInputSchema };
const mark = { params: referenceMarkParamsSchema };

export function referencesRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = referencesService(db);
  const ofMark = (_req: Request, res: Response) => service.subjectOfMark(input(res, mark).params.markId);
  const router = Router();

  router.get('/restorations/:id/references', ...guarded(db, one, 'restoration.view'), async (_req, res) => {
    res.json(await service.summary(input(res, one).params.id, roleOf(res)));
  });
  router.get('/restorations/:id/reference-marks', ...guarded(db, listMarks, 'restoration.view'), async (_req, res) => {
    const { params, query } = input(res, listMarks);
    res.json(await service.listMarks(params.id, roleOf(res), query.ref));
  });
  router.post('/restorations/:id/reference-marks', ...guarded(db, create, 'references.mark'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(await service.mark(params.id, body, req.user!.id));
  });
  router.delete('/reference-marks/:markId', ...guarded(db, mark, 'references.mark', ofMark), async (_req, res) => {
    await service.remove(input(res, mark).params.markId, roleOf(res));
    res.status(204).end();
  });
  return router;
}
