import type { z } from 'zod';
import type { Role } from '../../../shared/permissions';
import type { MismatchNote, mismatchNoteInputSchema, mismatchNotePatchSchema } from '../../../shared/schemas/sheets';
import type { Database } from '../../db/client';
import { NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { recordEvent } from '../events/record-event';
import { mismatchesRepo, type MismatchNoteRow } from './mismatches.repo';

type NoteInput = z.output<typeof mismatchNoteInputSchema>;
type NotePatch = z.output<typeof mismatchNotePatchSchema>;

export const toMismatchNote = (row: MismatchNoteRow): MismatchNote => ({
  id: row.id,
  restorationId: row.restorationId,
  ref: row.ref,
  kind: row.kind,
  diagramSays: row.diagramSays,
  chassisHas: row.chassisHas,
  note: row.note,
  ownerVisible: row.ownerVisible,
  createdAt: row.createdAt.toISOString(),
});

/** Where the chassis differs from the diagram, recorded against a reference of one restoration. */
export function mismatchesService(db: Database) {
  const repo = mismatchesRepo(db);
  /** A note the caller may see (the guard has judged who may change it). */
  async function changeable(id: number, role: Role) {
    if (!(await repo.find(id, role))) throw new NotFoundError();
  }
  return {
    list: async (restorationId: number, role: Role, ref?: string) =>
      (await repo.list(restorationId, role, ref)).map(toMismatchNote),
    /** The note and its history line in one transaction. */
    create: (restorationId: number, input: NoteInput, createdById: number) =>
      db.transaction(async (tx) => {
        const row = await mismatchesRepo(tx).insert({ restorationId, ...input, createdById });
        await recordEvent(tx, {
          restorationId,
          kind: 'mismatch-noted',
          actorId: createdById,
          mismatchNoteId: row.id,
          data: { ref: row.ref },
        });
        return toMismatchNote(row);
      }),
    async update(id: number, patch: NotePatch, role: Role) {
      await changeable(id, role);
      return toMismatchNote((await repo.update(id, patch))!);
    },
    async remove(id: number, role: Role) {
      await changeable(id, role);
      await repo.remove(id);
    },
    /** The note as the guard's subject: who may not see it (the visibility rule, in SQL) gets a 404. */
    async subjectOf(id: number): Promise<RestorationAndRole | undefined> {
      const restorationId = await repo.restorationOf(id);
      return restorationId === undefined
        ? undefined
        : { restorationId, subject: { view: async (role) => Boolean(await repo.find(id, role)) } };
    },
  };
}
