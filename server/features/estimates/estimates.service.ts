import { and, desc, eq, max } from 'drizzle-orm';
import { mayView, type Role } from '../../../shared/permissions';
import type { Estimate, EstimateInput } from '../../../shared/schemas/estimates';
import { estimateRange } from '../../../shared/money/estimate-range';
import type { AppDeps } from '../../app-deps';
import type { Tx } from '../../db/client';
import { estimateLines, estimates, events } from '../../db/schema';
import { ConflictError, NotFoundError } from '../../http/errors';
import { lockRestoration } from '../restorations/lock-restoration';
import { taxRuleOf, readWorkshopSettings } from '../workshop/workshop-settings';
import { mailEstimate } from './estimate-mail';
import { listEstimates, pricedBounds } from './estimates.repo';

type Deps = Pick<AppDeps, 'db' | 'mailer' | 'config'>;

/** Marks an estimate sent, records the history line and e-mails the owner, all in the caller's transaction. */
async function sendIn(tx: Tx, deps: Deps, e: typeof estimates.$inferSelect, userId: number) {
  await tx.update(estimates).set({ sent: true, sentAt: new Date() }).where(eq(estimates.id, e.id));
  await tx.insert(events).values({
    restorationId: e.restorationId,
    kind: 'estimate-sent',
    actorId: userId,
    data: { estimateId: e.id, version: e.version },
  });
  await mailEstimate(tx, deps.mailer, deps.config.publicOrigin, e);
}

/** Estimates: versions priced at the workshop's settings of the day, sent to the owner, approved or declined. */
export function estimatesService(deps: Deps) {
  const { db } = deps;
  return {
    list: (restorationId: number, role: Role) => listEstimates(db, restorationId, role),

    async restorationOf(estimateId: number) {
      const [row] = await db
        .select({ restorationId: estimates.restorationId })
        .from(estimates)
        .where(eq(estimates.id, estimateId));
      return row?.restorationId;
    },

    /** A new version: the earlier ones stay as they were, for the owner and the workshop to compare. */
    async create(restorationId: number, input: EstimateInput, userId: number, role: Role): Promise<Estimate> {
      const id = await db.transaction(async (tx) => {
        await lockRestoration(tx, restorationId);
        const settings = await readWorkshopSettings(tx);
        const [{ latest } = { latest: 0 }] = await tx
          .select({ latest: max(estimates.version) })
          .from(estimates)
          .where(eq(estimates.restorationId, restorationId));
        const prices = { labourRate: settings.labourRate, partsMarkupBasisPoints: settings.partsMarkupBasisPoints };
        const stored = input.lines.map((l, position) => ({
          position,
          kind: l.kind,
          description: l.description,
          extra: l.kind === 'extra' ? l.extra : null,
          minutesLow: l.kind === 'labour' ? l.low : null,
          minutesHigh: l.kind === 'labour' ? l.high : null,
          amountLow: l.kind === 'labour' ? null : l.low,
          amountHigh: l.kind === 'labour' ? null : l.high,
        }));
        const range = estimateRange(
          stored.map((l) => pricedBounds(l, prices)),
          settings.currency,
          taxRuleOf(settings),
        );
        const [row] = await tx
          .insert(estimates)
          .values({
            restorationId,
            version: (latest ?? 0) + 1,
            note: input.note,
            currency: settings.currency,
            ...prices,
            taxName: settings.taxName,
            taxRateBasisPoints: settings.taxRateBasisPoints,
            taxRounding: settings.taxRounding,
            lowAmount: range.low.amount,
            highAmount: range.high.amount,
            createdById: userId,
          })
          .returning();
        await tx.insert(estimateLines).values(stored.map((l) => ({ ...l, estimateId: row!.id })));
        if (input.send) await sendIn(tx, deps, row!, userId);
        return row!.id;
      });
      return (await listEstimates(db, restorationId, role, id))[0]!;
    },

    /** Sends a draft to the owner. */
    async send(estimateId: number, userId: number, role: Role): Promise<Estimate> {
      const restorationId = await db.transaction(async (tx) => {
        const [e] = await tx.select().from(estimates).where(eq(estimates.id, estimateId)).for('update');
        if (!e) throw new NotFoundError();
        if (e.sent) throw new ConflictError(`Version ${e.version} was already sent.`);
        await sendIn(tx, deps, e, userId);
        return e.restorationId;
      });
      return (await listEstimates(db, restorationId, role, estimateId))[0]!;
    },

    /**
     * The owner's answer, recorded with the name they typed, when, and the version they read. Only the latest
     * sent version can be answered, once.
     */
    async decide(
      estimateId: number,
      input: { decision: 'approved' | 'declined'; name: string; version: number },
      userId: number,
      role: Role,
    ): Promise<Estimate> {
      const restorationId = await db.transaction(async (tx) => {
        const [e] = await tx.select().from(estimates).where(eq(estimates.id, estimateId)).for('update');
        if (!e || !mayView(role, 'estimate', { estimate: e })) throw new NotFoundError();
        if (e.version !== input.version)
          throw new ConflictError(
            `This is version ${e.version} of the estimate, not version ${input.version}: reload the page and read it again.`,
          );
        const [newest] = await tx
          .select({ version: estimates.version })
          .from(estimates)
          .where(and(eq(estimates.restorationId, e.restorationId), eq(estimates.sent, true)))
          .orderBy(desc(estimates.version))
          .limit(1);
        if (newest && newest.version !== e.version)
          throw new ConflictError(
            `Version ${newest.version} of the estimate replaces this one: answer that version instead.`,
          );
        if (e.decision) throw new ConflictError(`You already ${e.decision} version ${e.version} of the estimate.`);
        await tx
          .update(estimates)
          .set({ decision: input.decision, decidedByName: input.name, decidedById: userId, decidedAt: new Date() })
          .where(eq(estimates.id, e.id));
        await tx.insert(events).values({
          restorationId: e.restorationId,
          kind: 'estimate-decided',
          actorId: userId,
          data: { estimateId: e.id, version: e.version, decision: input.decision, name: input.name },
        });
        return e.restorationId;
      });
      return (await listEstimates(db, restorationId, role, estimateId))[0]!;
    },
  };
}
