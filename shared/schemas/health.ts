import { z } from 'zod';

export const healthSchema = z.object({
  ok: z.boolean(),
  database: z.boolean(),
  storage: z.boolean(),
  mail: z.boolean(),
});
export type Health = z.infer<typeof healthSchema>;
