import type { Role } from '../../../shared/permissions';
import type { Notification } from '../../../shared/schemas/findings';
import type { AppDeps } from '../../app-deps';
import { requestNotificationMail } from './mail-batch';
import { notificationsRepo, type NewNotification } from './notifications.repo';

type FindingLike = { id: number; restorationId: number; number: number; title: string; componentRef: string; authorId: number | null };
type CommentLike = { id: number; body: string; internal: boolean };

const label = (f: FindingLike) => `#${f.number}${f.componentRef ? ` ${f.componentRef}` : ''} “${f.title}”`;
const excerpt = (text: string) => (text.length > 160 ? `${text.slice(0, 157)}…` : text).replace(/\s+/g, ' ');

/** In-app notifications; e-mail goes out in batches from the same rows (see mail-batch.ts). */
export function notificationsService(deps: AppDeps) {
  const repo = notificationsRepo(deps.db);
  // Sends what is due now (the first item for a person goes at once); failures wait for the next tick.
  const kick = () => requestNotificationMail(deps, (err) => deps.logger.warn(`notification mail: ${err.message}`));

  return {
    async questionAsked(f: FindingLike, actor: { id: number; name: string }) {
      const mentors = await repo.membersWithRole(f.restorationId, ['mentor']);
      await repo.insert(
        mentors.filter((m) => m.userId !== actor.id).map((m): NewNotification => ({
          userId: m.userId, restorationId: f.restorationId, findingId: f.id, kind: 'question',
          summary: `${actor.name} asks the mentors about ${label(f)}`,
        })),
      );
      kick();
    },
    /**
     * A comment notifies the people it @mentions and the others already in the thread. Owners are left out
     * of anything internal, so no internal text reaches them by any route.
     */
    async commentWritten(f: FindingLike, c: CommentLike, actor: { id: number; name: string }, mentioned: number[], participants: number[]) {
      const members = await repo.membersWithRole(f.restorationId, ['technician', 'mentor', 'owner']);
      const roleOf = new Map<number, Role>(members.map((m) => [m.userId, m.role]));
      const mayRead = (userId: number) => roleOf.has(userId) && (!c.internal || roleOf.get(userId) !== 'owner');
      const rows = new Map<number, NewNotification>();
      for (const userId of [...participants, ...(f.authorId ? [f.authorId] : [])])
        if (userId !== actor.id && mayRead(userId))
          rows.set(userId, { userId, restorationId: f.restorationId, findingId: f.id, commentId: c.id, kind: 'reply',
            summary: `${actor.name} replied on ${label(f)}: ${excerpt(c.body)}` });
      for (const userId of mentioned)
        if (userId !== actor.id && mayRead(userId))
          rows.set(userId, { userId, restorationId: f.restorationId, findingId: f.id, commentId: c.id, kind: 'mention',
            summary: `${actor.name} mentioned you on ${label(f)}: ${excerpt(c.body)}` });
      await repo.insert([...rows.values()]);
      kick();
    },
    async listFor(userId: number, limit?: number, beforeId?: number): Promise<Notification[]> {
      return (await repo.listFor(userId, limit, beforeId)).map(({ n, photoId }) => ({
        id: n.id, kind: n.kind, summary: n.summary, restorationId: n.restorationId, findingId: n.findingId, photoId,
        read: n.readAt !== null, createdAt: n.createdAt.toISOString(),
      }));
    },
    markRead: (userId: number, ids?: number[]) => repo.markRead(userId, ids),
  };
}
