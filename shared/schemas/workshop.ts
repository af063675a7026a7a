import { z } from 'zod';

/** One of the workshop's administrators, who change its settings (decision 46). */
export const workshopAdminSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  /** Shown to administrators only. */
  email: z.string().nullable(),
});

/** `GET /api/workshop/admins`: who they are, and whether the reader is one of them. */
export const workshopAdminsSchema = z.object({
  admins: z.array(workshopAdminSchema),
  youAreAdmin: z.boolean(),
});
export type WorkshopAdmins = z.infer<typeof workshopAdminsSchema>;

/** `POST /api/workshop/admins`: an account, by its e-mail address, to make an administrator. */
export const addWorkshopAdminSchema = z.object({
  email: z.string().trim().max(254).pipe(z.email('Enter an e-mail address such as name@example.org')),
});
