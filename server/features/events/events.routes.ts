import { Router } from 'express';
import { eq } from 'drizzle-orm';
import { timelineQuerySchema, type ActivityItem } from '../../../shared/schemas/parts';
import { memberships, restorations } from '../../db/schema';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser, roleOf } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { timelineService } from './timeline.service';

const list = { params: idParamsSchema, query: timelineQuerySchema };

export function eventsRoutes(deps: AppDeps): Router {
  const service = timelineService(deps);
  const router = Router();
  router.get('/restorations/:id/events', requireUser, validate(list), guard(deps.db, 'restoration.view'), async (_req, res) => {
    const { params, query } = input(res, list);
    res.json(await service.list(params.id, roleOf(res), query.kind));
  });
  // Recent activity across the caller's restorations, for the bench; each set read as the caller's role sees it.
  router.get('/activity', requireUser, async (req, res) => {
    const sets = await deps.db
      .select({ id: restorations.id, make: restorations.make, model: restorations.model, role: memberships.role })
      .from(memberships)
      .innerJoin(restorations, eq(restorations.id, memberships.restorationId))
      .where(eq(memberships.userId, req.user!.id));
    const lists = await Promise.all(
      sets.map(async (s) => (await service.list(s.id, s.role, undefined, 20)).map((e) => ({ ...e, restorationId: s.id, set: `${s.make} ${s.model}` }))),
    );
    const activity: ActivityItem[] = lists.flat().sort((a, b) => b.at.localeCompare(a.at)).slice(0, 20);
    res.json(activity);
  });
  return router;
}
