import { mayView, type Role } from '../../../shared/permissions';
import type { Notification } from '../../../shared/schemas/notifications';
import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { requestNotificationMail } from './mail-batch';
import { notificationsRepo, type NewNotification } from './notifications.repo';

type FindingLike = {
  id: number;
  restorationId: number;
  number: number;
  title: string;
  componentRef: string;
  authorId: number | null;
  ownerVisible: boolean;
  photoOwnerVisible: boolean;
};
type CommentLike = { id: number; body: string; internal: boolean };

const label = (f: FindingLike) => `#${f.number}${f.componentRef ? ` ${f.componentRef}` : ''} “${f.title}”`;
const excerpt = (text: string) => (text.length > 160 ? `${text.slice(0, 157)}…` : text).replace(/\s+/g, ' ');

/**
 * In-app notifications; e-mail goes out in batches from the same rows (see mail-batch.ts). The writers take
 * the transaction of the action they report, so a notification exists only if its action was saved; call
 * `kick` after the commit to mail what is due.
 */
export function notificationsService(deps: AppDeps) {
  const repo = notificationsRepo(deps.db);

  return {
    /** Sends what is due now (the first item for a person goes at once); failures wait for the next tick. */
    // One flush at a time per app, and one more if asked meanwhile; errors are logged redacted (no query parameters).
    kick: () => requestNotificationMail(deps, (err) => deps.logger.warn({ err }, 'notification mail failed')),
    async questionAsked(tx: Executor, f: FindingLike, actor: { id: number; name: string }) {
      const mentors = await notificationsRepo(tx).membersWithRole(f.restorationId, ['mentor']);
      await notificationsRepo(tx).insert(
        mentors
          .filter((m) => m.userId !== actor.id)
          .map((m): NewNotification => ({
            userId: m.userId,
            restorationId: f.restorationId,
            findingId: f.id,
            kind: 'question',
            summary: `${actor.name} asks the mentors about ${label(f)}`,
          })),
      );
    },
    /**
     * A comment notifies the people it @mentions and the others already in the thread, each only if the rule
     * lets them see it; listing and mailing judge it again, so a finding unshared later stops it there too.
     */
    async commentWritten(
      tx: Executor,
      f: FindingLike,
      c: CommentLike,
      actor: { id: number; name: string },
      mentioned: number[],
      participants: number[],
    ) {
      const members = await notificationsRepo(tx).membersWithRole(f.restorationId, ['technician', 'mentor', 'owner']);
      const roleOf = new Map<number, Role>(members.map((m) => [m.userId, m.role]));
      const facts = (kind: 'reply' | 'mention') => ({
        notification: { commentId: c.id, kind },
        comment: c,
        finding: f,
        photo: { ownerVisible: f.photoOwnerVisible },
      });
      const mayRead = (userId: number, kind: 'reply' | 'mention') =>
        mayView(roleOf.get(userId), 'notification', facts(kind));
      const rows = new Map<number, NewNotification>();
      for (const userId of [...participants, ...(f.authorId ? [f.authorId] : [])])
        if (userId !== actor.id && mayRead(userId, 'reply'))
          rows.set(userId, {
            userId,
            restorationId: f.restorationId,
            findingId: f.id,
            commentId: c.id,
            kind: 'reply',
            summary: `${actor.name} replied on ${label(f)}: ${excerpt(c.body)}`,
          });
      for (const userId of mentioned)
        if (userId !== actor.id && mayRead(userId, 'mention'))
          rows.set(userId, {
            userId,
            restorationId: f.restorationId,
            findingId: f.id,
            commentId: c.id,
            kind: 'mention',
            summary: `${actor.name} mentioned you on ${label(f)}: ${excerpt(c.body)}`,
          });
      await notificationsRepo(tx).insert([...rows.values()]);
    },
    /** A help request waits on each mentor's bench as a question; owners are never told of it. */
    async helpRequested(
      tx: Executor,
      h: { id: number; restorationId: number; symptom: string; set: string },
      actor: { id: number; name: string },
    ) {
      const mentors = await notificationsRepo(tx).membersWithRole(h.restorationId, ['mentor']);
      await notificationsRepo(tx).insert(
        mentors
          .filter((m) => m.userId !== actor.id)
          .map((m): NewNotification => ({
            userId: m.userId,
            restorationId: h.restorationId,
            helpRequestId: h.id,
            kind: 'help-request',
            summary: `${actor.name} asks for help with the ${h.set}: ${excerpt(h.symptom)}`,
          })),
      );
    },
    /** A request for a reading is a task for every technician of the set (but the one who asked). */
    async readingRequested(
      tx: Executor,
      r: { id: number; restorationId: number; body: string; helpRequestId: number | null; set: string },
      actor: { id: number; name: string },
    ) {
      const technicians = await notificationsRepo(tx).membersWithRole(r.restorationId, ['technician']);
      await notificationsRepo(tx).insert(
        technicians
          .filter((m) => m.userId !== actor.id)
          .map((m): NewNotification => ({
            userId: m.userId,
            restorationId: r.restorationId,
            readingRequestId: r.id,
            helpRequestId: r.helpRequestId,
            kind: 'reading-requested',
            summary: `${actor.name} asks, on the ${r.set}: ${excerpt(r.body)}`,
          })),
      );
    },
    /** The asker hears that their request was answered (if they are still on the restoration: the list and mail judge it). */
    async readingAnswered(
      tx: Executor,
      r: {
        id: number;
        restorationId: number;
        body: string;
        helpRequestId: number | null;
        askedById: number | null;
        set: string;
      },
      answer: string,
      actor: { id: number; name: string },
    ) {
      if (!r.askedById || r.askedById === actor.id) return;
      await notificationsRepo(tx).insert([
        {
          userId: r.askedById,
          restorationId: r.restorationId,
          readingRequestId: r.id,
          helpRequestId: r.helpRequestId,
          kind: 'reading-answered',
          summary: `${actor.name} answered “${excerpt(r.body)}” on the ${r.set}: ${excerpt(answer)}`,
        },
      ]);
    },
    async listFor(userId: number, limit?: number, beforeId?: number): Promise<Notification[]> {
      return (await repo.listFor(userId, limit, beforeId)).map(({ n, photoId }) => ({
        id: n.id,
        kind: n.kind,
        summary: n.summary,
        restorationId: n.restorationId,
        findingId: n.findingId,
        photoId,
        helpRequestId: n.helpRequestId,
        readingRequestId: n.readingRequestId,
        read: n.readAt !== null,
        createdAt: n.createdAt.toISOString(),
      }));
    },
    markRead: (userId: number, ids?: number[]) => repo.markRead(userId, ids),
  };
}
