import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import {
  bringupSteps,
  estimates,
  findings,
  helpRequests,
  invoices,
  measurements,
  parts,
  payments,
  photos,
  prePowerSignoffs,
  readingRequests,
  restorations,
  symptomChecks,
  users,
  valves,
} from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed/seed-demo';
import { seedDemoBringup } from '../../server/db/seed/seed-demo-bringup';
import { chassisLandmarks } from '../../server/features/demo/chassis';
import { seedDemoHelp } from '../../server/features/demo/seed-demo-help';
import { seedDemoMoney } from '../../server/features/demo/seed-demo-money';
import { readingRequestsRepo } from '../../server/features/reading-requests/reading-requests.repo';
import { seedDemoFindings } from '../../server/features/demo/seed-demo-findings';
import { seedDemoPhotos } from '../../server/features/demo/seed-demo-photos';
import { seedDemoWorkshop } from '../../server/features/demo/seed-demo-workshop';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const seedAll = async () => {
  await seedDemo(t.db);
  await seedDemoPhotos(t.deps);
  await seedDemoFindings(t.db);
  await seedDemoWorkshop(t.db);
  await seedDemoMoney(t.db);
  await seedDemoBringup(t.db);
  await seedDemoHelp(t.db);
};
const counts = async () =>
  Promise.all(
    [
      users,
      restorations,
      photos,
      findings,
      measurements,
      parts,
      valves,
      prePowerSignoffs,
      bringupSteps,
      estimates,
      invoices,
      payments,
      helpRequests,
      symptomChecks,
      readingRequests,
    ].map(async (table) => (await t.db.select({ n: count() }).from(table))[0]!.n),
  );

describe('demo seed', () => {
  it('when seeded twice, then the second run changes nothing', async () => {
    await seedAll();
    const first = await counts();
    expect(first).toEqual([3, 3, 5, 3, expect.any(Number), 10, 17, 2, 3, 1, 1, 1, 1, 2, 1]);
    await seedAll();
    expect(await counts()).toEqual(first);
  }, 120_000);

  it('when seeded, then the Meridian 54 has an approved estimate and a deposit paid by transfer (no card payment invented)', async () => {
    const [set] = await t.db
      .select()
      .from(restorations)
      .where(and(eq(restorations.make, 'Ostrander & Vale'), eq(restorations.serial, 'OV-54-20417')));
    const [estimate] = await t.db.select().from(estimates).where(eq(estimates.restorationId, set!.id));
    expect(estimate).toMatchObject({ sent: true, decision: 'approved', decidedByName: 'Imogen Tarrant', version: 1 });
    const [deposit] = await t.db.select().from(invoices).where(eq(invoices.restorationId, set!.id));
    expect(deposit).toMatchObject({ kind: 'deposit', currency: estimate!.currency, due: 2500, voidedAt: null });
    expect(deposit!.paid).toBe(deposit!.due);
    const lines = await t.db.select().from(payments).where(eq(payments.invoiceId, deposit!.id));
    expect(lines.map((p) => [p.kind, p.method, p.status, p.amount, p.checkoutSessionId])).toEqual([
      ['payment', 'transfer', 'succeeded', deposit!.due, null],
    ]);
  });

  it("when seeded, then the Wren AC/DC asks for help with its checklist, and the mentor's reading request waits on the technician's bench", async () => {
    const [set] = await t.db.select().from(restorations).where(eq(restorations.serial, 'KW-3381'));
    const [help] = await t.db.select().from(helpRequests).where(eq(helpRequests.restorationId, set!.id));
    expect(help!.symptomIds).toEqual(['dead-dial-dark']);
    const checks = await t.db.select().from(symptomChecks).where(eq(symptomChecks.restorationId, set!.id));
    expect(checks.map((c) => [c.causeId, c.result]).sort()).toEqual([
      ['heater-chain-open', 'confirmed'],
      ['mains-lead-fuse', 'ruled-out'],
    ]);
    const [mara] = await t.db.select().from(users).where(eq(users.email, 'mara@cobbold-lane.test'));
    const waiting = await readingRequestsRepo(t.deps).bench(mara!.id);
    expect(waiting.map((r) => [r.restorationId, r.helpRequestId])).toEqual([[set!.id, help!.id]]);
  });

  it('when seeded, then every demo set in Testing or later has a signed pre-power checklist (the first-power gate holds)', async () => {
    const sets = await t.db.select().from(restorations);
    const signed = new Set((await t.db.select().from(prePowerSignoffs)).map((s) => s.restorationId));
    const powered = sets.filter((s) => s.stage === 'testing' || s.stage === 'returned');
    expect(powered.length).toBeGreaterThan(0);
    expect(powered.filter((s) => !signed.has(s.id))).toEqual([]);
  });

  it('when the demo findings are pinned, then they sit on the drawn parts of the underside picture', async () => {
    const all = await t.db.select().from(findings);
    const marks = chassisLandmarks('underside');
    const c27 = all.find((f) => f.componentRef === 'C27')!;
    expect(c27.points[0]).toEqual({ x: marks.C27!.x, y: marks.C27!.y });
    // The volume control's box is centred on the drawn control.
    const pot = all.find((f) => f.componentRef === 'R20')!;
    const [a, b] = pot.points as [{ x: number; y: number }, { x: number; y: number }];
    expect((a.x + b.x) / 2).toBeCloseTo(marks.volumeControl!.x, 9);
    expect((a.y + b.y) / 2).toBeCloseTo(marks.volumeControl!.y, 9);
  });
});
