import { asc, eq, inArray } from 'drizzle-orm';
import { intakeItems, prePowerItems, prePowerMissing, type Bringup } from '../../../shared/schemas/bringup';
import { can, type Role } from '../../../shared/permissions';
import {
  bringupStepReadings,
  bringupSteps,
  findings,
  intakeChecks,
  measurements,
  photos,
  prePowerChecks,
  prePowerSignoffs,
  users,
} from '../../db/schema';
import type { Db } from './power-gate';

type StepQuantity = Bringup['steps'][number]['readings'][number]['quantity'];

/** Reads a restoration's bring-up record; owners get it without bench notes, unshared readings or links. */
export async function readBringup(db: Db, restorationId: number, role: Role): Promise<Bringup> {
  const notes = can(role, 'workshop.notes');
  const intakeRows = await db
    .select({ c: intakeChecks, by: users.name, findingShared: findings.ownerVisible, photoShared: photos.ownerVisible })
    .from(intakeChecks)
    .leftJoin(users, eq(users.id, intakeChecks.checkedById))
    .leftJoin(findings, eq(findings.id, intakeChecks.findingId))
    .leftJoin(photos, eq(photos.id, intakeChecks.photoId))
    .where(eq(intakeChecks.restorationId, restorationId));
  const intake = intakeItems.map((item) => {
    const r = intakeRows.find((x) => x.c.item === item);
    return {
      item,
      done: r?.c.done ?? false,
      note: notes ? (r?.c.note ?? '') : '',
      findingId: r && can(role, 'findings.view', { ownerVisible: r.findingShared ?? false }) ? r.c.findingId : null,
      photoId: r && can(role, 'photos.view', { ownerVisible: r.photoShared ?? false }) ? r.c.photoId : null,
      checkedBy: r ? r.by : null,
      checkedAt: r ? r.c.updatedAt.toISOString() : null,
    };
  });

  const checkRows = await db
    .select({ c: prePowerChecks, by: users.name })
    .from(prePowerChecks)
    .leftJoin(users, eq(users.id, prePowerChecks.checkedById))
    .where(eq(prePowerChecks.restorationId, restorationId));
  const items = prePowerItems.map((item) => {
    const r = checkRows.find((x) => x.c.item === item);
    return { item, status: r?.c.status ?? null, reason: r?.c.reason ?? '', checkedBy: r?.by ?? null };
  });
  const [signoff] = await db
    .select({ s: prePowerSignoffs, by: users.name })
    .from(prePowerSignoffs)
    .leftJoin(users, eq(users.id, prePowerSignoffs.signedById))
    .where(eq(prePowerSignoffs.restorationId, restorationId));

  const stepRows = await db
    .select({ s: bringupSteps, by: users.name })
    .from(bringupSteps)
    .leftJoin(users, eq(users.id, bringupSteps.takenById))
    .where(eq(bringupSteps.restorationId, restorationId))
    .orderBy(asc(bringupSteps.number));
  const readingRows = stepRows.length
    ? await db
        .select({ stepId: bringupStepReadings.stepId, m: measurements })
        .from(bringupStepReadings)
        .innerJoin(measurements, eq(measurements.id, bringupStepReadings.measurementId))
        .where(
          inArray(
            bringupStepReadings.stepId,
            stepRows.map((r) => r.s.id),
          ),
        )
        .orderBy(asc(measurements.id))
    : [];
  const steps = stepRows.map(({ s, by }) => ({
    id: s.id,
    number: s.number,
    supply: s.supply,
    lampWatts: s.lampWatts,
    lampVolts: s.lampVolts,
    appliedVolts: s.appliedVolts,
    lampBehaviour: s.lampBehaviour,
    notes: notes ? s.notes : '',
    decision: s.decision,
    findingId: notes ? s.findingId : null,
    takenBy: by,
    takenAt: s.takenAt.toISOString(),
    readings: readingRows
      .filter((r) => r.stepId === s.id && can(role, 'measurements.view', { ownerVisible: r.m.ownerVisible }))
      .map(({ m }) => ({
        measurementId: m.id,
        location: m.location,
        quantity: m.quantity as StepQuantity,
        readingText: m.readingText,
        expectedText: m.expectedText,
        verdict: m.verdict,
        verdictReason: m.verdictReason,
      })),
  }));

  return {
    intake,
    prePower: {
      items,
      signedOff: signoff ? { by: signoff.by, at: signoff.s.signedAt.toISOString() } : null,
      missing: prePowerMissing(items),
    },
    steps,
  };
}
