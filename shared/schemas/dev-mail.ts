import { z } from 'zod';

/** A message held by the local SMTP capture (development and test only). */
export const capturedMailSchema = z.object({
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  date: z.string(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;

/** `GET /api/dev/mail?limit=`: the newest messages first, 100 unless asked. */
export const devMailQuerySchema = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) });
