import { eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { estimates, events, payments } from '../../db/schema';
import { demoPeople } from '../../db/seed/demo-scenario';
import { estimatesService } from '../estimates/estimates.service';
import { issueInvoice } from '../invoices/issue-invoice';
import { settleInvoice } from '../payments/payments.repo';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { demoSet, demoUserId, MERIDIAN_54 } from './demo-lookup';

/** A modest fixed deposit, in minor units of the workshop's currency: the final invoice still has plenty left to pay. */
const DEPOSIT = 2500;

/**
 * The Meridian 54's money, so its Money tab is not empty in the demo: an estimate Imogen approved and a deposit she
 * paid by bank transfer (recorded by Mara, as a transfer is; no card payment is invented). Nothing is mailed.
 * Runs once: a set that already has an estimate is left alone.
 */
export async function seedDemoMoney(db: Database): Promise<void> {
  const techId = await demoUserId(db, 'technician');
  const ownerId = await demoUserId(db, 'owner');
  const set = await demoSet(db, MERIDIAN_54);
  if (!techId || !ownerId || !set) return;
  const [existing] = await db
    .select({ id: estimates.id })
    .from(estimates)
    .where(eq(estimates.restorationId, set.id))
    .limit(1);
  if (existing) return;

  // A draft touches neither the mailer nor the public origin; sending and the answer are recorded below.
  const drafts = estimatesService({ db } as Parameters<typeof estimatesService>[0]);
  const estimate = await drafts.create(
    set.id,
    {
      note: 'Quoted before opening the chassis; revised once the power supply has been checked.',
      send: false,
      lines: [
        {
          kind: 'labour',
          description: 'Safety checks, recapping the audio and power stages, alignment',
          low: 240,
          high: 420,
        },
        { kind: 'part', description: 'Capacitors, resistors and mains-rated parts', low: 1800, high: 3200 },
        {
          kind: 'extra',
          extra: 'cabinet',
          description: 'Re-gluing the lifting veneer at the back left corner',
          low: 1500,
          high: 3000,
        },
      ],
    },
    techId,
    'technician',
  );

  await db.transaction(async (tx) => {
    const sentAt = new Date();
    await tx
      .update(estimates)
      .set({
        sent: true,
        sentAt,
        decision: 'approved',
        decidedByName: demoPeople.owner.name,
        decidedById: ownerId,
        decidedAt: sentAt,
      })
      .where(eq(estimates.id, estimate.id));
    await tx.insert(events).values([
      {
        restorationId: set.id,
        kind: 'estimate-sent',
        actorId: techId,
        data: { estimateId: estimate.id, version: estimate.version },
      },
      {
        restorationId: set.id,
        kind: 'estimate-decided',
        actorId: ownerId,
        data: { estimateId: estimate.id, version: estimate.version, decision: 'approved', name: demoPeople.owner.name },
      },
    ]);
    const settings = await readWorkshopSettings(tx);
    const deposit = await issueInvoice(tx, {
      restorationId: set.id,
      kind: 'deposit',
      userId: techId,
      prices: { ...settings, taxRateBasisPoints: null },
      lines: [{ description: 'Deposit', priced: { kind: 'fixed', quantity: 1, unitAmount: DEPOSIT } }],
    });
    const [paid] = await tx
      .insert(payments)
      .values({
        invoiceId: deposit.id,
        restorationId: set.id,
        kind: 'payment',
        method: 'transfer',
        status: 'succeeded',
        amount: deposit.due,
        currency: deposit.currency,
        receivedOn: sentAt.toISOString().slice(0, 10),
        recordedById: techId,
        settledAt: sentAt,
      })
      .returning();
    await settleInvoice(tx, deposit.id);
    // The history line only: a demo that starts with unread notifications would greet people with old news.
    await tx.insert(events).values({
      restorationId: set.id,
      kind: 'payment-received',
      actorId: techId,
      data: {
        invoiceId: deposit.id,
        number: deposit.number,
        kind: deposit.kind,
        method: 'transfer',
        paymentId: paid!.id,
      },
    });
  });
}
