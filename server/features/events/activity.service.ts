import { inArray } from 'drizzle-orm';
import type { ActivityItem } from '../../../shared/schemas/events';
import type { AppDeps } from '../../app-deps';
import { events } from '../../db/schema';
import { eventsRepo } from './events.repo';
import { timelineService } from './timeline.service';

/** Recent activity on the bench: the newest events the person may see across their sets. */
const ACTIVITY_WINDOW = 20;

/** Recent activity across a person's restorations, in one query; each event read as their role there sees it. */
export function activityService(deps: Pick<AppDeps, 'db' | 'storage'>) {
  const timeline = timelineService(deps);
  const repo = eventsRepo(deps.db);
  return {
    async recentFor(userId: number): Promise<ActivityItem[]> {
      const rows = await timeline.rows(
        inArray(events.restorationId, repo.restorationIdsOf(userId)),
        { userId },
        ACTIVITY_WINDOW,
      );
      const sets = new Map((await repo.setsOf(userId)).map((s) => [s.id, s]));
      const withSet = rows.filter((r) => sets.has(r.e.restorationId));
      const items = await timeline.present(withSet);
      const byId = new Map(withSet.map((r) => [r.e.id, sets.get(r.e.restorationId)!]));
      return items.map((e) => {
        const s = byId.get(e.id)!;
        return { ...e, restorationId: s.id, set: `${s.make} ${s.model}` };
      });
    },
  };
}
