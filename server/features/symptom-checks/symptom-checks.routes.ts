import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import { symptomCheckInputSchema, symptomCheckParamsSchema } from '../../../shared/schemas/symptom-checks';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { symptomChecksService } from './symptom-checks.service';

const list = { params: idParamsSchema };
const record = { params: symptomCheckParamsSchema, body: symptomCheckInputSchema };

/** The symptom checklist's results: the workshop reads them, the technician at the bench records them. */
export function symptomChecksRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const checks = symptomChecksService(deps);
  const router = Router();
  router.get('/restorations/:id/symptom-checks', ...guarded(db, list, 'help.view'), async (_req, res) => {
    res.json(await checks.list(input(res, list).params.id, roleOf(res)));
  });
  router.put(
    '/restorations/:id/symptom-checks/:symptomId/:causeId',
    ...guarded(db, record, 'help.ask'),
    async (req, res) => {
      const { params, body } = input(res, record);
      res.json(await checks.record(params.id, params.symptomId, params.causeId, body, req.user!.id, roleOf(res)));
    },
  );
  return router;
}
