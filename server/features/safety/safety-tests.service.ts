import { BenchInputError, parseQuantity, safetyTest, type QuantityUnit } from '../../../shared/bench';
import type { SafetyOverride, SafetyStatus, SafetyTest, safetyTestInputSchema } from '../../../shared/schemas/safety';
import type { z } from 'zod';
import type { Database } from '../../db/client';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { safetyRepo, type SafetyOverrideRow as OverrideRow, type SafetyTestRow as TestRow } from './safety.repo';

type Input = z.output<typeof safetyTestInputSchema>;

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
  const repo = safetyRepo(db);
  return {
    async status(restorationId: number): Promise<SafetyStatus> {
      const rows = await repo.tests(restorationId);
      const o = await repo.latestOverride(restorationId);
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
      const row = await unitOfWork(db, async (tx) => {
        const t = await safetyRepo(tx).insertTest({
          restorationId,
          equipmentClass,
          readings,
          lines: result.lines,
          verdict: result.verdict,
          specification,
          modifications,
          notes,
          testedById: actorId,
        });
        await recordEvent(tx, {
          restorationId,
          kind: 'safety-test',
          actorId,
          data: { safetyTestId: t.id, verdict: result.verdict },
        });
        return t;
      });
      return toTest(row, await repo.userName(actorId));
    },
    /** A technician's decision to return the set without a passing test, with the reason, recorded with its history line. */
    async override(restorationId: number, reason: string, actorId: number): Promise<SafetyOverride> {
      const row = await unitOfWork(db, async (tx) => {
        const o = await safetyRepo(tx).insertOverride({ restorationId, reason, actorId });
        await recordEvent(tx, {
          restorationId,
          kind: 'safety-override',
          actorId,
          data: { safetyOverrideId: o.id, reason },
        });
        return o;
      });
      return toOverride(row, await repo.userName(actorId));
    },
  };
}
