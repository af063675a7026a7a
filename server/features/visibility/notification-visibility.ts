import { and, eq, type SQL } from 'drizzle-orm';
import { comments, findings, memberships, notifications, photos } from '../../db/schema';
import { columnsOf, findingFields, visibleSqlByRole } from './visibility-sql';

/**
 * The joins and condition that keep a notification from a person who may no longer see what it points at
 * (judged when it is listed or mailed, not when it was written): add `notificationJoins` to a query on
 * `notifications` and filter it with `notificationVisible`.
 */
export const notificationJoins = {
  finding: eq(findings.id, notifications.findingId),
  photo: eq(photos.id, findings.photoId),
  comment: eq(comments.id, notifications.commentId),
  membership: and(
    eq(memberships.restorationId, notifications.restorationId),
    eq(memberships.userId, notifications.userId),
  ),
};

export const notificationVisible: SQL = visibleSqlByRole(memberships.role, 'notification', {
  notification: columnsOf(notifications),
  finding: findingFields(),
  photo: columnsOf(photos),
  comment: columnsOf(comments),
});
