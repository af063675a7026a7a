import { z } from 'zod';

/** What the client needs to know about this deployment. */
export const metaSchema = z.object({
  demo: z.boolean(),
  devMail: z.boolean(),
  demoAccounts: z.array(z.object({ role: z.string(), name: z.string(), email: z.string(), password: z.string() })),
  /** The workshop's currency (ISO 4217): every screen shows amounts in it. */
  currency: z.string(),
});
export type Meta = z.infer<typeof metaSchema>;
