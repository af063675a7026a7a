import { and, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { referenceMarkInputSchema } from '../../../shared/schemas/sheets';
import { type ReferenceMark, type ReferenceSummary } from '../../../shared/schemas/sheets';
import type { z } from 'zod';
import type { Database } from '../../db/client';
import { photos, sheetPages } from '../../db/schema';
import { NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { recordEvent } from '../events/record-event';
import { referencesRepo, type ReferenceMarkRow } from './references.repo';

type MarkInput = z.output<typeof referenceMarkInputSchema>;

const toMark = (row: ReferenceMarkRow): ReferenceMark => ({
  id: row.id,
  restorationId: row.restorationId,
  sheetPageId: row.sheetPageId,
  photoId: row.photoId,
  ref: row.ref,
  shape: row.shape,
  points: row.points,
  createdAt: row.createdAt.toISOString(),
});

export function referencesService(db: Database) {
  const repo = referencesRepo(db);
  return {
    async listMarks(restorationId: number, role: Role, ref?: string): Promise<ReferenceMark[]> {
      return (await repo.listMarks(restorationId, role, ref)).map(toMark);
    },
    summary: (restorationId: number, role: Role): Promise<ReferenceSummary[]> => repo.summary(restorationId, role),
    /**
     * Places a reference on a sheet page or a chassis photo of this restoration. A page or photo of another
     * restoration is not found here: references link within one restoration only.
     */
    async mark(restorationId: number, input: MarkInput, createdById: number): Promise<ReferenceMark> {
      return db.transaction(async (tx) => {
        const [target] =
          input.sheetPageId !== undefined
            ? await tx
                .select({ id: sheetPages.id })
                .from(sheetPages)
                .where(and(eq(sheetPages.id, input.sheetPageId), eq(sheetPages.restorationId, restorationId)))
                .for('share')
            : await tx
                .select({ id: photos.id })
                .from(photos)
                .where(and(eq(photos.id, input.photoId!), eq(photos.restorationId, restorationId)))
                .for('share');
        if (!target)
          throw new NotFoundError(
            input.sheetPageId !== undefined
              ? 'That sheet page is not part of this restoration.'
              : 'That photo is not part of this restoration.',
          );
        const row = await referencesRepo(tx).insertMark({
          restorationId,
          sheetPageId: input.sheetPageId ?? null,
          photoId: input.photoId ?? null,
          ref: input.ref,
          shape: input.shape,
          points: input.points,
          createdById,
        });
        await recordEvent(tx, {
          restorationId,
          kind: 'reference-marked',
          actorId: createdById,
          sheetPageId: row.sheetPageId,
          photoId: row.photoId,
          data: { ref: row.ref },
        });
        return toMark(row);
      });
    },
    /** Removes a mark the caller may see (the guard has judged who may remove it). */
    async remove(id: number, role: Role) {
      if (!(await repo.findMark(id, role))) throw new NotFoundError();
      await db.transaction((tx) => referencesRepo(tx).removeMark(id));
    },
    /** The mark as the guard's subject: who may not see it (the visibility rule, in SQL) gets a 404. */
    async subjectOfMark(id: number): Promise<RestorationAndRole | undefined> {
      const restorationId = await repo.restorationOfMark(id);
      return restorationId === undefined
        ? undefined
        : { restorationId, subject: { view: async (role) => Boolean(await repo.findMark(id, role)) } };
    },
  };
}
