import { Router } from 'express';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { timelineQuerySchema } from '../../../shared/schemas/events';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser, roleOf } from '../../http/guard';
import { decodeCursor, sendPage } from '../../http/pagination';
import { input, validate } from '../../http/validate';
import { activityService } from './activity.service';
import { timelineService, type TimelineRow } from './timeline.service';

const list = { params: idParamsSchema, query: timelineQuerySchema.extend(pageQuerySchema.shape) };

export function eventsRoutes(deps: AppDeps): Router {
  const service = timelineService(deps);
  const activity = activityService(deps);
  const router = Router();
  // The timeline in pages, newest first (see shared/schemas/pagination.ts).
  router.get(
    '/restorations/:id/events',
    requireUser,
    validate(list),
    guard(deps.db, 'restoration.view'),
    async (req, res) => {
      const { params, query } = input(res, list);
      const cursor = decodeCursor(query.cursor, ['string', 'number']);
      const before = cursor && { at: new Date(cursor[0] as string), id: cursor[1] as number };
      const rows = await service.rows(
        service.ofRestoration(params.id, query.kind),
        { role: roleOf(res) },
        query.limit + 1,
        before,
      );
      await sendPage(
        req,
        res,
        rows,
        query.limit,
        (r: TimelineRow) => [r.at.toISOString(), r.e.id],
        (page) => service.present(page),
      );
    },
  );
  // Recent activity across the caller's restorations, for the bench, in one query; each event read as the caller's role there sees it.
  router.get('/activity', requireUser, async (req, res) => {
    res.json(await activity.recentFor(req.user!.id));
  });
  return router;
}
