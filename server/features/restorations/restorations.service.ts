import type { z } from 'zod';
import type { Role } from '../../../shared/permissions';
import type { Restoration, restorationInputSchema, restorationPatchSchema } from '../../../shared/schemas/restorations';
import type { Database } from '../../db/client';
import { NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { restorationsRepo, type RestorationRow } from './restorations.repo';
import { stageGates } from './stage-gates';

type CreateInput = z.output<typeof restorationInputSchema>;
type PatchInput = z.output<typeof restorationPatchSchema>;

export function toRestoration(row: RestorationRow, role: Role): Restoration {
  return { ...row, role, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

/** Membership and permission are checked by the route guard before these run. */
export function restorationsService(db: Database) {
  const repo = restorationsRepo(db);
  return {
    async listFor(userId: number, filter: Parameters<typeof repo.listFor>[1]) {
      return (await repo.listFor(userId, filter)).map((r) => toRestoration(r, r.role));
    },
    async get(id: number, role: Role) {
      const row = await repo.find(id);
      if (!row) throw new NotFoundError();
      return toRestoration(row, role);
    },
    async create(input: CreateInput, userId: number) {
      return toRestoration(await repo.insertWithTechnician(input, userId), 'technician');
    },
    async update(id: number, patch: PatchInput, role: Role, actorId: number) {
      const before = await repo.find(id);
      if (!before) throw new NotFoundError();
      if (patch.stage) await stageGates(db, id, before.stage, patch.stage);
      const row = await repo.update(id, patch);
      if (!row) throw new NotFoundError();
      if (patch.stage && patch.stage !== before.stage)
        await recordEvent(db, { restorationId: id, kind: 'stage-changed', actorId, data: { from: before.stage, to: patch.stage } });
      return toRestoration(row, role);
    },
    async remove(id: number) {
      if (!(await repo.remove(id))) throw new NotFoundError();
    },
  };
}
