import { applicableTexts, BenchInputError, liveChassisLikely, measurementVerdict } from '../../../shared/bench';
import type { Role } from '../../../shared/permissions';
import type { LineUp, Measurement, MeasurementInput, Valve } from '../../../shared/schemas/measurements';
import type { Database, Executor } from '../../db/client';
import type { PageWindow } from '../../db/keyset';
import { BadRequestError, NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { assertPrePowerSignedOff } from '../bringup/power-gate';
import { recordEvent } from '../events/record-event';
import { findingsRepo } from '../findings/findings.repo';
import { measurementsRepo, type MeasurementRow } from './measurements.repo';

type Fields = Required<Pick<MeasurementInput, 'location' | 'quantity' | 'reading'>> & Partial<MeasurementInput>;

const toMeasurement = (m: MeasurementRow): Measurement => ({
  id: m.id,
  restorationId: m.restorationId,
  findingId: m.findingId,
  location: m.location,
  quantity: m.quantity,
  expectedText: m.expectedText,
  toleranceText: m.toleranceText,
  ratingText: m.ratingText,
  readingText: m.readingText,
  conditions: m.conditions,
  method: m.method,
  chartMeterText: m.chartMeterText,
  meterText: m.meterText,
  sourceText: m.sourceText,
  expected: m.expected,
  reading: m.reading,
  rating: m.rating,
  reference: m.reference,
  deviation: m.deviation,
  verdict: m.verdict,
  verdictReason: m.verdictReason,
  ownerVisible: m.ownerVisible,
  powerOn: m.powerOn,
  measuredBy: m.measuredBy,
  measuredAt: m.measuredAt.toISOString(),
});

/** The bench library judges every reading; a value it cannot read is a 400 naming the field. */
export function judge(f: Fields) {
  try {
    const v = measurementVerdict({
      quantity: f.quantity,
      expected: f.expected,
      tolerance: f.tolerance,
      rating: f.rating,
      reading: f.reading,
      chartMeter: f.chartMeter,
      meter: f.meter,
      source: f.source,
    });
    return {
      expected: v.expected,
      reading: v.reading,
      rating: v.rating,
      reference: v.reference,
      deviation: v.deviation,
      verdict: v.verdict,
      verdictReason: v.reason,
    };
  } catch (err) {
    if (err instanceof BenchInputError) throw new BadRequestError(err.message);
    throw err;
  }
}

export { measurementOrder } from './measurements.repo';

export function measurementsService(db: Database) {
  const repo = measurementsRepo(db);
  const find = (id: number, on: Executor = db) => measurementsRepo(on).find(id);
  async function assertFinding(tx: Executor, restorationId: number, findingId: number | null | undefined) {
    if (!findingId) return;
    if ((await findingsRepo(tx).restorationOf(findingId)) !== restorationId)
      throw new BadRequestError('findingId: no such finding on this restoration.');
  }
  const columns = (f: Fields) => ({
    location: f.location,
    quantity: f.quantity,
    expectedText: f.expected ?? '',
    toleranceText: f.tolerance ?? '',
    ratingText: f.rating ?? '',
    readingText: f.reading,
    conditions: f.conditions ?? '',
    method: f.method ?? '',
    chartMeterText: f.chartMeter ?? '',
    meterText: f.meter ?? '',
    sourceText: f.source ?? '',
    findingId: f.findingId ?? null,
    ownerVisible: f.ownerVisible ?? false,
    powerOn: f.powerOn ?? false,
  });

  return {
    /** The reading as the guard's subject: who may not see it gets a 404 (owners, unshared readings), then the rule. */
    async subjectOf(id: number): Promise<RestorationAndRole | undefined> {
      const m = await find(id);
      return (
        m && {
          restorationId: m.restorationId,
          subject: { view: 'measurements.view', context: { ownerVisible: m.ownerVisible } },
        }
      );
    },
    /** The readings this role may see; a reading's finding is named only when the reader may see it. */
    /** The readings this role may see (of one finding, when asked), all of them or one page (`window`). */
    async list(restorationId: number, role: Role, findingId?: number, window?: PageWindow) {
      return (await repo.list(restorationId, role, findingId, window)).map(toMeasurement);
    },
    async create(restorationId: number, input: Fields, userId: number) {
      const id = await db.transaction((tx) => this.createIn(tx, restorationId, input, userId));
      return toMeasurement((await find(id))!);
    },
    /** Records a reading on the caller's transaction (an answer or a checklist result that files one); returns its id. */
    async createIn(tx: Executor, restorationId: number, typed: Fields, userId: number) {
      // What the reading's kind does not use (a tolerance on an ESR, a rating on a voltage) is neither judged nor stored.
      const input = applicableTexts(typed);
      const verdict = judge(input);
      await assertFinding(tx, restorationId, input.findingId);
      if (input.powerOn)
        await assertPrePowerSignedOff(tx, restorationId, 'recording a reading taken with the set powered');
      const id = await measurementsRepo(tx).insert(restorationId, { ...columns(input), ...verdict }, userId);
      if (verdict.verdict === 'out')
        await recordEvent(tx, {
          restorationId,
          kind: 'measurement-out',
          actorId: userId,
          measurementId: id,
          findingId: input.findingId ?? null,
        });
      return id;
    },
    /** Recomputes the verdict from the merged texts whenever anything changes. */
    async update(id: number, patch: Partial<MeasurementInput>, userId: number) {
      await db.transaction((tx) => this.updateIn(tx, id, patch, userId));
      return toMeasurement((await find(id))!);
    },
    /** The update on one transaction; the row is locked so two edits cannot both record "went out of range". */
    async updateIn(tx: Executor, id: number, patch: Partial<MeasurementInput>, userId: number) {
      await measurementsRepo(tx).lock(id);
      const current = await find(id, tx);
      if (!current) throw new NotFoundError();
      const merged: Fields = applicableTexts({
        location: patch.location ?? current.location,
        quantity: patch.quantity ?? current.quantity,
        reading: patch.reading ?? current.readingText,
        expected: patch.expected ?? current.expectedText,
        tolerance: patch.tolerance ?? current.toleranceText,
        rating: patch.rating ?? current.ratingText,
        conditions: patch.conditions ?? current.conditions,
        method: patch.method ?? current.method,
        chartMeter: patch.chartMeter ?? current.chartMeterText,
        meter: patch.meter ?? current.meterText,
        source: patch.source ?? current.sourceText,
        findingId: patch.findingId === undefined ? current.findingId : patch.findingId,
        ownerVisible: patch.ownerVisible ?? current.ownerVisible,
        powerOn: patch.powerOn ?? current.powerOn,
      });
      await assertFinding(tx, current.restorationId, merged.findingId);
      if (merged.powerOn && !current.powerOn)
        await assertPrePowerSignedOff(tx, current.restorationId, 'recording a reading taken with the set powered');
      const verdict = judge(merged);
      await measurementsRepo(tx).update(id, { ...columns(merged), ...verdict });
      if (verdict.verdict === 'out' && current.verdict !== 'out')
        await recordEvent(tx, {
          restorationId: current.restorationId,
          kind: 'measurement-out',
          actorId: userId,
          measurementId: id,
          findingId: merged.findingId ?? null,
        });
    },
    remove: (id: number) => repo.remove(id),
    async lineUp(restorationId: number): Promise<LineUp> {
      const rows = await repo.valves(restorationId);
      const list: Valve[] = rows
        .map((v) => ({ position: v.position, type: v.type, notes: v.notes }))
        .sort((a, b) => Number(a.position.slice(1)) - Number(b.position.slice(1)));
      return { valves: list, liveChassis: liveChassisLikely(list.map((v) => v.type)) };
    },
    /** Replaces the line-up; series heaters mark the restoration live-chassis (never unmark: the person decides). */
    async setLineUp(restorationId: number, list: Valve[]): Promise<LineUp> {
      const positions = new Set(list.map((v) => v.position));
      if (positions.size !== list.length) throw new BadRequestError('Each position (V1, V2, …) may appear once.');
      await db.transaction(async (tx) => {
        await measurementsRepo(tx).replaceValves(restorationId, list);
        if (liveChassisLikely(list.map((v) => v.type)).likely)
          await measurementsRepo(tx).markLiveChassis(restorationId);
      });
      return this.lineUp(restorationId);
    },
  };
}
