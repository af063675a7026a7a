import { Router } from 'express';
import { tokenParamsSchema } from '../../../shared/schemas/members';
import type { AppDeps } from '../../app-deps';
import { requireUser } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { invitationsService } from './invitations.service';

const byToken = { params: tokenParamsSchema };

/** The invitation link: what it offers (anyone holding it), and accepting it (the invited account). */
export function invitationsRoutes(deps: AppDeps): Router {
  const service = invitationsService(deps);
  const router = Router();
  router.get('/invitations/:token', validate(byToken), async (_req, res) => {
    res.json(await service.preview(input(res, byToken).params.token));
  });
  router.post('/invitations/:token/accept', requireUser, validate(byToken), async (req, res) => {
    res.json(await service.accept(input(res, byToken).params.token, req.user!));
  });
  return router;
}
