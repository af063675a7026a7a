import { z } from 'zod';
import { findingPath } from './findings';
import { bodyIdSchema } from './ids';

/** Why a person is told of something (also the `notification_kind` database enum). */
export const notificationKinds = [
  'mention',
  'question',
  'reply',
  'help-request',
  'reading-requested',
  'reading-answered',
  'payment',
] as const;

export const notificationSchema = z.object({
  id: z.number().int(),
  kind: z.enum(notificationKinds),
  summary: z.string(),
  restorationId: z.number().int(),
  /** What it is about: a finding on a photo; else (both null) the restoration's help requests, or its Money tab for a payment. */
  findingId: z.number().int().nullable(),
  photoId: z.number().int().nullable(),
  helpRequestId: z.number().int().nullable(),
  readingRequestId: z.number().int().nullable(),
  read: z.boolean(),
  createdAt: z.string(),
});
export type Notification = z.infer<typeof notificationSchema>;

/** `POST /api/notifications/read`: the items to mark read; none named marks them all. */
export const notificationsReadSchema = z.object({ ids: z.array(bodyIdSchema).max(500).optional() });

/** Where a notification leads: its finding, the Money tab for a payment, or the Help tab for help requests and requests for readings. */
export const notificationPath = (n: {
  restorationId: number;
  kind?: string;
  findingId: number | null;
  photoId: number | null;
}) =>
  n.findingId !== null && n.photoId !== null
    ? findingPath({ restorationId: n.restorationId, photoId: n.photoId, id: n.findingId })
    : n.kind === 'payment'
      ? `/restorations/${n.restorationId}/money`
      : `/restorations/${n.restorationId}/help`;
