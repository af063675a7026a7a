import { z } from 'zod';

export const healthSchema = z.object({
  /** Ready to serve: the database and storage answer (mail may be down; see `mail`). */
  ok: z.boolean(),
  database: z.boolean(),
  storage: z.boolean(),
  mail: z.boolean(),
});
export type Health = z.infer<typeof healthSchema>;
