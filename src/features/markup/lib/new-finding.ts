import { z } from 'zod';
import { componentRefSchema, kinds, severities } from '../../../../shared/schemas/findings';

/** The words a new mark needs before it becomes a finding; the same rules as the finding contract. */
export const newFindingSchema = z.object({
  title: z.string().trim().min(1, 'Give the finding a short title').max(140, 'Keep the title under 140 characters'),
  componentRef: componentRefSchema,
  kind: z.enum(kinds),
  severity: z.enum(severities),
});
export type NewFindingValues = z.infer<typeof newFindingSchema>;

export const newFindingDefaults: NewFindingValues = { title: '', componentRef: '', kind: 'note', severity: 'info' };
