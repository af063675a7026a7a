import { Router } from 'express';
import { eq, inArray } from 'drizzle-orm';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { timelineQuerySchema, type ActivityItem } from '../../../shared/schemas/events';
import { events, memberships, restorations } from '../../db/schema';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser, roleOf } from '../../http/guard';
import { decodeCursor, sendPage } from '../../http/pagination';
import { input, validate } from '../../http/validate';
import { timelineService, type TimelineRow } from './timeline.service';

const list = { params: idParamsSchema, query: timelineQuerySchema.extend(pageQuerySchema.shape) };
/** Recent activity on the bench: the newest events the person may see across their sets. */
const ACTIVITY_WINDOW = 20;

export function eventsRoutes(deps: AppDeps): Router {
  const service = timelineService(deps);
  const router = Router();
  // The timeline in pages, newest first (see shared/schemas/pagination.ts).
  router.get('/restorations/:id/events', requireUser, validate(list), guard(deps.db, 'restoration.view'), async (req, res) => {
    const { params, query } = input(res, list);
    const cursor = decodeCursor(query.cursor, ['string', 'number']);
    const before = cursor && { at: new Date(cursor[0] as string), id: cursor[1] as number };
    const rows = await service.rows(service.ofRestoration(params.id, query.kind), { role: roleOf(res) }, query.limit + 1, before);
    await sendPage(req, res, rows, query.limit, (r: TimelineRow) => [r.at.toISOString(), r.e.id], (page) => service.present(page));
  });
  // Recent activity across the caller's restorations, for the bench, in one query; each event read as the caller's role there sees it.
  router.get('/activity', requireUser, async (req, res) => {
    const mine = deps.db.select({ id: memberships.restorationId }).from(memberships).where(eq(memberships.userId, req.user!.id));
    const rows = await service.rows(inArray(events.restorationId, mine), { userId: req.user!.id }, ACTIVITY_WINDOW);
    const sets = new Map(
      (await deps.db
        .select({ id: restorations.id, make: restorations.make, model: restorations.model, role: memberships.role })
        .from(memberships)
        .innerJoin(restorations, eq(restorations.id, memberships.restorationId))
        .where(eq(memberships.userId, req.user!.id))).map((s) => [s.id, s]),
    );
    const withSet = rows.filter((r) => sets.has(r.e.restorationId));
    const items = await service.present(withSet);
    const byId = new Map(withSet.map((r) => [r.e.id, sets.get(r.e.restorationId)!]));
    const activity: ActivityItem[] = items.map((e) => {
      const s = byId.get(e.id)!;
      return { ...e, restorationId: s.id, set: `${s.make} ${s.model}` };
    });
    res.json(activity);
  });
  return router;
}
