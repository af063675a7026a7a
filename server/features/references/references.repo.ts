import { and, asc, eq, sql, type SQL, type SQLWrapper } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { findings, measurements, parts, photos, referenceMarks, sheetPages } from '../../db/schema';
import { columnsOf, findingFields, visibleSql } from '../visibility/visibility-sql';

export type ReferenceMarkRow = typeof referenceMarks.$inferSelect;

/** The reference a typed text names: its first word, upper-cased, when it reads like R23, VR2 or S1a ("V5 pin 3" → V5). */
const refOf = (column: SQLWrapper): SQL =>
  sql`nullif(substring(upper(btrim(${column})) from '^([A-Z]{1,4}[0-9]{1,5}[A-Z]?)(\\s|$)'), '')`;

export function referencesRepo(db: Executor) {
  const markVisible = (role: Role) =>
    visibleSql(role, 'referenceMark', { sheetPage: columnsOf(sheetPages), photo: columnsOf(photos) });
  const marks = () =>
    db
      .select({ mark: referenceMarks })
      .from(referenceMarks)
      .leftJoin(sheetPages, eq(sheetPages.id, referenceMarks.sheetPageId))
      .leftJoin(photos, eq(photos.id, referenceMarks.photoId));
  return {
    /** The restoration's reference marks this role may see (those on pages and photos they may see). */
    async listMarks(restorationId: number, role: Role, ref?: string): Promise<ReferenceMarkRow[]> {
      const rows = await marks()
        .where(
          and(
            eq(referenceMarks.restorationId, restorationId),
            markVisible(role),
            ref ? eq(referenceMarks.ref, ref) : undefined,
          ),
        )
        .orderBy(asc(referenceMarks.ref), asc(referenceMarks.id));
      return rows.map((r) => r.mark);
    },
    async findMark(id: number, role: Role): Promise<ReferenceMarkRow | undefined> {
      const [row] = await marks().where(and(eq(referenceMarks.id, id), markVisible(role)));
      return row?.mark;
    },
    async restorationOfMark(id: number): Promise<number | undefined> {
      const [row] = await db
        .select({ restorationId: referenceMarks.restorationId })
        .from(referenceMarks)
        .where(eq(referenceMarks.id, id));
      return row?.restorationId;
    },
    async insertMark(values: typeof referenceMarks.$inferInsert) {
      const [row] = await db.insert(referenceMarks).values(values).returning();
      return row!;
    },
    async removeMark(id: number) {
      await db.delete(referenceMarks).where(eq(referenceMarks.id, id));
    },
    /**
     * Every reference known in one restoration with how often it appears, each count filtered by the one
     * visibility rule: diagram and chassis marks, findings, ledger rows and readings.
     */
    async summary(restorationId: number, role: Role) {
      const r = restorationId;
      const markRef = sql`${referenceMarks.ref}`;
      const result = await db.execute<{
        ref: string;
        diagramMarks: number;
        chassisMarks: number;
        findings: number;
        parts: number;
        readings: number;
      }>(sql`
        with known as (
          select ${markRef} as ref, (${referenceMarks.sheetPageId} is not null)::int as diagram, (${referenceMarks.photoId} is not null)::int as chassis, 0 as finding, 0 as part, 0 as reading
            from ${referenceMarks} left join ${sheetPages} on ${sheetPages.id} = ${referenceMarks.sheetPageId} left join ${photos} on ${photos.id} = ${referenceMarks.photoId}
            where ${referenceMarks.restorationId} = ${r} and ${markVisible(role)}
          union all
          select ${refOf(findings.componentRef)}, 0, 0, 1, 0, 0 from ${findings} join ${photos} on ${photos.id} = ${findings.photoId}
            where ${findings.restorationId} = ${r} and ${visibleSql(role, 'finding', { finding: findingFields(), photo: columnsOf(photos) })}
          union all
          select ${refOf(parts.componentRef)}, 0, 0, 0, 1, 0 from ${parts}
            where ${parts.restorationId} = ${r} and ${visibleSql(role, 'part', { part: columnsOf(parts) })}
          union all
          select ${refOf(measurements.location)}, 0, 0, 0, 0, 1 from ${measurements}
            where ${measurements.restorationId} = ${r} and ${visibleSql(role, 'reading', { reading: columnsOf(measurements) })}
        )
        select ref, sum(diagram)::int as "diagramMarks", sum(chassis)::int as "chassisMarks", sum(finding)::int as findings,
               sum(part)::int as parts, sum(reading)::int as readings
          from known where ref is not null group by ref
          order by substring(ref from '^[A-Z]+'), substring(ref from '[0-9]+')::int, ref`);
      return result.rows;
    },
  };
}
