import { and, asc, eq } from 'drizzle-orm';
import { BenchInputError, liveChassisLikely, measurementVerdict } from '../../../shared/bench';
import { can, type Role } from '../../../shared/permissions';
import type { LineUp, Measurement, MeasurementInput, Valve } from '../../../shared/schemas/measurements';
import type { Database } from '../../db/client';
import { findings, measurements, restorations, users, valves } from '../../db/schema';
import { BadRequestError, ForbiddenError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';

type Row = typeof measurements.$inferSelect & { measuredBy: string | null };
type Fields = Required<Pick<MeasurementInput, 'location' | 'quantity' | 'reading'>> & Partial<MeasurementInput>;

const toMeasurement = (m: Row): Measurement => ({
  id: m.id, restorationId: m.restorationId, findingId: m.findingId, location: m.location, quantity: m.quantity,
  expectedText: m.expectedText, toleranceText: m.toleranceText, ratingText: m.ratingText, readingText: m.readingText,
  conditions: m.conditions, method: m.method, chartMeterText: m.chartMeterText, meterText: m.meterText, sourceText: m.sourceText, expected: m.expected, reading: m.reading, rating: m.rating,
  reference: m.reference, deviation: m.deviation, verdict: m.verdict, verdictReason: m.verdictReason,
  ownerVisible: m.ownerVisible, measuredBy: m.measuredBy, measuredAt: m.measuredAt.toISOString(),
});

/** The bench library judges every reading; a value it cannot read is a 400 naming the field. */
function judge(f: Fields) {
  try {
    const v = measurementVerdict({
      quantity: f.quantity, expected: f.expected, tolerance: f.tolerance, rating: f.rating, reading: f.reading, chartMeter: f.chartMeter, meter: f.meter, source: f.source,
    });
    return { expected: v.expected, reading: v.reading, rating: v.rating, reference: v.reference, deviation: v.deviation, verdict: v.verdict, verdictReason: v.reason };
  } catch (err) {
    if (err instanceof BenchInputError) throw new BadRequestError(err.message);
    throw err;
  }
}

export function measurementsService(db: Database) {
  const select = () => db.select({ m: measurements, measuredBy: users.name }).from(measurements).leftJoin(users, eq(users.id, measurements.measuredById));
  const find = async (id: number) => {
    const [r] = await select().where(eq(measurements.id, id));
    return r && { ...r.m, measuredBy: r.measuredBy };
  };
  async function assertFinding(restorationId: number, findingId: number | null | undefined) {
    if (!findingId) return;
    const [f] = await db.select({ id: findings.id }).from(findings).where(and(eq(findings.id, findingId), eq(findings.restorationId, restorationId)));
    if (!f) throw new BadRequestError('findingId: no such finding on this restoration.');
  }
  const columns = (f: Fields) => ({
    location: f.location, quantity: f.quantity, expectedText: f.expected ?? '', toleranceText: f.tolerance ?? '', ratingText: f.rating ?? '',
    readingText: f.reading, conditions: f.conditions ?? '', method: f.method ?? '',
    chartMeterText: f.chartMeter ?? '', meterText: f.meter ?? '', sourceText: f.source ?? '', findingId: f.findingId ?? null, ownerVisible: f.ownerVisible ?? false,
  });

  return {
    async restorationOf(id: number) {
      const [r] = await db.select({ id: measurements.restorationId }).from(measurements).where(eq(measurements.id, id));
      return r?.id;
    },
    async list(restorationId: number, role: Role, findingId?: number) {
      const rows = await select()
        .where(and(eq(measurements.restorationId, restorationId), findingId ? eq(measurements.findingId, findingId) : undefined))
        .orderBy(asc(measurements.measuredAt), asc(measurements.id));
      return rows.map((r) => ({ ...r.m, measuredBy: r.measuredBy })).filter((m) => can(role, 'measurements.view', { ownerVisible: m.ownerVisible })).map(toMeasurement);
    },
    async create(restorationId: number, input: Fields, userId: number) {
      await assertFinding(restorationId, input.findingId);
      const verdict = judge(input);
      const [row] = await db.insert(measurements).values({ restorationId, ...columns(input), ...verdict, measuredById: userId }).returning({ id: measurements.id });
      if (verdict.verdict === 'out') await recordEvent(db, { restorationId, kind: 'measurement-out', actorId: userId, measurementId: row!.id, findingId: input.findingId ?? null });
      return toMeasurement((await find(row!.id))!);
    },
    /** Recomputes the verdict from the merged texts whenever anything changes. */
    async update(id: number, patch: Partial<MeasurementInput>, userId: number) {
      const current = await find(id);
      if (!current) throw new NotFoundError();
      const merged: Fields = {
        location: patch.location ?? current.location, quantity: patch.quantity ?? current.quantity, reading: patch.reading ?? current.readingText,
        expected: patch.expected ?? current.expectedText, tolerance: patch.tolerance ?? current.toleranceText, rating: patch.rating ?? current.ratingText,
        conditions: patch.conditions ?? current.conditions, method: patch.method ?? current.method,
        chartMeter: patch.chartMeter ?? current.chartMeterText, meter: patch.meter ?? current.meterText, source: patch.source ?? current.sourceText,
        findingId: patch.findingId === undefined ? current.findingId : patch.findingId, ownerVisible: patch.ownerVisible ?? current.ownerVisible,
      };
      await assertFinding(current.restorationId, merged.findingId);
      const verdict = judge(merged);
      await db.update(measurements).set({ ...columns(merged), ...verdict }).where(eq(measurements.id, id));
      if (verdict.verdict === 'out' && current.verdict !== 'out')
        await recordEvent(db, { restorationId: current.restorationId, kind: 'measurement-out', actorId: userId, measurementId: id, findingId: merged.findingId ?? null });
      return toMeasurement((await find(id))!);
    },
    /** 404 when the caller may not see the reading (owners and unshared readings), 403 when they may not record. */
    async assertMayRecord(id: number, role: Role) {
      const m = await find(id);
      if (!m || !can(role, 'measurements.view', { ownerVisible: m.ownerVisible })) throw new NotFoundError();
      if (!can(role, 'measurements.record')) throw new ForbiddenError('Only a technician records and changes readings.');
    },
    async remove(id: number) {
      await db.delete(measurements).where(eq(measurements.id, id));
    },
    async lineUp(restorationId: number): Promise<LineUp> {
      const rows = await db.select().from(valves).where(eq(valves.restorationId, restorationId));
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
        await tx.delete(valves).where(eq(valves.restorationId, restorationId));
        if (list.length) await tx.insert(valves).values(list.map((v) => ({ ...v, restorationId })));
        if (liveChassisLikely(list.map((v) => v.type)).likely)
          await tx.update(restorations).set({ liveChassis: true }).where(eq(restorations.id, restorationId));
      });
      return this.lineUp(restorationId);
    },
  };
}
