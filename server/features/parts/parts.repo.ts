import { and, asc, eq, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { findings, parts, photos } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type PartRow = typeof parts.$inferSelect;
export type NewPart = typeof parts.$inferInsert;

/** The parts ledger in PostgreSQL; runs on the pool or on the action's transaction. */
export function partsRepo(db: Executor) {
  return {
    async find(id: number, options: { lock?: boolean } = {}): Promise<PartRow | undefined> {
      const query = db.select().from(parts).where(eq(parts.id, id));
      return (options.lock ? await query.for('update') : await query)[0];
    },
    /** Ledger lines as this role may see them (reference, then id), each with its finding's number and title when the reader may see it. */
    async withFindings(
      restorationId: number,
      role: Role,
      limit?: number,
      after?: { componentRef: string; id: number },
    ) {
      const query = db
        .select({
          part: parts,
          findingVisible: visibleSql(role, 'finding', { finding: columnsOf(findings), photo: columnsOf(photos) }),
          findingNumber: findings.number,
          findingTitle: findings.title,
        })
        .from(parts)
        .leftJoin(findings, eq(findings.id, parts.findingId))
        .leftJoin(photos, eq(photos.id, findings.photoId))
        .where(
          and(
            eq(parts.restorationId, restorationId),
            visibleSql(role, 'part', { part: columnsOf(parts) }),
            after ? sql`(${parts.componentRef}, ${parts.id}) > (${after.componentRef}, ${after.id})` : undefined,
          ),
        )
        .orderBy(asc(parts.componentRef), asc(parts.id));
      const rows = limit ? await query.limit(limit) : await query;
      return rows.map(({ part, findingVisible, findingNumber, findingTitle }) => ({
        row: { ...part, findingId: findingVisible ? part.findingId : null },
        finding: findingVisible && findingNumber !== null ? { number: findingNumber, title: findingTitle ?? '' } : null,
      }));
    },
    async insert(values: NewPart): Promise<PartRow> {
      const [row] = await db.insert(parts).values(values).returning();
      return row!;
    },
    async update(id: number, values: Partial<PartRow>): Promise<PartRow> {
      const [row] = await db.update(parts).set(values).where(eq(parts.id, id)).returning();
      return row!;
    },
    async remove(id: number) {
      await db.delete(parts).where(eq(parts.id, id));
    },
  };
}
