import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { can, type Role } from '../../../shared/permissions';
import type { SymptomCheck } from '../../../shared/schemas/symptom-checks';
import type { Executor } from '../../db/client';
import { findings, measurements, photos, symptomChecks, users } from '../../db/schema';
import { readingSummary } from '../measurements/reading-summary';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

/**
 * The checklist's results on one restoration, as `role` may see them: each check by the one rule, its reading
 * and finding by theirs (a link's reader, judged as an owner, sees neither unless shared), its note only in the workshop.
 */
export async function listSymptomChecks(
  db: Executor,
  restorationId: number,
  role: Role,
  symptomIds?: string[],
): Promise<SymptomCheck[]> {
  const readingVisible = visibleSql(role, 'reading', { reading: columnsOf(measurements) });
  const findingVisible = visibleSql(role, 'finding', { finding: columnsOf(findings), photo: columnsOf(photos) });
  const rows = await db
    .select({
      c: symptomChecks,
      checkedBy: users.name,
      m: measurements,
      readingVisible,
      f: { id: findings.id, photoId: findings.photoId, number: findings.number },
      findingVisible,
    })
    .from(symptomChecks)
    .leftJoin(users, eq(users.id, symptomChecks.checkedById))
    .leftJoin(measurements, eq(measurements.id, symptomChecks.measurementId))
    .leftJoin(findings, eq(findings.id, symptomChecks.findingId))
    .leftJoin(photos, eq(photos.id, findings.photoId))
    .where(
      and(
        eq(symptomChecks.restorationId, restorationId),
        symptomIds ? (symptomIds.length ? inArray(symptomChecks.symptomId, symptomIds) : sql`false`) : undefined,
        visibleSql(role, 'symptomCheck', {}),
      ),
    )
    .orderBy(asc(symptomChecks.symptomId), asc(symptomChecks.id));
  const workshop = can(role, 'workshop.notes');
  return rows.map(({ c, checkedBy, m, readingVisible: seesReading, f, findingVisible: seesFinding }) => ({
    symptomId: c.symptomId,
    causeId: c.causeId,
    result: c.result,
    note: workshop ? c.note : '',
    reading: m && seesReading ? readingSummary(m) : null,
    finding: f?.id && seesFinding ? { id: f.id, photoId: f.photoId, number: f.number } : null,
    checkedBy: workshop ? checkedBy : null,
    updatedAt: c.updatedAt.toISOString(),
  }));
}

export function symptomChecksRepo(db: Executor) {
  return {
    /** The current check of one cause, locked so two answers for it are applied one after the other. */
    async lock(restorationId: number, symptomId: string, causeId: string) {
      const [row] = await db
        .select()
        .from(symptomChecks)
        .where(
          and(
            eq(symptomChecks.restorationId, restorationId),
            eq(symptomChecks.symptomId, symptomId),
            eq(symptomChecks.causeId, causeId),
          ),
        )
        .for('update');
      return row;
    },
    async upsert(values: typeof symptomChecks.$inferInsert) {
      const [row] = await db
        .insert(symptomChecks)
        .values(values)
        .onConflictDoUpdate({
          target: [symptomChecks.restorationId, symptomChecks.symptomId, symptomChecks.causeId],
          set: {
            result: values.result,
            note: values.note,
            measurementId: values.measurementId,
            findingId: values.findingId,
            checkedById: values.checkedById,
            updatedAt: new Date(),
          },
        })
        .returning();
      return row!;
    },
    /** Symptoms with at least one checked cause, for pre-filling a help request. */
    async symptomsChecked(restorationId: number) {
      return (
        await db
          .selectDistinct({ id: symptomChecks.symptomId })
          .from(symptomChecks)
          .where(eq(symptomChecks.restorationId, restorationId))
      ).map((r) => r.id);
    },
  };
}
