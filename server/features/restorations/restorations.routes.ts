import { Router } from 'express';
import {
  idParamsSchema,
  restorationInputSchema,
  restorationListQuerySchema,
  restorationPatchSchema,
} from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { input, validate } from '../../http/validate';
import { restorationsService } from './restorations.service';

const list = { query: restorationListQuerySchema };
const create = { body: restorationInputSchema };
const one = { params: idParamsSchema };
const patch = { params: idParamsSchema, body: restorationPatchSchema };

export function restorationsRoutes(deps: AppDeps): Router {
  const service = restorationsService(deps.db);
  const router = Router();
  router.get('/restorations', validate(list), async (_req, res) => {
    res.json(await service.list(input(res, list).query));
  });
  router.post('/restorations', validate(create), async (_req, res) => {
    res.status(201).json(await service.create(input(res, create).body));
  });
  router.get('/restorations/:id', validate(one), async (_req, res) => {
    res.json(await service.get(input(res, one).params.id));
  });
  router.patch('/restorations/:id', validate(patch), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body));
  });
  router.delete('/restorations/:id', validate(one), async (_req, res) => {
    await service.remove(input(res, one).params.id);
    res.status(204).end();
  });
  return router;
}
