import type { Restoration } from '../../../shared/schemas/restorations';
import type { restorationInputSchema, restorationPatchSchema } from '../../../shared/schemas/restorations';
import type { z } from 'zod';
import { NotFoundError } from '../../http/errors';
import type { Database } from '../../db/client';
import { restorationsRepo, type RestorationRow } from './restorations.repo';

type CreateInput = z.output<typeof restorationInputSchema>;
type PatchInput = z.output<typeof restorationPatchSchema>;

export function toRestoration(row: RestorationRow): Restoration {
  return { ...row, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

export function restorationsService(db: Database) {
  const repo = restorationsRepo(db);
  return {
    async list(filter: Parameters<typeof repo.list>[0]) {
      return (await repo.list(filter)).map(toRestoration);
    },
    async get(id: number) {
      const row = await repo.find(id);
      if (!row) throw new NotFoundError('No such restoration.');
      return toRestoration(row);
    },
    async create(input: CreateInput) {
      return toRestoration(await repo.insert(input));
    },
    async update(id: number, patch: PatchInput) {
      const row = await repo.update(id, patch);
      if (!row) throw new NotFoundError('No such restoration.');
      return toRestoration(row);
    },
    async remove(id: number) {
      if (!(await repo.remove(id))) throw new NotFoundError('No such restoration.');
    },
  };
}
