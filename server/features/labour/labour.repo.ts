import { and, desc, eq, gte, isNull, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { findings, labourEntries, users } from '../../db/schema';

export type LabourRow = typeof labourEntries.$inferSelect;
type NewEntry = typeof labourEntries.$inferInsert;

/** Labour entries; runs on the pool or on the action's transaction. */
export function labourRepo(db: Executor) {
  const running = (technicianId: number, restorationId?: number) =>
    and(
      eq(labourEntries.technicianId, technicianId),
      restorationId === undefined ? undefined : eq(labourEntries.restorationId, restorationId),
      isNull(labourEntries.stoppedAt),
    );
  return {
    /** Whether the finding is on this restoration. */
    async findingOn(restorationId: number, findingId: number): Promise<boolean> {
      const [f] = await db
        .select({ id: findings.id })
        .from(findings)
        .where(and(eq(findings.id, findingId), eq(findings.restorationId, restorationId)));
      return !!f;
    },
    /** Every entry on the restoration with its technician's name, newest first. */
    async entries(restorationId: number) {
      return db
        .select({ e: labourEntries, by: users.name })
        .from(labourEntries)
        .leftJoin(users, eq(users.id, labourEntries.technicianId))
        .where(eq(labourEntries.restorationId, restorationId))
        .orderBy(desc(labourEntries.startedAt), desc(labourEntries.id));
    },
    /** The technician's running timer, on whichever restoration, with their name. */
    async runningOf(technicianId: number) {
      const [row] = await db
        .select({ e: labourEntries, by: users.name })
        .from(labourEntries)
        .leftJoin(users, eq(users.id, labourEntries.technicianId))
        .where(running(technicianId));
      return row;
    },
    /** Minutes per technician on the restoration since `since`, all and billable. */
    async week(restorationId: number, since: Date) {
      return db
        .select({
          technician: users.name,
          minutes: sql<number>`coalesce(sum(${labourEntries.minutes}), 0)::int`,
          billableMinutes: sql<number>`coalesce(sum(${labourEntries.minutes}) filter (where ${labourEntries.billable}), 0)::int`,
        })
        .from(labourEntries)
        .leftJoin(users, eq(users.id, labourEntries.technicianId))
        .where(and(eq(labourEntries.restorationId, restorationId), gte(labourEntries.startedAt, since)))
        .groupBy(users.id, users.name)
        .orderBy(users.name);
    },
    /** Whether the technician has a timer running anywhere, read for update. */
    async lockRunningId(technicianId: number) {
      const [row] = await db
        .select({ id: labourEntries.id })
        .from(labourEntries)
        .where(running(technicianId))
        .for('update');
      return row;
    },
    /** The technician's running timer on this restoration, read for update. */
    async lockRunningOn(technicianId: number, restorationId: number) {
      const [row] = await db.select().from(labourEntries).where(running(technicianId, restorationId)).for('update');
      return row;
    },
    async insert(values: NewEntry): Promise<LabourRow> {
      const [row] = await db.insert(labourEntries).values(values).returning();
      return row!;
    },
    async stop(id: number, values: { stoppedAt: Date; minutes: number }): Promise<LabourRow> {
      const [row] = await db.update(labourEntries).set(values).where(eq(labourEntries.id, id)).returning();
      return row!;
    },
  };
}
