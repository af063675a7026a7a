import { z } from 'zod';
import { componentRefSchema, type Finding, type FindingPatch, type Status } from '../../../../shared/schemas/findings';

/** The statuses in the order the work moves through them; dismissed stands apart and needs a reason. */
export const workflow: readonly Status[] = ['observed', 'suspected', 'confirmed', 'repaired', 'verified'];

export type Checked = { ok: true; value: string } | { ok: false; message: string };

function check(schema: z.ZodType<string>, raw: string): Checked {
  const parsed = schema.safeParse(raw);
  return parsed.success
    ? { ok: true, value: parsed.data }
    : { ok: false, message: parsed.error.issues[0]?.message ?? 'Not valid' };
}

const titleSchema = z
  .string()
  .trim()
  .min(1, 'Give the finding a short title')
  .max(140, 'Keep the title under 140 characters');
const reasonSchema = z
  .string()
  .trim()
  .min(1, 'Say why the finding is dismissed')
  .max(500, 'Keep the reason under 500 characters');

export const checkTitle = (raw: string) => check(titleSchema, raw);
export const checkComponentRef = (raw: string) => check(componentRefSchema, raw);
export const checkDismissReason = (raw: string) => check(reasonSchema, raw);

/** Work on a confirmed or repaired fault, or near a hazard, means hands inside the chassis: time for the caution. */
export const needsCaution = (f: Pick<Finding, 'status' | 'severity'>) =>
  f.status === 'confirmed' || f.status === 'repaired' || f.severity === 'hazard';

/** The finding with a change still on its way to the server laid over it. */
export const withPatch = (f: Finding, patch: FindingPatch | undefined): Finding =>
  patch ? ({ ...f, ...patch } as Finding) : f;
