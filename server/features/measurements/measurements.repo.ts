import { and, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Valve } from '../../../shared/schemas/measurements';
import type { Executor } from '../../db/client';
import { keyset, toMs, type PageWindow } from '../../db/keyset';
import { findings, measurements, photos, restorations, users, valves } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type MeasurementRow = typeof measurements.$inferSelect & { measuredBy: string | null };
/** Readings in the order they were taken (then by id). */
export const measurementOrder = keyset('asc', [
  { by: toMs(measurements.measuredAt), kind: 'instant' },
  { by: measurements.id, kind: 'number' },
]);

export type MeasurementValues = Omit<
  typeof measurements.$inferInsert,
  'id' | 'restorationId' | 'measuredById' | 'measuredAt'
>;

/** Readings and the valve line-up in PostgreSQL; runs on the pool or on the action's transaction. */
export function measurementsRepo(db: Executor) {
  return {
    async find(id: number): Promise<MeasurementRow | undefined> {
      const [r] = await db
        .select({ m: measurements, measuredBy: users.name })
        .from(measurements)
        .leftJoin(users, eq(users.id, measurements.measuredById))
        .where(eq(measurements.id, id));
      return r && { ...r.m, measuredBy: r.measuredBy };
    },
    /** Locks the reading's row until the transaction ends. */
    async lock(id: number) {
      await db.select({ id: measurements.id }).from(measurements).where(eq(measurements.id, id)).for('update');
    },
    async restorationOf(id: number) {
      const [r] = await db.select({ id: measurements.restorationId }).from(measurements).where(eq(measurements.id, id));
      return r?.id;
    },
    /**
     * The readings this role may see (of one finding, when asked), oldest first, all of them or one page (`window`);
     * a reading's finding is named only when the reader may see it.
     */
    async list(restorationId: number, role: Role, findingId?: number, window?: PageWindow): Promise<MeasurementRow[]> {
      const findingVisible = visibleSql(role, 'finding', { finding: columnsOf(findings), photo: columnsOf(photos) });
      const query = db
        .select({ m: measurements, measuredBy: users.name, findingVisible })
        .from(measurements)
        .leftJoin(users, eq(users.id, measurements.measuredById))
        .leftJoin(findings, eq(findings.id, measurements.findingId))
        .leftJoin(photos, eq(photos.id, findings.photoId))
        .where(
          and(
            eq(measurements.restorationId, restorationId),
            findingId ? and(eq(measurements.findingId, findingId), findingVisible) : undefined,
            visibleSql(role, 'reading', { reading: columnsOf(measurements) }),
            measurementOrder.after(window?.cursor),
          ),
        )
        .orderBy(...measurementOrder.orderBy);
      const rows = window ? await query.limit(window.limit) : await query;
      return rows.map((r) => ({
        ...r.m,
        measuredBy: r.measuredBy,
        findingId: r.findingVisible ? r.m.findingId : null,
      }));
    },
    async insert(restorationId: number, values: MeasurementValues, measuredById: number) {
      const [row] = await db
        .insert(measurements)
        .values({ restorationId, ...values, measuredById })
        .returning({ id: measurements.id });
      return row!.id;
    },
    async update(id: number, values: MeasurementValues) {
      await db.update(measurements).set(values).where(eq(measurements.id, id));
    },
    async remove(id: number) {
      await db.delete(measurements).where(eq(measurements.id, id));
    },
    valves(restorationId: number) {
      return db.select().from(valves).where(eq(valves.restorationId, restorationId));
    },
    async replaceValves(restorationId: number, list: Valve[]) {
      await db.delete(valves).where(eq(valves.restorationId, restorationId));
      if (list.length) await db.insert(valves).values(list.map((v) => ({ ...v, restorationId })));
    },
    async markLiveChassis(restorationId: number) {
      await db.update(restorations).set({ liveChassis: true }).where(eq(restorations.id, restorationId));
    },
  };
}
