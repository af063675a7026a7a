import { Router, type Request, type Response } from 'express';
import { commentInputSchema, commentPatchSchema } from '../../../shared/schemas/comments';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { BadRequestError } from '../../http/errors';
import { guarded, roleOf } from '../../http/guard';
import { pageWindow, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { actorOf } from '../findings/findings.routes';
import { findingsService } from '../findings/findings.service';
import { commentOrder } from './comments.repo';
import { commentsService } from './comments.service';

const one = { params: idParamsSchema };
const paged = { params: idParamsSchema, query: pageQuerySchema };
const create = { params: idParamsSchema, body: commentInputSchema };
/** A client retrying a post sends the same `Idempotency-Key` (printable ASCII, up to 128 characters). */
function idempotencyKey(req: Request): string | undefined {
  const key = req.get('Idempotency-Key');
  if (key === undefined) return undefined;
  if (!/^[\x21-\x7e]{1,128}$/.test(key))
    throw new BadRequestError('Idempotency-Key: use 1 to 128 printable characters, such as a UUID.');
  return key;
}
const edit = { params: idParamsSchema, body: commentPatchSchema };

export function commentsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = commentsService(deps);
  const findings = findingsService(deps);
  // The finding's restoration and the reader's role in one query.
  const ofFinding = (req: Request, res: Response) => findings.accessOf(input(res, one).params.id, req.user!.id);
  // The finding commented on: who may not see it gets a 404; owners comment only on what is shared with them.
  const ofFindingToComment = (req: Request, res: Response) =>
    findings.subjectOf(input(res, one).params.id, req.user!.id);
  const ofComment = (denied: string) => (req: Request, res: Response) =>
    service.subjectOf(input(res, one).params.id, req.user!.id, denied);
  const router = Router();

  // Oldest first, in pages (see shared/schemas/pagination.ts).
  router.get('/findings/:id/comments', ...guarded(db, paged, 'restoration.view', ofFinding), async (req, res) => {
    const { params, query } = input(res, paged);
    const rows = await service.list(params.id, roleOf(res), pageWindow(query, commentOrder.kinds));
    await sendPage(
      req,
      res,
      rows,
      query.limit,
      (c) => [c.createdAt, c.id],
      (page) => page,
    );
  });
  router.post(
    '/findings/:id/comments',
    ...guarded(db, create, 'comments.create', ofFindingToComment),
    async (req, res) => {
      const { params, body } = input(res, create);
      res.status(201).json(await service.create(params.id, body, actorOf(req, res), idempotencyKey(req)));
    },
  );
  router.patch(
    '/comments/:id',
    ...guarded(db, edit, 'comments.edit', ofComment('Only the author edits a comment.')),
    async (req, res) => {
      const { params, body } = input(res, edit);
      res.json(await service.edit(params.id, body.body, actorOf(req, res)));
    },
  );
  router.delete(
    '/comments/:id',
    ...guarded(db, one, 'comments.delete', ofComment('Only the author or a technician deletes a comment.')),
    async (req, res) => {
      await service.remove(input(res, one).params.id, actorOf(req, res));
      res.status(204).end();
    },
  );
  return router;
}
