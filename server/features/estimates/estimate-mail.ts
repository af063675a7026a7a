import { and, eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { memberships, restorations, users } from '../../db/schema';
import { ConflictError } from '../../http/errors';
import { sendOrRollBack, type Mailer } from '../../mail';
import { documentDate, documentMoney } from '../workshop/document-format';
import { readWorkshopSettings } from '../workshop/workshop-settings';

/**
 * Sends a new estimate to every owner of the set, as the last step of the transaction that sends it: if the
 * mail server refuses, the estimate stays a draft and the technician is told.
 */
export async function mailEstimate(
  tx: Executor,
  mailer: Mailer,
  origin: string,
  e: { restorationId: number; version: number; currency: string; lowAmount: number; highAmount: number },
) {
  const owners = await tx
    .select({ email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.restorationId, e.restorationId), eq(memberships.role, 'owner')));
  if (!owners.length)
    throw new ConflictError(
      'No owner is on this restoration yet: invite them from the People tab before sending an estimate.',
    );
  const [set] = await tx
    .select({ make: restorations.make, model: restorations.model })
    .from(restorations)
    .where(eq(restorations.id, e.restorationId));
  const { timeZone } = await readWorkshopSettings(tx);
  const range =
    e.lowAmount === e.highAmount
      ? documentMoney(e.lowAmount, e.currency)
      : `${documentMoney(e.lowAmount, e.currency)} – ${documentMoney(e.highAmount, e.currency)}`;
  const sentOn = documentDate(new Date(), timeZone);
  for (const o of owners)
    await sendOrRollBack(mailer, {
      to: o.email,
      subject: `Your ${set!.make} ${set!.model}: estimate ${e.version === 1 ? '' : `version ${e.version} `}for approval`,
      text: `Hello ${o.name},\n\nThe workshop has ${e.version === 1 ? 'sent an estimate' : `revised its estimate (version ${e.version})`} for your ${set!.make} ${set!.model} on ${sentOn}: ${range} (${e.currency}), tax included.\nRead the lines and approve or decline it at ${origin}/restorations/${e.restorationId}.\n\n— Gridleak, the restoration notebook`,
    });
}
