import { Router } from 'express';
import {
  invitationInputSchema,
  invitationParamsSchema,
  memberParamsSchema,
  memberPatchSchema,
} from '../../../shared/schemas/members';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { invitationsService } from '../invitations/invitations.service';
import { memberOrder } from './members.repo';
import { membersService } from './members.service';

const one = { params: idParamsSchema };
const paged = { params: idParamsSchema, query: pageQuerySchema };
const member = { params: memberParamsSchema };
const rolePatch = { params: memberParamsSchema, body: memberPatchSchema };
const invite = { params: idParamsSchema, body: invitationInputSchema };
const invitation = { params: invitationParamsSchema };

/** People on a restoration: members, roles and pending invitations. */
export function membersRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const members = membersService(db);
  const invitations = invitationsService(deps);
  const router = Router();
  const base = '/restorations/:id';

  // In the order people joined, in pages (see shared/schemas/pagination.ts).
  router.get(`${base}/members`, ...guarded(db, paged, 'members.view'), async (req, res) => {
    const { params, query } = input(res, paged);
    const rows = await members.list(params.id, pageWindow(query, memberOrder.kinds));
    await sendPage(
      req,
      res,
      rows,
      query.limit,
      (m) => [m.since, m.name, m.userId],
      (page) => page,
    );
  });
  router.patch(`${base}/members/:userId`, ...guarded(db, rolePatch, 'members.manage'), async (_req, res) => {
    const { params, body } = input(res, rolePatch);
    await members.changeRole(params.id, params.userId, body.role);
    res.json(await members.list(params.id));
  });
  router.delete(`${base}/members/:userId`, ...guarded(db, member, 'members.manage'), async (_req, res) => {
    const { params } = input(res, member);
    await members.remove(params.id, params.userId);
    res.status(204).end();
  });
  router.get(`${base}/invitations`, ...guarded(db, one, 'members.manage'), async (_req, res) => {
    res.json(await invitations.listPending(input(res, one).params.id));
  });
  router.post(`${base}/invitations`, ...guarded(db, invite, 'members.manage'), async (req, res) => {
    const { params, body } = input(res, invite);
    const created = await invitations.invite(params.id, body.email, body.role, req.user!.id);
    res
      .status(201)
      .json({ id: created.id, email: created.email, role: created.role, expiresAt: created.expiresAt.toISOString() });
  });
  router.post(
    `${base}/invitations/:invitationId/resend`,
    ...guarded(db, invitation, 'members.manage'),
    async (req, res) => {
      const { params } = input(res, invitation);
      await invitations.resend(params.id, params.invitationId, req.user!.id);
      res.status(204).end();
    },
  );
  router.delete(
    `${base}/invitations/:invitationId`,
    ...guarded(db, invitation, 'members.manage'),
    async (_req, res) => {
      const { params } = input(res, invitation);
      await invitations.revoke(params.id, params.invitationId);
      res.status(204).end();
    },
  );
  return router;
}
