import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { restorations, safetyTests, soakSessions } from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed/seed-demo';
import { demoRestorations } from '../../server/db/seed/demo-scenario';
import { seedDemoSafety } from '../../server/features/demo/seed-demo-safety';
import { assertReturnedGate } from '../../server/features/safety/returned-gate';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const counts = async () =>
  Promise.all([safetyTests, soakSessions].map(async (table) => (await t.db.select({ n: count() }).from(table))[0]!.n));

describe('demo safety records', () => {
  it('when a demo set is at Returned, then it has a passing safety test, so the demo keeps the Returned gate; seeding again changes nothing', async () => {
    await seedDemo(t.db);
    // Whichever demo set the scenario puts at Returned: here the first one is moved there, as a rewritten scenario may do.
    const [first] = await t.db.select().from(restorations).where(eq(restorations.serial, demoRestorations[0]!.serial));
    await t.db.update(restorations).set({ stage: 'returned' }).where(eq(restorations.id, first!.id));
    await seedDemoSafety(t.db);
    for (const set of await t.db.select().from(restorations).where(eq(restorations.stage, 'returned')))
      await expect(assertReturnedGate(t.db, set.id)).resolves.toBeUndefined();
    const [tests] = await t.db
      .select({ verdict: safetyTests.verdict })
      .from(safetyTests)
      .where(eq(safetyTests.restorationId, first!.id));
    expect(tests!.verdict).toBe('pass');
    const before = await counts();
    await seedDemoSafety(t.db);
    expect(await counts()).toEqual(before);
  }, 60_000);
});
