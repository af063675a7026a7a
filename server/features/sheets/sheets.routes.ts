import { Router, type Request, type Response } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import { sheetPageParamsSchema, sheetPagePatchSchema } from '../../../shared/schemas/sheets';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { receiveUpload } from '../photos/receive-upload';
import { sheetsService } from './sheets.service';

const one = { params: idParamsSchema };
const page = { params: sheetPageParamsSchema };
const patch = { params: sheetPageParamsSchema, body: sheetPagePatchSchema };

export function sheetsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = sheetsService(deps);
  const ofPage = (_req: Request, res: Response) => service.subjectOfPage(input(res, page).params.pageId);
  const router = Router();

  router.get('/restorations/:id/sheets', ...guarded(db, one, 'restoration.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id, roleOf(res)));
  });
  // Permission is settled before a byte of the body is read.
  router.post('/restorations/:id/sheets', ...guarded(db, one, 'sheets.upload'), async (req, res) => {
    const abandoned = new AbortController();
    res.once('close', () => !res.writableFinished && abandoned.abort());
    const upload = await receiveUpload(req, deps.config.uploads.maxBytes);
    try {
      res
        .status(201)
        .json(
          await service.ingest(
            input(res, one).params.id,
            upload,
            upload.fields,
            req.user!.id,
            roleOf(res),
            abandoned.signal,
          ),
        );
    } finally {
      await upload.discard();
    }
  });
  // One page: the guard settles visibility (404) before the action (403).
  router.get('/sheet-pages/:pageId', ...guarded(db, page, 'sheets.view', ofPage), async (_req, res) => {
    res.json(await service.get(input(res, page).params.pageId, roleOf(res)));
  });
  router.patch('/sheet-pages/:pageId', ...guarded(db, patch, 'sheets.edit', ofPage), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.pageId, body, roleOf(res)));
  });
  router.delete('/sheet-pages/:pageId', ...guarded(db, page, 'sheets.edit', ofPage), async (_req, res) => {
    await service.remove(input(res, page).params.pageId, roleOf(res));
    res.status(204).end();
  });
  return router;
}
