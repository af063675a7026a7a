import { Router, type Request, type Response } from 'express';
import { photoParamsSchema, photoPatchSchema } from '../../../shared/schemas/photos';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { photoCursor, photoOrder } from './photos.repo';
import { photosService } from './photos.service';
import { receiveUpload } from './receive-upload';

const one = { params: idParamsSchema };
const paged = { params: idParamsSchema, query: pageQuerySchema };
const photo = { params: photoParamsSchema };
const patch = { params: photoParamsSchema, body: photoPatchSchema };

export function photosRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = photosService(deps);
  const ofPhoto = (_req: Request, res: Response) => service.subjectOf(input(res, photo).params.id);
  const router = Router();

  // Oldest first, in pages (see shared/schemas/pagination.ts).
  router.get('/restorations/:id/photos', ...guarded(db, paged, 'restoration.view'), async (req, res) => {
    const { params, query } = input(res, paged);
    const rows = await service.page(params.id, roleOf(res), pageWindow(query, photoOrder.kinds));
    await sendPage(req, res, rows, query.limit, photoCursor, (page) => service.present(page, roleOf(res)));
  });
  // Permission is settled before a byte of the body is read.
  router.post('/restorations/:id/photos', ...guarded(db, one, 'photos.upload'), async (req, res) => {
    const restorationId = input(res, one).params.id;
    // The client hanging up before the answer cancels the work: an abandoned upload is not stored.
    const abandoned = new AbortController();
    res.once('close', () => !res.writableFinished && abandoned.abort());
    const upload = await receiveUpload(req, deps.config.uploads.maxBytes);
    try {
      const id = await service.ingest(restorationId, upload, upload.fields, req.user!.id, abandoned.signal);
      res.status(201).json(await service.get(id, roleOf(res)));
    } finally {
      await upload.discard();
    }
  });
  // One photo: the guard settles visibility (404) before the action (403).
  router.get('/photos/:id', ...guarded(db, photo, 'photos.view', ofPhoto), async (_req, res) => {
    res.json(await service.get(input(res, photo).params.id, roleOf(res)));
  });
  router.patch('/photos/:id', ...guarded(db, patch, 'photos.edit', ofPhoto), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body, roleOf(res)));
  });
  router.delete('/photos/:id', ...guarded(db, photo, 'photos.delete', ofPhoto), async (_req, res) => {
    await service.remove(input(res, photo).params.id, roleOf(res));
    res.status(204).end();
  });
  return router;
}
