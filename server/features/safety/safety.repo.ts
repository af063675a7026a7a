import { and, asc, desc, eq, isNull, max, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import {
  findings,
  memberships,
  photos,
  reportSends,
  restorations,
  safetyOverrides,
  safetyTests,
  soakSessions,
  users,
} from '../../db/schema';

export type SafetyTestRow = typeof safetyTests.$inferSelect;
export type SafetyOverrideRow = typeof safetyOverrides.$inferSelect;
export type SoakRow = typeof soakSessions.$inferSelect;

/** Safety tests, overrides, soak runs and hand-back sends; runs on the pool or on the action's transaction. */
export function safetyRepo(db: Executor) {
  return {
    /** Every final safety test of the set with its tester's name, newest first. */
    async tests(restorationId: number) {
      return db
        .select({ t: safetyTests, by: users.name })
        .from(safetyTests)
        .leftJoin(users, eq(users.id, safetyTests.testedById))
        .where(eq(safetyTests.restorationId, restorationId))
        .orderBy(desc(safetyTests.testedAt), desc(safetyTests.id));
    },
    /** The newest override with its author's name. */
    async latestOverride(restorationId: number) {
      const [o] = await db
        .select({ o: safetyOverrides, by: users.name })
        .from(safetyOverrides)
        .leftJoin(users, eq(users.id, safetyOverrides.actorId))
        .where(eq(safetyOverrides.restorationId, restorationId))
        .orderBy(desc(safetyOverrides.createdAt), desc(safetyOverrides.id))
        .limit(1);
      return o;
    },
    /** What the Returned gate weighs: the latest test's verdict and time, and the newest override's time. */
    async gate(restorationId: number) {
      const [latest] = await db
        .select({ verdict: safetyTests.verdict, testedAt: safetyTests.testedAt })
        .from(safetyTests)
        .where(eq(safetyTests.restorationId, restorationId))
        .orderBy(desc(safetyTests.testedAt), desc(safetyTests.id))
        .limit(1);
      const [override] = await db
        .select({ createdAt: safetyOverrides.createdAt })
        .from(safetyOverrides)
        .where(eq(safetyOverrides.restorationId, restorationId))
        .orderBy(desc(safetyOverrides.createdAt))
        .limit(1);
      return { latest, override };
    },
    async insertTest(values: typeof safetyTests.$inferInsert) {
      const [row] = await db.insert(safetyTests).values(values).returning();
      return row!;
    },
    async insertOverride(values: typeof safetyOverrides.$inferInsert) {
      const [row] = await db.insert(safetyOverrides).values(values).returning();
      return row!;
    },
    async userName(userId: number): Promise<string | null> {
      const [by] = await db.select({ name: users.name }).from(users).where(eq(users.id, userId));
      return by?.name ?? null;
    },

    /** Every soak session of the set with who started it, oldest first. */
    async soakSessions(restorationId: number) {
      return db
        .select({ s: soakSessions, by: users.name })
        .from(soakSessions)
        .leftJoin(users, eq(users.id, soakSessions.startedById))
        .where(eq(soakSessions.restorationId, restorationId))
        .orderBy(asc(soakSessions.startedAt), asc(soakSessions.id));
    },
    /** The set's running soak session, if any. */
    async runningSoak(restorationId: number) {
      const [row] = await db
        .select()
        .from(soakSessions)
        .where(and(eq(soakSessions.restorationId, restorationId), isNull(soakSessions.endedAt)));
      return row;
    },
    async startSoak(restorationId: number, startedById: number) {
      const [row] = await db
        .insert(soakSessions)
        .values({ restorationId, startedById })
        .returning({ id: soakSessions.id });
      return row!;
    },
    async endSoak(id: number, values: Partial<typeof soakSessions.$inferInsert>) {
      await db.update(soakSessions).set(values).where(eq(soakSessions.id, id));
    },
    /** Takes the set's row FOR UPDATE until the transaction ends, so two stops are decided one after the other. */
    async lockSet(restorationId: number) {
      await db.execute(sql`select 1 from ${restorations} where ${restorations.id} = ${restorationId} for update`);
    },
    /** The chosen photo of the set, or its newest when none is chosen. */
    async photoFor(restorationId: number, photoId: number | null | undefined) {
      const [photo] = await db
        .select({ id: photos.id })
        .from(photos)
        .where(and(eq(photos.restorationId, restorationId), photoId ? eq(photos.id, photoId) : undefined))
        .orderBy(desc(photos.createdAt))
        .limit(1);
      return photo;
    },
    async topFindingNumber(restorationId: number): Promise<number> {
      const [top] = await db
        .select({ n: max(findings.number) })
        .from(findings)
        .where(eq(findings.restorationId, restorationId));
      return top?.n ?? 0;
    },
    async insertFinding(values: typeof findings.$inferInsert) {
      const [f] = await db.insert(findings).values(values).returning({ id: findings.id });
      return f!;
    },

    async stage(restorationId: number) {
      const [set] = await db
        .select({ stage: restorations.stage })
        .from(restorations)
        .where(eq(restorations.id, restorationId));
      return set?.stage;
    },
    /** Numbers of the set's findings with a question open to the mentors. */
    async openQuestions(restorationId: number) {
      return db
        .select({ number: findings.number })
        .from(findings)
        .where(and(eq(findings.restorationId, restorationId), eq(findings.questionOpen, true)));
    },
    /** The set's owners, who receive the hand-back report. */
    async owners(restorationId: number) {
      return db
        .select({ email: users.email, name: users.name })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.restorationId, restorationId), eq(memberships.role, 'owner')));
    },
    /** Hand-back reports sent, newest first, with the sender's name. */
    async sends(restorationId: number) {
      return db
        .select({ s: reportSends, by: users.name })
        .from(reportSends)
        .leftJoin(users, eq(users.id, reportSends.sentById))
        .where(eq(reportSends.restorationId, restorationId))
        .orderBy(desc(reportSends.sentAt), desc(reportSends.id));
    },
    async insertSend(values: typeof reportSends.$inferInsert) {
      const [row] = await db.insert(reportSends).values(values).returning();
      return row!;
    },
  };
}
