import { Router, type Request, type Response } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import {
  mismatchNoteInputSchema,
  mismatchNoteParamsSchema,
  mismatchNotePatchSchema,
  referenceMarksQuerySchema,
} from '../../../shared/schemas/sheets';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { mismatchesService } from './mismatches.service';

const list = { params: idParamsSchema, query: referenceMarksQuerySchema };
const create = { params: idParamsSchema, body: mismatchNoteInputSchema };
const one = { params: mismatchNoteParamsSchema };
const patch = { params: mismatchNoteParamsSchema, body: mismatchNotePatchSchema };

export function mismatchesRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = mismatchesService(db);
  const ofNote = (_req: Request, res: Response) => service.subjectOf(input(res, one).params.noteId);
  const router = Router();

  router.get('/restorations/:id/mismatch-notes', ...guarded(db, list, 'restoration.view'), async (_req, res) => {
    const { params, query } = input(res, list);
    res.json(await service.list(params.id, roleOf(res), query.ref));
  });
  router.post('/restorations/:id/mismatch-notes', ...guarded(db, create, 'references.mark'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(await service.create(params.id, body, req.user!.id));
  });
  router.patch('/mismatch-notes/:noteId', ...guarded(db, patch, 'references.mark', ofNote), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.noteId, body, roleOf(res)));
  });
  router.delete('/mismatch-notes/:noteId', ...guarded(db, one, 'references.mark', ofNote), async (_req, res) => {
    await service.remove(input(res, one).params.noteId, roleOf(res));
    res.status(204).end();
  });
  return router;
}
