import { and, asc, eq, sql } from 'drizzle-orm';
import { partWarnings } from '../../../shared/bench';
import type { Role } from '../../../shared/permissions';
import type { Part, PartInput } from '../../../shared/schemas/parts';
import type { Database } from '../../db/client';
import { findings, parts } from '../../db/schema';
import { BadRequestError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';

type Row = typeof parts.$inferSelect;

/** A ledger line as the caller may see it, with the bench library's warnings on the replacement. */
export function toPart(row: Row, role: Role): Part {
  const warnings = partWarnings({ original: `${row.originalPart} ${row.originalRating}`, replacement: `${row.replacementPart} ${row.replacementRating}`, mainsPosition: row.mainsPosition });
  const owner = role === 'owner';
  return {
    id: row.id, restorationId: row.restorationId, findingId: row.findingId, componentRef: row.componentRef,
    originalPart: row.originalPart, originalRating: row.originalRating, replacementPart: row.replacementPart,
    replacementRating: row.replacementRating, action: row.action, state: row.state, mainsPosition: row.mainsPosition,
    quantity: row.quantity, costMinor: owner ? null : row.costMinor, source: owner ? '' : row.source, testedAfter: row.testedAfter,
    notes: owner ? '' : row.notes, fittedAt: row.fittedAt?.toISOString() ?? null, warnings: row.action === 'replaced' || row.action === 'restuffed' ? warnings : [],
  };
}

export function partsService(db: Database) {
  async function assertFinding(restorationId: number, findingId: number | null | undefined) {
    if (!findingId) return;
    const [f] = await db.select({ id: findings.id }).from(findings).where(and(eq(findings.id, findingId), eq(findings.restorationId, restorationId)));
    if (!f) throw new BadRequestError('findingId: no such finding on this restoration.');
  }
  const find = async (id: number) => (await db.select().from(parts).where(eq(parts.id, id)))[0];
  return {
    async restorationOf(id: number) {
      return (await find(id))?.restorationId;
    },
    async list(restorationId: number) {
      return db.select().from(parts).where(eq(parts.restorationId, restorationId)).orderBy(asc(parts.componentRef), asc(parts.id));
    },
    /** One page of the ledger in its order (reference, then id), after the part `after` names. */
    async page(restorationId: number, limit: number, after?: { componentRef: string; id: number }) {
      return db.select().from(parts)
        .where(and(eq(parts.restorationId, restorationId), after ? sql`(${parts.componentRef}, ${parts.id}) > (${after.componentRef}, ${after.id})` : undefined))
        .orderBy(asc(parts.componentRef), asc(parts.id))
        .limit(limit);
    },
    async create(restorationId: number, input: PartInput & { action: Row['action'] }, actorId: number) {
      await assertFinding(restorationId, input.findingId);
      const fittedAt = input.state === 'fitted' ? new Date() : null;
      // Keeping an original is recorded in the ledger, but nothing was fitted.
      const fitted = fittedAt && input.action !== 'kept-original';
      const [row] = await db.insert(parts).values({ ...input, restorationId, findingId: input.findingId ?? null, fittedAt }).returning();
      if (fitted) await recordEvent(db, { restorationId, kind: 'part-fitted', actorId, partId: row!.id, findingId: row!.findingId });
      return row!;
    },
    async update(id: number, patch: Partial<Row>, actorId: number) {
      const before = await find(id);
      if (!before) throw new NotFoundError();
      if (patch.findingId !== undefined) await assertFinding(before.restorationId, patch.findingId);
      const becameFitted = patch.state === 'fitted' && before.state !== 'fitted';
      const values = { ...patch, ...(becameFitted ? { fittedAt: new Date() } : patch.state && patch.state !== 'fitted' ? { fittedAt: null } : {}) };
      const [row] = await db.update(parts).set(values).where(eq(parts.id, id)).returning();
      if (becameFitted && row!.action !== 'kept-original') await recordEvent(db, { restorationId: before.restorationId, kind: 'part-fitted', actorId, partId: id, findingId: row!.findingId });
      return row!;
    },
    async remove(id: number) {
      await db.delete(parts).where(eq(parts.id, id));
    },
  };
}
