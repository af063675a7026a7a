import { Router } from 'express';
import {
  idParamsSchema,
  restorationInputSchema,
  restorationListQuerySchema,
  restorationPatchSchema,
} from '../../../shared/schemas/restorations';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import type { AppDeps } from '../../app-deps';
import { guarded, requireUser, roleOf } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input, validate } from '../../http/validate';
import { invitationsService } from '../invitations/invitations.service';
import { deleteSheetObjects } from '../sheets/sheet-objects';
import { benchCursor, benchOrder } from './restorations.repo';
import { restorationsService, toRestoration } from './restorations.service';

const list = { query: restorationListQuerySchema.extend(pageQuerySchema.shape) };
const create = { body: restorationInputSchema };
const one = { params: idParamsSchema };
const patch = { params: idParamsSchema, body: restorationPatchSchema };

export function restorationsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const removeObjects = async (keys: string[]) => {
    for (const key of keys)
      await deleteSheetObjects(deps.storage, key).catch((err: unknown) =>
        deps.logger.warn({ err }, 'sheet objects left for the sweep'),
      );
  };
  const service = restorationsService(db, invitationsService(deps).inviteIn, removeObjects);
  const router = Router();
  // The bench, most recently changed first, in pages (see shared/schemas/pagination.ts).
  router.get('/restorations', requireUser, validate(list), async (req, res) => {
    const { query } = input(res, list);
    const rows = await service.pageFor(req.user!.id, query, pageWindow(query, benchOrder.kinds));
    await sendPage(req, res, rows, query.limit, benchCursor, (page) => page.map((r) => toRestoration(r, r.role)));
  });
  router.post('/restorations', requireUser, validate(create), async (req, res) => {
    res.status(201).json(await service.create(input(res, create).body, req.user!.id));
  });
  router.get('/restorations/:id', ...guarded(db, one, 'restoration.view'), async (_req, res) => {
    res.json(await service.get(input(res, one).params.id, roleOf(res)));
  });
  router.patch('/restorations/:id', ...guarded(db, patch, 'restoration.edit'), async (req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body, roleOf(res), req.user!.id));
  });
  router.delete('/restorations/:id', ...guarded(db, one, 'restoration.delete'), async (_req, res) => {
    await service.remove(input(res, one).params.id);
    res.status(204).end();
  });
  return router;
}
