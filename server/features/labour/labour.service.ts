import { and, desc, eq, gte, isNull, sql } from 'drizzle-orm';
import type { LabourLog } from '../../../shared/schemas/labour';
import type { Database, Tx } from '../../db/client';
import { events, findings, labourEntries, users } from '../../db/schema';
import { BadRequestError, ConflictError } from '../../http/errors';
import { lockRestoration } from '../restorations/lock-restoration';

type Row = typeof labourEntries.$inferSelect;
type Target = {
  findingId: number | null;
  stage: LabourLog['entries'][number]['stage'];
  note: string;
  billable: boolean;
};

const present = (e: Row, technician: string | null) => ({
  id: e.id,
  technician,
  findingId: e.findingId,
  stage: e.stage,
  note: e.note,
  billable: e.billable,
  startedAt: e.startedAt.toISOString(),
  stoppedAt: e.stoppedAt?.toISOString() ?? null,
  minutes: e.minutes,
});

/** Monday 00:00 UTC of the week `now` falls in (ISO 8601 weeks start on Monday). */
export function weekStart(now: Date): Date {
  const day = (now.getUTCDay() + 6) % 7;
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() - day));
}

async function assertTarget(tx: Tx, restorationId: number, findingId: number | null) {
  await lockRestoration(tx, restorationId);
  if (findingId === null) return;
  const [f] = await tx
    .select({ id: findings.id })
    .from(findings)
    .where(and(eq(findings.id, findingId), eq(findings.restorationId, restorationId)));
  if (!f) throw new BadRequestError('findingId: no such finding on this restoration.');
}

const logged = (tx: Tx, e: Row, actorId: number) =>
  tx.insert(events).values({
    restorationId: e.restorationId,
    kind: 'labour-logged',
    actorId,
    findingId: e.findingId,
    data: { labourEntryId: e.id, minutes: e.minutes, billable: e.billable },
  });

/** An entry's own fields, whether typed or timed. */
const entryOf = (restorationId: number, input: Target, userId: number) => ({
  restorationId,
  technicianId: userId,
  findingId: input.findingId,
  stage: input.stage,
  note: input.note,
  billable: input.billable,
});

/** The labour log: typed hours or a server-side timer; each finished entry writes its history line in the same transaction. */
export function labourService(db: Database) {
  async function log(restorationId: number, userId: number, now = new Date()): Promise<LabourLog> {
    const rows = await db
      .select({ e: labourEntries, by: users.name })
      .from(labourEntries)
      .leftJoin(users, eq(users.id, labourEntries.technicianId))
      .where(eq(labourEntries.restorationId, restorationId))
      .orderBy(desc(labourEntries.startedAt), desc(labourEntries.id));
    const [running] = await db
      .select({ e: labourEntries, by: users.name })
      .from(labourEntries)
      .leftJoin(users, eq(users.id, labourEntries.technicianId))
      .where(and(eq(labourEntries.technicianId, userId), isNull(labourEntries.stoppedAt)));
    const week = await db
      .select({
        technician: users.name,
        minutes: sql<number>`coalesce(sum(${labourEntries.minutes}), 0)::int`,
        billableMinutes: sql<number>`coalesce(sum(${labourEntries.minutes}) filter (where ${labourEntries.billable}), 0)::int`,
      })
      .from(labourEntries)
      .leftJoin(users, eq(users.id, labourEntries.technicianId))
      .where(and(eq(labourEntries.restorationId, restorationId), gte(labourEntries.startedAt, weekStart(now))))
      .groupBy(users.id, users.name)
      .orderBy(users.name);
    return {
      entries: rows.map(({ e, by }) => present(e, by)),
      running: running ? { ...present(running.e, running.by), restorationId: running.e.restorationId } : null,
      week,
    };
  }

  return {
    log,

    async add(restorationId: number, input: Target & { minutes: number; workedAt?: string }, userId: number) {
      await db.transaction(async (tx) => {
        await assertTarget(tx, restorationId, input.findingId);
        const at = input.workedAt ? new Date(input.workedAt) : new Date();
        const [e] = await tx
          .insert(labourEntries)
          .values({
            ...entryOf(restorationId, input, userId),
            startedAt: at,
            stoppedAt: at,
            minutes: input.minutes,
          })
          .returning();
        await logged(tx, e!, userId);
      });
      return log(restorationId, userId);
    },

    /** Starts the reader's timer; the start time is the server's, so a reload or another device shows it running. */
    async start(restorationId: number, input: Target, userId: number) {
      await db.transaction(async (tx) => {
        await assertTarget(tx, restorationId, input.findingId);
        const [already] = await tx
          .select({ id: labourEntries.id })
          .from(labourEntries)
          .where(and(eq(labourEntries.technicianId, userId), isNull(labourEntries.stoppedAt)))
          .for('update');
        if (already) throw new ConflictError('Your timer is already running: stop it before starting another.');
        await tx.insert(labourEntries).values(entryOf(restorationId, input, userId));
      });
      return log(restorationId, userId);
    },

    /** Stops the reader's timer on this restoration and writes its minutes (at least one). */
    async stop(restorationId: number, userId: number) {
      await db.transaction(async (tx) => {
        const [running] = await tx
          .select()
          .from(labourEntries)
          .where(
            and(
              eq(labourEntries.technicianId, userId),
              eq(labourEntries.restorationId, restorationId),
              isNull(labourEntries.stoppedAt),
            ),
          )
          .for('update');
        if (!running) throw new ConflictError('No timer of yours is running on this restoration.');
        const stoppedAt = new Date();
        const minutes = Math.max(1, Math.round((stoppedAt.getTime() - running.startedAt.getTime()) / 60_000));
        const [e] = await tx
          .update(labourEntries)
          .set({ stoppedAt, minutes })
          .where(eq(labourEntries.id, running.id))
          .returning();
        await logged(tx, e!, userId);
      });
      return log(restorationId, userId);
    },
  };
}
