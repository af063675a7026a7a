import { and, eq, max } from 'drizzle-orm';
import {
  prePowerMissing,
  supplyLabels,
  type BringupStepValues,
  type IntakeCheck,
  type PrePowerCheck,
} from '../../../shared/schemas/bringup';
import type { Role } from '../../../shared/permissions';
import type { Database } from '../../db/client';
import {
  bringupStepReadings,
  bringupSteps,
  events,
  findings,
  intakeChecks,
  measurements,
  photos,
  prePowerChecks,
  prePowerSignoffs,
} from '../../db/schema';
import { BadRequestError, ConflictError } from '../../http/errors';
import { judge } from '../measurements/measurements.service';
import { lockRestoration } from '../restorations/lock-restoration';
import { readBringup } from './bringup.repo';
import { assertPrePowerSignedOff, type Db } from './power-gate';

async function assertOwn(tx: Db, restorationId: number, findingId: number | null, photoId: number | null = null) {
  if (findingId) {
    const [f] = await tx
      .select({ id: findings.id })
      .from(findings)
      .where(and(eq(findings.id, findingId), eq(findings.restorationId, restorationId)));
    if (!f) throw new BadRequestError('findingId: no such finding on this restoration.');
  }
  if (photoId) {
    const [p] = await tx
      .select({ id: photos.id })
      .from(photos)
      .where(and(eq(photos.id, photoId), eq(photos.restorationId, restorationId)));
    if (!p) throw new BadRequestError('photoId: no such photo on this restoration.');
  }
}

/** Volts and watts as a person writes them on a bench note: "60 W", "230 V". */
const unit = (value: number | null, symbol: string) => (value === null ? '' : `${value} ${symbol}`);

/** Every write is one transaction with its history event. The route guard has checked membership and role. */
export function bringupService(db: Database) {
  return {
    get: (restorationId: number, role: Role) => readBringup(db, restorationId, role),

    async setIntake(restorationId: number, input: IntakeCheck, userId: number, role: Role) {
      await db.transaction(async (tx) => {
        await lockRestoration(tx, restorationId);
        await assertOwn(tx, restorationId, input.findingId, input.photoId);
        const [before] = await tx
          .select()
          .from(intakeChecks)
          .where(and(eq(intakeChecks.restorationId, restorationId), eq(intakeChecks.item, input.item)));
        const values = {
          done: input.done,
          note: input.note,
          findingId: input.findingId,
          photoId: input.photoId,
          checkedById: userId,
        };
        await tx
          .insert(intakeChecks)
          .values({ restorationId, item: input.item, ...values })
          .onConflictDoUpdate({ target: [intakeChecks.restorationId, intakeChecks.item], set: values });
        if ((before?.done ?? false) !== input.done)
          await tx.insert(events).values({
            restorationId,
            kind: 'intake-checked',
            actorId: userId,
            data: { item: input.item, done: input.done },
          });
      });
      return readBringup(db, restorationId, role);
    },

    /** Changing an item after the sign-off withdraws the sign-off: the checklist must be signed again. */
    async setPrePower(restorationId: number, input: PrePowerCheck, userId: number, role: Role) {
      await db.transaction(async (tx) => {
        await lockRestoration(tx, restorationId);
        const [before] = await tx
          .select()
          .from(prePowerChecks)
          .where(and(eq(prePowerChecks.restorationId, restorationId), eq(prePowerChecks.item, input.item)));
        const reason = input.status === 'done' || input.status === null ? '' : input.reason;
        if (before && before.status === input.status && before.reason === reason) return;
        if (!before && input.status === null) return;
        const values = { status: input.status, reason, checkedById: userId };
        await tx
          .insert(prePowerChecks)
          .values({ restorationId, item: input.item, ...values })
          .onConflictDoUpdate({ target: [prePowerChecks.restorationId, prePowerChecks.item], set: values });
        await tx.insert(events).values({
          restorationId,
          kind: 'pre-power-set',
          actorId: userId,
          data: { item: input.item, status: input.status, reason },
        });
        const voided = await tx
          .delete(prePowerSignoffs)
          .where(eq(prePowerSignoffs.restorationId, restorationId))
          .returning({ id: prePowerSignoffs.id });
        if (voided.length)
          await tx
            .insert(events)
            .values({ restorationId, kind: 'pre-power-voided', actorId: userId, data: { item: input.item } });
      });
      return readBringup(db, restorationId, role);
    },

    async signOff(restorationId: number, userId: number, role: Role) {
      await db.transaction(async (tx) => {
        await lockRestoration(tx, restorationId);
        const [already] = await tx
          .select({ id: prePowerSignoffs.id })
          .from(prePowerSignoffs)
          .where(eq(prePowerSignoffs.restorationId, restorationId));
        if (already) return;
        const items = await tx.select().from(prePowerChecks).where(eq(prePowerChecks.restorationId, restorationId));
        const missing = prePowerMissing(items);
        if (missing.length)
          throw new ConflictError(`The pre-power checklist is not complete: ${missing.join('; ')}.`, {
            gate: 'pre-power',
            missing,
          });
        await tx.insert(prePowerSignoffs).values({ restorationId, signedById: userId });
        const waived = items.filter((i) => i.status === 'waived').map((i) => ({ item: i.item, reason: i.reason }));
        await tx.insert(events).values({ restorationId, kind: 'pre-power-signed', actorId: userId, data: { waived } });
      });
      return readBringup(db, restorationId, role);
    },

    /** One staged power-up step; its readings become ordinary powered readings with verdicts. */
    async addStep(restorationId: number, input: BringupStepValues, userId: number, role: Role) {
      const usesLamp = input.supply === 'series-lamp' || input.supply === 'lamp-and-variable-transformer';
      if (usesLamp && (input.lampWatts === null || input.lampVolts === null))
        throw new BadRequestError('lampWatts: give the series lamp\u2019s rating in watts and volts.');
      if (!usesLamp && input.lampBehaviour !== 'no-lamp')
        throw new BadRequestError('lampBehaviour: no series lamp is in circuit at this step.');
      await db.transaction(async (tx) => {
        await lockRestoration(tx, restorationId);
        await assertPrePowerSignedOff(tx, restorationId, 'logging a power-up step');
        await assertOwn(tx, restorationId, input.findingId);
        const [last] = await tx
          .select({ n: max(bringupSteps.number) })
          .from(bringupSteps)
          .where(eq(bringupSteps.restorationId, restorationId));
        const number = (last?.n ?? 0) + 1;
        const { readings, ...fields } = input;
        const [step] = await tx
          .insert(bringupSteps)
          .values({ restorationId, number, ...fields, takenById: userId })
          .returning({ id: bringupSteps.id });
        const conditions = [
          `Power-up step ${number}: ${supplyLabels[input.supply].toLowerCase()}`,
          usesLamp && `${unit(input.lampWatts, 'W')} lamp`,
          input.appliedVolts !== null && `${unit(input.appliedVolts, 'V')} applied`,
        ]
          .filter(Boolean)
          .join(', ');
        for (const r of readings) {
          const verdict = judge({ ...r, rating: '' });
          const [m] = await tx
            .insert(measurements)
            .values({
              restorationId,
              location: r.location,
              quantity: r.quantity,
              expectedText: r.expected,
              toleranceText: r.tolerance,
              readingText: r.reading,
              conditions,
              method: '',
              findingId: input.findingId,
              powerOn: true,
              measuredById: userId,
              ...verdict,
            })
            .returning({ id: measurements.id });
          await tx.insert(bringupStepReadings).values({ stepId: step!.id, measurementId: m!.id });
          if (verdict.verdict === 'out')
            await tx.insert(events).values({
              restorationId,
              kind: 'measurement-out',
              actorId: userId,
              measurementId: m!.id,
              findingId: input.findingId,
            });
        }
        await tx.insert(events).values({
          restorationId,
          kind: 'bringup-step',
          actorId: userId,
          data: {
            number,
            supply: input.supply,
            lampWatts: input.lampWatts,
            lampBehaviour: input.lampBehaviour,
            decision: input.decision,
          },
        });
      });
      return readBringup(db, restorationId, role);
    },
  };
}
