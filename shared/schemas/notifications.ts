import { z } from 'zod';
import { bodyIdSchema } from './ids';

/** Why a person is told of something (also the `notification_kind` database enum). */
export const notificationKinds = ['mention', 'question', 'reply'] as const;

export const notificationSchema = z.object({
  id: z.number().int(),
  kind: z.enum(notificationKinds),
  summary: z.string(),
  restorationId: z.number().int(),
  findingId: z.number().int(),
  photoId: z.number().int(),
  read: z.boolean(),
  createdAt: z.string(),
});
export type Notification = z.infer<typeof notificationSchema>;

/** `POST /api/notifications/read`: the items to mark read; none named marks them all. */
export const notificationsReadSchema = z.object({ ids: z.array(bodyIdSchema).max(500).optional() });
