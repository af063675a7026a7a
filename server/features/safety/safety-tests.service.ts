import { desc, eq } from 'drizzle-orm';
import { BenchInputError, parseQuantity, safetyTest, type QuantityUnit } from '../../../shared/bench';
import type { SafetyOverride, SafetyStatus, SafetyTest, safetyTestInputSchema } from '../../../shared/schemas/safety';
import type { z } from 'zod';
import type { Database } from '../../db/client';
import { events, safetyOverrides, safetyTests, users } from '../../db/schema';
import { BadRequestError } from '../../http/errors';

type Input = z.output<typeof safetyTestInputSchema>;
type TestRow = typeof safetyTests.$inferSelect;
type OverrideRow = typeof safetyOverrides.$inferSelect;

/** Reads one typed reading in its unit; '' is "not measured". A value the bench library cannot read is a 400 naming the field. */
function read(field: string, text: string, unit: Exclude<QuantityUnit, ''>): number | null {
  if (!text) return null;
  try {
    return parseQuantity(text, { expectUnit: unit }).value;
  } catch (err) {
    if (err instanceof BenchInputError) throw new BadRequestError(`${field}: ${err.message}`);
    throw err;
  }
}

/** The bench library's verdict on the typed readings. */
export function judgeSafetyTest(input: Input) {
  try {
    return safetyTest({
      equipmentClass: input.equipmentClass,
      earthOhms: read('earth', input.earth, 'Ω'),
      leadOhms: read('lead', input.lead, 'Ω'),
      insulationOhms: read('insulation', input.insulation, 'Ω'),
      insulationVolts: read('insulationVolts', input.insulationVolts, 'V'),
      touchAmps: read('touchCurrent', input.touchCurrent, 'A'),
      yFarads: read('yCapacitor', input.yCapacitor, 'F'),
      mainsVolts: read('mainsVolts', input.mainsVolts, 'V') ?? 230,
      mainsHertz: read('mainsHertz', input.mainsHertz, 'Hz') ?? 50,
      fuseFittedAmps: read('fuseFitted', input.fuseFitted, 'A'),
      fuseRecommendedAmps: read('fuseRecommended', input.fuseRecommended, 'A'),
      leadAndStrainRelief: input.leadAndStrainRelief,
      coversRefitted: input.coversRefitted,
      safetyClassCapacitors: input.safetyClassCapacitors,
    });
  } catch (err) {
    if (err instanceof BenchInputError) throw new BadRequestError(err.message);
    throw err;
  }
}

const toTest = (r: TestRow, testedBy: string | null): SafetyTest => ({
  id: r.id,
  restorationId: r.restorationId,
  equipmentClass: r.equipmentClass,
  specification: r.specification,
  modifications: r.modifications,
  notes: r.notes,
  lines: r.lines,
  verdict: r.verdict,
  testedBy,
  testedAt: r.testedAt.toISOString(),
});
const toOverride = (r: OverrideRow, by: string | null): SafetyOverride => ({
  id: r.id,
  reason: r.reason,
  by,
  at: r.createdAt.toISOString(),
});

/**
 * The set may go to Returned when its latest safety test passed, or when a technician recorded an override
 * after that test (a later failing test needs a new override).
 */
export function returnedAllowed(
  latest: { verdict: string; testedAt: Date } | undefined,
  override: { createdAt: Date } | undefined,
): boolean {
  if (latest?.verdict === 'pass') return true;
  return !!override && (!latest || override.createdAt >= latest.testedAt);
}

export function safetyTestsService(db: Database) {
  async function testsOf(restorationId: number) {
    return db
      .select({ t: safetyTests, by: users.name })
      .from(safetyTests)
      .leftJoin(users, eq(users.id, safetyTests.testedById))
      .where(eq(safetyTests.restorationId, restorationId))
      .orderBy(desc(safetyTests.testedAt), desc(safetyTests.id));
  }
  async function latestOverride(restorationId: number) {
    const [o] = await db
      .select({ o: safetyOverrides, by: users.name })
      .from(safetyOverrides)
      .leftJoin(users, eq(users.id, safetyOverrides.actorId))
      .where(eq(safetyOverrides.restorationId, restorationId))
      .orderBy(desc(safetyOverrides.createdAt), desc(safetyOverrides.id))
      .limit(1);
    return o;
  }
  return {
    async status(restorationId: number): Promise<SafetyStatus> {
      const rows = await testsOf(restorationId);
      const o = await latestOverride(restorationId);
      const tests = rows.map((r) => toTest(r.t, r.by));
      return {
        tests,
        latest: tests[0] ?? null,
        override: o ? toOverride(o.o, o.by) : null,
        returnedAllowed: returnedAllowed(rows[0]?.t, o?.o),
      };
    },
    /** Records the test and its history line together. */
    async record(restorationId: number, input: Input, actorId: number): Promise<SafetyTest> {
      const result = judgeSafetyTest(input);
      const { specification, modifications, notes, equipmentClass, ...readings } = input;
      const row = await db.transaction(async (tx) => {
        const [t] = await tx
          .insert(safetyTests)
          .values({
            restorationId,
            equipmentClass,
            readings,
            lines: result.lines,
            verdict: result.verdict,
            specification,
            modifications,
            notes,
            testedById: actorId,
          })
          .returning();
        await tx.insert(events).values({
          restorationId,
          kind: 'safety-test',
          actorId,
          data: { safetyTestId: t!.id, verdict: result.verdict },
        });
        return t!;
      });
      const [by] = await db.select({ name: users.name }).from(users).where(eq(users.id, actorId));
      return toTest(row, by?.name ?? null);
    },
    /** A technician's decision to return the set without a passing test, with the reason, recorded with its history line. */
    async override(restorationId: number, reason: string, actorId: number): Promise<SafetyOverride> {
      const row = await db.transaction(async (tx) => {
        const [o] = await tx.insert(safetyOverrides).values({ restorationId, reason, actorId }).returning();
        await tx
          .insert(events)
          .values({ restorationId, kind: 'safety-override', actorId, data: { safetyOverrideId: o!.id, reason } });
        return o!;
      });
      const [by] = await db.select({ name: users.name }).from(users).where(eq(users.id, actorId));
      return toOverride(row, by?.name ?? null);
    },
  };
}
