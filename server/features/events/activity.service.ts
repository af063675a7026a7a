import type { ActivityItem } from '../../../shared/schemas/events';
import type { AppDeps } from '../../app-deps';
import { eventsRepo } from './events.repo';
import { timelineService } from './timeline.service';

/** Recent activity on the bench: the newest events the person may see across their sets. */
const ACTIVITY_WINDOW = 20;

/**
 * Recent activity across a person's restorations in one query: the events, each judged by the person's role on
 * its set through the visibility rule, with the set's name joined in.
 */
export function activityService(deps: Pick<AppDeps, 'db' | 'storage'>) {
  const timeline = timelineService(deps);
  const repo = eventsRepo(deps.db);
  return {
    async recentFor(userId: number): Promise<ActivityItem[]> {
      const rows = await timeline.rows(repo.onSetsOf(userId), { userId }, ACTIVITY_WINDOW);
      const items = await timeline.present(rows);
      return items.map((e, i) => {
        const { e: event, setMake, setModel } = rows[i]!;
        return { ...e, restorationId: event.restorationId, set: `${setMake} ${setModel}` };
      });
    },
  };
}
