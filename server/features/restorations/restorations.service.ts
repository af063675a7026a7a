import type { z } from 'zod';
import type { Role } from '../../../shared/permissions';
import type { Restoration, restorationInputSchema, restorationPatchSchema } from '../../../shared/schemas/restorations';
import { count, eq } from 'drizzle-orm';
import type { Database, Tx } from '../../db/client';
import { invoices, sheets } from '../../db/schema';
import { ConflictError, NotFoundError } from '../../http/errors';
import { unitOfWork } from '../../db/unit-of-work';
import { recordEvent } from '../events/record-event';
import { lockRestoration } from './lock-restoration';
import { restorationsRepo, type RestorationRow } from './restorations.repo';
import { stageGates } from './stage-gates';

type CreateInput = z.output<typeof restorationInputSchema>;
type PatchInput = z.output<typeof restorationPatchSchema>;

export function toRestoration(row: RestorationRow, role: Role): Restoration {
  return { ...row, role, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

/** Membership and permission are checked by the route guard before these run. */
/** Sends an invitation on the caller's transaction (the invitations service's `inviteIn`). */
type InviteIn = (tx: Tx, restorationId: number, email: string, role: Role, inviterId: number) => Promise<unknown>;

/** Deletes the objects a removed restoration leaves behind (service sheets), once its rows are gone. */
type RemoveObjects = (storageKeys: string[]) => Promise<void>;

export function restorationsService(db: Database, invite?: InviteIn, removeObjects?: RemoveObjects) {
  const repo = restorationsRepo(db);
  return {
    /** One page of the bench (`limit + 1` rows read, for the page helper to cut). */
    async pageFor(
      userId: number,
      filter: Parameters<typeof repo.listFor>[1],
      window: Parameters<typeof repo.listFor>[2],
    ) {
      return repo.listFor(userId, filter, window);
    },
    async get(id: number, role: Role) {
      const row = await repo.find(id);
      if (!row) throw new NotFoundError();
      return toRestoration(row, role);
    },
    async create(input: CreateInput, userId: number) {
      // The stage gates would otherwise be skipped by a set created past them.
      if (input.stage === 'returned')
        throw new ConflictError(
          'A new restoration cannot start at Returned: create it at an earlier stage and record its final safety test.',
        );
      if (input.stage === 'testing')
        throw new ConflictError(
          'A new restoration cannot start at Testing: create it at an earlier stage and sign off its pre-power checklist on the Bring-up tab first.',
        );
      const { inviteOwner, ...values } = input;
      // The set, its technician and the owner's invitation (with its e-mail, sent last) commit together or not at all.
      const row = await db.transaction(async (tx) => {
        const created = await restorationsRepo(tx).insertWithTechnician(values, userId);
        if (inviteOwner && created.ownerEmail) {
          if (!invite) throw new Error('restorationsService: no invitations service to invite the owner with');
          await invite(tx, created.id, created.ownerEmail, 'owner', userId);
        }
        return created;
      });
      return toRestoration(row, 'technician');
    },
    async update(id: number, patch: PatchInput, role: Role, actorId: number) {
      // The restoration row is locked first, so the recorded "from" stage is the one this change replaced,
      // and the stage gates judge the state this change commits on.
      const row = await db.transaction(async (tx) => {
        const inTx = restorationsRepo(tx);
        const before = await inTx.find(id, { lock: true });
        if (!before) throw new NotFoundError();
        if (patch.stage) await stageGates(tx, id, before.stage, patch.stage);
        const updated = (await inTx.update(id, patch))!;
        if (patch.stage && patch.stage !== before.stage)
          await recordEvent(tx, {
            restorationId: id,
            kind: 'stage-changed',
            actorId,
            data: { from: before.stage, to: patch.stage },
          });
        return updated;
      });
      return toRestoration(row, role);
    },
    /**
     * Deletes a set and everything on it, except that issued invoices, deposit requests and credit notes are the
     * workshop's accounting record: a set with any is refused (the lock makes a concurrent issue wait or see it gone).
     * The rows go in one transaction; the sheets' objects only after it has committed.
     */
    async remove(id: number) {
      await unitOfWork(db, async (tx, afterCommit) => {
        await lockRestoration(tx, id);
        const [issued] = await tx.select({ n: count() }).from(invoices).where(eq(invoices.restorationId, id));
        if (issued!.n > 0)
          throw new ConflictError(
            `This set has ${issued!.n === 1 ? 'an issued invoice' : `${issued!.n} issued invoices`} (deposit requests and credit notes count), which are kept for the workshop's accounts, so it cannot be deleted. Set its stage to Returned instead.`,
            { invoices: issued!.n },
          );
        const keys = (
          await tx.select({ key: sheets.storageKey }).from(sheets).where(eq(sheets.restorationId, id)).for('update')
        ).map((s) => s.key);
        if (!(await restorationsRepo(tx).remove(id))) throw new NotFoundError();
        if (keys.length && removeObjects) afterCommit(() => removeObjects(keys));
      });
    },
  };
}
