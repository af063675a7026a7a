import { and, eq, inArray } from 'drizzle-orm';
import { prePowerItems, type PrePowerCheck } from '../../../shared/schemas/bringup';
import { bringupService } from '../../features/bringup/bringup.service';
import type { Database } from '../client';
import { findings, intakeChecks, prePowerChecks, restorations, users } from '../schema';
import { demoPeople, demoRestorations } from './demo-scenario';

type Set = typeof restorations.$inferSelect;

/**
 * The demo's bring-up records, through the same service the API uses (so the history has them too). Every demo
 * set in Testing or later gets a signed pre-power checklist; the Meridian 54 gets its intake checks and the
 * staged power-up that showed its output valve glowing red. Runs once per set.
 */
export async function seedDemoBringup(db: Database): Promise<void> {
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople.technician.email));
  if (!tech) return;
  const service = bringupService(db);
  const sets = await db
    .select()
    .from(restorations)
    .where(
      inArray(
        restorations.serial,
        demoRestorations.map((r) => r.serial),
      ),
    );
  for (const set of sets) {
    const [touched] = await db
      .select({ id: prePowerChecks.id })
      .from(prePowerChecks)
      .where(eq(prePowerChecks.restorationId, set.id))
      .limit(1);
    const [checked] = await db
      .select({ id: intakeChecks.id })
      .from(intakeChecks)
      .where(eq(intakeChecks.restorationId, set.id))
      .limit(1);
    if (touched || checked) continue;
    const isMeridian = set.serial === 'OV-54-20417';
    if (isMeridian) await meridian(db, service, set, tech.id);
    else if (set.stage === 'testing' || set.stage === 'returned') await signChecklist(service, set, tech.id);
  }
}

/** Every item done, except the isolation transformer on a set with a mains transformer (not applicable). */
async function signChecklist(service: ReturnType<typeof bringupService>, set: Set, userId: number) {
  for (const item of prePowerItems) {
    const input: PrePowerCheck =
      item === 'isolation-transformer' && !set.liveChassis
        ? { item, status: 'not-applicable', reason: 'Mains transformer; the chassis is not connected to the mains' }
        : { item, status: 'done', reason: '' };
    await service.setPrePower(set.id, input, userId, 'technician');
  }
  await service.signOff(set.id, userId, 'technician');
}

async function meridian(db: Database, service: ReturnType<typeof bringupService>, set: Set, userId: number) {
  const ref = async (componentRef: string) =>
    (
      await db
        .select({ id: findings.id })
        .from(findings)
        .where(and(eq(findings.restorationId, set.id), eq(findings.componentRef, componentRef)))
    )[0]?.id ?? null;
  const intake = async (
    item: Parameters<typeof service.setIntake>[1]['item'],
    note: string,
    findingId: number | null = null,
  ) => service.setIntake(set.id, { item, done: true, note, findingId, photoId: null }, userId, 'technician');
  await intake('valve-line-up', 'Seven valves, all in their marked sockets; the EL84 has a greyed patch on its anode.');
  await intake('mains-lead', 'Two-core lead, sound; strain relief grommet missing, fitted a new one.');
  await intake(
    'rubber-wiring',
    'Rubber-covered leads to the valve heaters and the output transformer crack when bent.',
  );
  await intake('mains-tap', 'On the 245 V tap; household mains measured 236 V, so it stays there.');
  await intake('missing-parts', 'C27 weeping wax at one end; no other damage seen.', await ref('C27'));
  await signChecklist(service, set, userId);
  const lamp = { supply: 'series-lamp' as const, lampWatts: 60, lampVolts: 240, appliedVolts: 236, readings: [] };
  const c27 = await ref('C27');
  await service.addStep(
    set.id,
    {
      ...lamp,
      lampBehaviour: 'flash-then-dim',
      decision: 'stop',
      notes:
        'Lamp dimmed, but after two minutes the EL84 anode began to glow red. Switched off: grid pulled positive, C27 suspected.',
      findingId: c27,
    },
    userId,
    'technician',
  );
  await service.addStep(
    set.id,
    {
      ...lamp,
      lampBehaviour: 'flash-then-dim',
      decision: 'go-on',
      notes: 'C27 replaced with a film part and R28 with a new 470 kΩ: lamp dim, EL84 anode dark after ten minutes.',
      findingId: c27,
    },
    userId,
    'technician',
  );
  await service.addStep(
    set.id,
    {
      supply: 'variable-transformer',
      lampWatts: null,
      lampVolts: null,
      appliedVolts: 236,
      lampBehaviour: 'no-lamp',
      decision: 'go-on',
      notes: 'Raised slowly to full mains; records play cleanly, no red glow.',
      findingId: null,
      readings: [],
    },
    userId,
    'technician',
  );
}
