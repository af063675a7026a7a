import { Router, type Request, type Response } from 'express';
import { findingInputSchema, findingPatchSchema } from '../../../shared/schemas/findings';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { photosRepo } from '../photos/photos.repo';
import { findingsListCache, sendCachedList } from './findings-cache';
import { findingCursor, findingOrder } from './findings.repo';
import { findingsService, toFinding } from './findings.service';

const one = { params: idParamsSchema };
const paged = { params: idParamsSchema, query: pageQuerySchema };
const create = { params: idParamsSchema, body: findingInputSchema };
const patch = { params: idParamsSchema, body: findingPatchSchema };

export const actorOf = (req: Request, res: Response) => ({ id: req.user!.id, name: req.user!.name, role: roleOf(res) });

/**
 * Findings: marks on a photo. The guard admits members, settles visibility (404) and the route's action (403); a
 * change asks the policy field by field in the service (sharing, asking the mentors, resolving).
 */
export function findingsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = findingsService(deps);
  const photos = photosRepo(db);
  // The photo a finding is placed on: who may not see it gets a 404, then the rule for placing findings.
  const ofPhoto = async (_req: Request, res: Response) => {
    const photo = await photos.find(input(res, one).params.id);
    const denied = 'Owners follow findings; technicians and mentors place them.';
    return (
      photo && {
        restorationId: photo.restorationId,
        subject: { view: 'photos.view' as const, context: { ownerVisible: photo.ownerVisible }, denied },
      }
    );
  };
  // The finding's restoration and the reader's role in one query.
  const ofFinding = (req: Request, res: Response) => service.accessOf(input(res, one).params.id, req.user!.id);
  const router = Router();

  // The hot read of the markup canvas: the photo, the membership and the list's version in one query,
  // then the list from the cache (or built once per version and visibility variant), 304 when unchanged.
  const lists = findingsListCache();
  const photoAccess = async (req: Request, res: Response) => {
    const access = await photos.accessOf(input(res, one).params.id, req.user!.id);
    if (access) res.locals.findingsVersion = access.findingsVersion;
    return access;
  };
  router.get('/photos/:id/findings', ...guarded(db, one, 'restoration.view', photoAccess), async (req, res) => {
    const photoId = input(res, one).params.id;
    const role = roleOf(res);
    const entry = await lists.read(photoId, role, res.locals.findingsVersion as number, () =>
      service.listByPhotoJson(photoId, role),
    );
    await sendCachedList(req, res, entry);
  });
  router.post('/photos/:id/findings', ...guarded(db, create, 'findings.create', ofPhoto), async (req, res) => {
    const { params, body } = input(res, create);
    res
      .status(201)
      .json(await service.create(params.id, body as typeof body & { ownerVisible: boolean }, actorOf(req, res)));
  });
  // By number, in pages (see shared/schemas/pagination.ts).
  router.get('/restorations/:id/findings', ...guarded(db, paged, 'restoration.view'), async (req, res) => {
    const { params, query } = input(res, paged);
    const rows = await service.pageByRestoration(params.id, roleOf(res), pageWindow(query, findingOrder.kinds));
    await sendPage(req, res, rows, query.limit, findingCursor, (page) => page.map((f) => toFinding(f, roleOf(res))));
  });
  router.get('/findings/:id', ...guarded(db, one, 'restoration.view', ofFinding), async (_req, res) => {
    res.json(await service.get(input(res, one).params.id, roleOf(res)));
  });
  router.patch('/findings/:id', ...guarded(db, patch, 'restoration.view', ofFinding), async (req, res) => {
    const { params, body } = input(res, patch);
    res.json(await service.update(params.id, body, actorOf(req, res)));
  });
  const ofFindingToDelete = (req: Request, res: Response) =>
    service.subjectOf(
      input(res, one).params.id,
      req.user!.id,
      'Only a technician deletes a finding someone else placed.',
    );
  router.delete('/findings/:id', ...guarded(db, one, 'findings.delete', ofFindingToDelete), async (req, res) => {
    await service.remove(input(res, one).params.id, actorOf(req, res));
    res.status(204).end();
  });
  router.get('/findings/:id/history', ...guarded(db, one, 'restoration.view', ofFinding), async (_req, res) => {
    res.json(await service.history(input(res, one).params.id, roleOf(res)));
  });
  // A crop of the marked spot; redirects to a short-lived URL so it can be used as an image source.
  router.get('/findings/:id/closeup', ...guarded(db, one, 'restoration.view', ofFinding), async (_req, res) => {
    res.redirect(302, await service.closeupUrl(input(res, one).params.id, roleOf(res)));
  });
  return router;
}
