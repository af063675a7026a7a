import { Router } from 'express';
import {
  helpLinkInputSchema,
  helpReplyParamsSchema,
  helpRequestInputSchema,
  helpRequestParamsSchema,
  helpRequestPatchSchema,
  helpTokenParamsSchema,
} from '../../../shared/schemas/help';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, requireUser, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { helpService } from './help.service';

const create = { params: idParamsSchema, body: helpRequestInputSchema };
const list = { params: idParamsSchema };
const one = { params: helpRequestParamsSchema };
const patch = { params: helpRequestParamsSchema, body: helpRequestPatchSchema };
const link = { params: helpRequestParamsSchema, body: helpLinkInputSchema };
const revoke = { params: helpTokenParamsSchema };
const approve = { params: helpReplyParamsSchema };

/** Help requests inside the workshop: technicians build and share them, mentors read them. */
export function helpRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const help = helpService(deps);
  const ofRequest = (_req: unknown, res: { locals: Record<string, unknown> }) =>
    help.restorationOf(input(res, one).params.helpRequestId);
  const router = Router();
  router.post('/restorations/:id/help-requests', ...guarded(db, create, 'help.ask'), async (req, res) => {
    const { params, body } = input(res, create);
    res
      .status(201)
      .json(await help.create(params.id, body.symptom, { id: req.user!.id, name: req.user!.name }, roleOf(res)));
  });
  router.get('/restorations/:id/help-requests', ...guarded(db, list, 'help.view'), async (_req, res) => {
    res.json(await help.list(input(res, list).params.id));
  });
  // The bench: requests on every set where the person is a technician or mentor (roles owners never hold there).
  router.get('/help-requests', requireUser, async (req, res) => {
    res.json(await help.bench(req.user!.id));
  });
  router.get('/help-requests/:helpRequestId', ...guarded(db, one, 'help.view', ofRequest), async (_req, res) => {
    res.json(await help.get(input(res, one).params.helpRequestId, roleOf(res)));
  });
  router.patch('/help-requests/:helpRequestId', ...guarded(db, patch, 'help.ask', ofRequest), async (_req, res) => {
    const { params, body } = input(res, patch);
    res.json(await help.update(params.helpRequestId, body, roleOf(res)));
  });
  router.post('/help-requests/:helpRequestId/links', ...guarded(db, link, 'help.ask', ofRequest), async (req, res) => {
    const { params, body } = input(res, link);
    res
      .status(201)
      .json(await help.createLink(res.locals.restorationId as number, params.helpRequestId, body.days, req.user!.id));
  });
  router.delete(
    '/help-links/:token',
    ...guarded(db, revoke, 'help.ask', (_req, res) => help.restorationOfToken(input(res, revoke).params.token)),
    async (req, res) => {
      await help.revoke(input(res, revoke).params.token, req.user!.id);
      res.status(204).end();
    },
  );
  router.post(
    '/help-replies/:replyId/approve',
    ...guarded(db, approve, 'help.ask', (_req, res) => help.restorationOfReply(input(res, approve).params.replyId)),
    async (req, res) => {
      res.json(await help.approve(input(res, approve).params.replyId, req.user!.id));
    },
  );
  return router;
}
