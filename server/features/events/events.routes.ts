import { Router } from 'express';
import { timelineQuerySchema } from '../../../shared/schemas/parts';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser, roleOf } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { timelineService } from './timeline.service';

const list = { params: idParamsSchema, query: timelineQuerySchema };

export function eventsRoutes(deps: AppDeps): Router {
  const service = timelineService(deps);
  const router = Router();
  router.get('/restorations/:id/events', requireUser, validate(list), guard(deps.db, 'restoration.view'), async (_req, res) => {
    const { params, query } = input(res, list);
    res.json(await service.list(params.id, roleOf(res), query.kind));
  });
  return router;
}
