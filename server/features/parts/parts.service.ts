import { partWarnings } from '../../../shared/bench';
import { compareComponentRefs } from '../../../shared/natural-order';
import { can, type Role } from '../../../shared/permissions';
import type { Part, PartInput } from '../../../shared/schemas/parts';
import type { Database, Executor } from '../../db/client';
import { BadRequestError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { findingsRepo } from '../findings/findings.repo';
import { partsRepo, type PartRow } from './parts.repo';

type Row = PartRow;

/** A ledger line as the caller may see it, with the bench library's warnings on the replacement. */
export function toPart(row: Row, role: Role): Part {
  const warnings = partWarnings({
    original: `${row.originalPart} ${row.originalRating}`,
    replacement: `${row.replacementPart} ${row.replacementRating}`,
    mainsPosition: row.mainsPosition,
  });
  // Costs and notes follow the one policy: costs for technicians only (mentors see no money); owners read the
  // ledger without costs, sources, notes and the bench's warnings.
  const costs = can(role, 'parts.costs');
  const notes = can(role, 'workshop.notes');
  return {
    id: row.id,
    restorationId: row.restorationId,
    findingId: row.findingId,
    componentRef: row.componentRef,
    originalPart: row.originalPart,
    originalRating: row.originalRating,
    replacementPart: row.replacementPart,
    replacementRating: row.replacementRating,
    action: row.action,
    state: row.state,
    mainsPosition: row.mainsPosition,
    quantity: row.quantity,
    costMinor: costs ? row.costMinor : null,
    source: notes ? row.source : '',
    testedAfter: row.testedAfter,
    notes: notes ? row.notes : '',
    fittedAt: row.fittedAt?.toISOString() ?? null,
    // The bench checks on a replacement are the workshop's working notes.
    warnings: notes && (row.action === 'replaced' || row.action === 'restuffed') ? warnings : [],
  };
}

export function partsService(db: Database) {
  async function assertFinding(tx: Executor, restorationId: number, findingId: number | null | undefined) {
    if (!findingId) return;
    if ((await findingsRepo(tx).restorationOf(findingId)) !== restorationId)
      throw new BadRequestError('findingId: no such finding on this restoration.');
  }
  const repo = partsRepo(db);
  const find = (id: number) => repo.find(id);
  const withFindings = repo.withFindings;
  /** One page of the ledger as this role may see it, in its order (reference, then id), after the part `after` names. */
  const page = async (
    restorationId: number,
    role: Role,
    limit?: number,
    after?: { componentRef: string; id: number },
  ): Promise<Row[]> => (await withFindings(restorationId, role, limit, after)).map(({ row }) => row);
  return {
    async restorationOf(id: number) {
      return (await find(id))?.restorationId;
    },
    /** The ledger lines this role may see; a line's finding is named only when the reader may see it. */
    async list(restorationId: number, role: Role): Promise<Row[]> {
      return page(restorationId, role);
    },
    page,
    /** The whole ledger for export, in parts-list order (C2 before C14), each line with the finding it may name. */
    async forExport(restorationId: number, role: Role) {
      const lines = await withFindings(restorationId, role);
      return lines.sort((a, b) => compareComponentRefs(a.row.componentRef, b.row.componentRef) || a.row.id - b.row.id);
    },
    async create(restorationId: number, input: PartInput & { action: Row['action'] }, actorId: number) {
      const fittedAt = input.state === 'fitted' ? new Date() : null;
      // Keeping an original is recorded in the ledger, but nothing was fitted.
      const fitted = fittedAt && input.action !== 'kept-original';
      return db.transaction(async (tx) => {
        await assertFinding(tx, restorationId, input.findingId);
        const row = await partsRepo(tx).insert({
          ...input,
          restorationId,
          findingId: input.findingId ?? null,
          fittedAt,
        });
        if (fitted)
          await recordEvent(tx, {
            restorationId,
            kind: 'part-fitted',
            actorId,
            partId: row.id,
            findingId: row.findingId,
          });
        return row;
      });
    },
    async update(id: number, patch: Partial<Row>, actorId: number) {
      return db.transaction(async (tx) => {
        // Locked, so two edits of one line cannot both see it unfitted and record two fittings.
        const before = await partsRepo(tx).find(id, { lock: true });
        if (!before) throw new NotFoundError();
        if (patch.findingId !== undefined) await assertFinding(tx, before.restorationId, patch.findingId);
        const becameFitted = patch.state === 'fitted' && before.state !== 'fitted';
        const values = {
          ...patch,
          ...(becameFitted
            ? { fittedAt: new Date() }
            : patch.state && patch.state !== 'fitted'
              ? { fittedAt: null }
              : {}),
        };
        const row = await partsRepo(tx).update(id, values);
        if (becameFitted && row.action !== 'kept-original')
          await recordEvent(tx, {
            restorationId: before.restorationId,
            kind: 'part-fitted',
            actorId,
            partId: id,
            findingId: row.findingId,
          });
        return row;
      });
    },
    remove: (id: number) => repo.remove(id),
  };
}
