import { and, count, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { memberships, safetyTests, soakSessions } from '../../db/schema';
import { demoRestorations } from '../../db/seed/demo-scenario';
import { safetyTestsService } from '../safety/safety-tests.service';
import { demoSet } from './demo-lookup';

const HOUR_MS = 3_600_000;

/**
 * The demo's safety records, invented like the rest of the scenario: a set at Returned has a passing final safety
 * test and a finished soak (the Returned gate holds in the demo too); a set at Testing has a soak run and no test yet,
 * so the gate can be seen at work. Running it again changes nothing.
 */
export async function seedDemoSafety(db: Database): Promise<void> {
  for (const demo of demoRestorations) {
    const set = await demoSet(db, demo);
    if (!set || (set.stage !== 'returned' && set.stage !== 'testing')) continue;
    const [tech] = await db
      .select({ id: memberships.userId })
      .from(memberships)
      .where(and(eq(memberships.restorationId, set.id), eq(memberships.role, 'technician')));
    if (!tech) continue;
    const [soaks] = await db.select({ n: count() }).from(soakSessions).where(eq(soakSessions.restorationId, set.id));
    if (!soaks!.n) {
      const endedAt = new Date(Date.now() - 2 * HOUR_MS);
      await db.insert(soakSessions).values({
        restorationId: set.id,
        startedById: tech.id,
        startedAt: new Date(endedAt.getTime() - 3.5 * HOUR_MS),
        endedAt,
        ambientC: 19,
        chassisC: 41,
        mainsCurrentText: '0.28',
        mainsCurrentAmps: 0.28,
        actionTaken: 'Left playing on the bench, back fitted.',
      });
    }
    const [tests] = await db.select({ n: count() }).from(safetyTests).where(eq(safetyTests.restorationId, set.id));
    if (set.stage === 'returned' && !tests!.n)
      await safetyTestsService(db).record(
        set.id,
        {
          equipmentClass: set.liveChassis ? 'live-chassis' : 'class-1',
          earth: set.liveChassis ? '' : '0.06',
          lead: set.liveChassis ? '' : '0.03',
          insulation: '80M',
          insulationVolts: '500',
          touchCurrent: '',
          yCapacitor: '',
          mainsVolts: '230',
          mainsHertz: '50',
          fuseFitted: '1',
          fuseRecommended: '1',
          leadAndStrainRelief: true,
          coversRefitted: true,
          safetyClassCapacitors: true,
          specification: 'original',
          modifications: '',
          notes: 'Demo record: invented readings for the demo workshop.',
        },
        tech.id,
      );
  }
}
