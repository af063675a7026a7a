import { Router } from 'express';
import { notificationsReadSchema } from '../../../shared/schemas/notifications';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import type { AppDeps } from '../../app-deps';
import { requireUser } from '../../http/guard';
import { decodeCursor, sendPage } from '../../http/pagination';
import { input, validate } from '../../http/validate';
import { notificationsService } from './notifications.service';
import { openQuestionsFor } from './open-questions.repo';

const paged = { query: pageQuerySchema };
const read = { body: notificationsReadSchema };

/** The signed-in person's unread items and the open questions waiting on their bench. */
export function notificationsRoutes(deps: AppDeps): Router {
  const service = notificationsService(deps);
  const router = Router();
  // Newest first, in pages (see shared/schemas/pagination.ts).
  router.get('/notifications', requireUser, validate(paged), async (req, res) => {
    const { query } = input(res, paged);
    const cursor = decodeCursor(query.cursor, ['number']);
    const items = await service.listFor(req.user!.id, query.limit + 1, cursor?.[0] as number | undefined);
    await sendPage(
      req,
      res,
      items,
      query.limit,
      (n) => [n.id],
      (page) => page,
    );
  });
  router.post('/notifications/read', requireUser, validate(read), async (req, res) => {
    await service.markRead(req.user!.id, input(res, read).body.ids);
    res.status(204).end();
  });
  router.get('/questions', requireUser, async (req, res) => {
    res.json(await openQuestionsFor(deps.db, req.user!.id));
  });
  return router;
}
