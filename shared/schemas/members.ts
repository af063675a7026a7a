import { z } from 'zod';
import { roles } from '../permissions';
import { idSchema } from './ids';

export const roleSchema = z.enum(roles);

export const invitationInputSchema = z.object({
  email: z.string().trim().max(254).pipe(z.email('Enter an e-mail address such as name@example.org')),
  role: roleSchema,
});
export type InvitationInput = z.input<typeof invitationInputSchema>;

export const memberSchema = z.object({
  userId: z.number().int(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  since: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const invitationSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** Answer of POST /api/restorations/:id/invitations: the invitation just sent. */
export const invitationSentSchema = invitationSchema.pick({ id: true, email: true, role: true, expiresAt: true });

/** What the invitation link shows before it is accepted. */
export const invitationPreviewSchema = z.object({
  restoration: z.object({ id: z.number().int(), make: z.string(), model: z.string() }),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string().nullable(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** Answer of POST /api/invitations/:token/accept: the restoration joined and the role taken there. */
export const invitationAcceptedSchema = z.object({ restorationId: z.number().int(), role: roleSchema });

export const memberParamsSchema = z.object({
  id: idSchema,
  userId: idSchema,
});
/** `/api/restorations/:id/invitations/:invitationId`. */
export const invitationParamsSchema = z.object({ id: idSchema, invitationId: idSchema });
export const memberPatchSchema = z.object({ role: roleSchema });
export const tokenParamsSchema = z.object({ token: z.string().min(20).max(200) });
