import { Router, type Request, type Response } from 'express';
import { photoParamsSchema, photoPatchSchema } from '../../../shared/schemas/photos';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser, roleOf } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { photosService } from './photos.service';
import { receiveUpload } from './receive-upload';

const one = { params: idParamsSchema };
const photo = { params: photoParamsSchema };
const patch = { params: photoParamsSchema, body: photoPatchSchema };

export function photosRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = photosService(deps);
  const ofPhoto = (_req: Request, res: Response) => service.restorationOf(input(res, photo).params.id);
  const router = Router();

  router.get('/restorations/:id/photos', requireUser, validate(one), guard(db, 'restoration.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id, roleOf(res)));
  });
  // Permission is settled before a byte of the body is read.
  router.post('/restorations/:id/photos', requireUser, validate(one), guard(db, 'photos.upload'), async (req, res) => {
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
  // One photo: the service settles visibility (404) before the action (403).
  router.get('/photos/:id', requireUser, validate(photo), guard(db, 'restoration.view', ofPhoto), async (_req, res) => {
    res.json(await service.get(input(res, photo).params.id, roleOf(res)));
  });
  router.patch('/photos/:id', requireUser, validate(patch), guard(db, 'restoration.view', ofPhoto), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body, roleOf(res)));
  });
  router.delete('/photos/:id', requireUser, validate(photo), guard(db, 'restoration.view', ofPhoto), async (_req, res) => {
    await service.remove(input(res, photo).params.id, roleOf(res));
    res.status(204).end();
  });
  return router;
}
