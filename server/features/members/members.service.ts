import type { Role } from '../../../shared/permissions';
import type { Member } from '../../../shared/schemas/members';
import type { Database, Executor } from '../../db/client';
import type { PageWindow } from '../../db/keyset';
import { ConflictError, NotFoundError } from '../../http/errors';
import { membersRepo } from './members.repo';

const lastTechnician = () =>
  new ConflictError('Every restoration needs a technician: make someone else technician first.');

export function membersService(db: Database) {
  const repo = membersRepo(db);

  /**
   * Refuses a change that would leave the restoration without a technician. Runs inside the change's
   * transaction and locks the restoration's memberships first, so two demotions at once are decided one
   * after the other and the second sees the first.
   */
  async function assertNotLastTechnician(tx: Executor, restorationId: number, userId: number) {
    const rows = await membersRepo(tx).lockAll(restorationId);
    const technicians = rows.filter((m) => m.role === 'technician');
    if (technicians.some((m) => m.userId === userId) && technicians.length <= 1) throw lastTechnician();
  }

  return {
    /** The members, all of them or one page (`window`: `limit + 1` read, for the page helper to cut). */
    async list(restorationId: number, window?: PageWindow): Promise<Member[]> {
      return (await repo.list(restorationId, window)).map((m) => ({ ...m, since: m.since.toISOString() }));
    },
    async changeRole(restorationId: number, userId: number, role: Role) {
      await db.transaction(async (tx) => {
        if (role !== 'technician') await assertNotLastTechnician(tx, restorationId, userId);
        if (!(await membersRepo(tx).setRole(restorationId, userId, role)))
          throw new NotFoundError('That person is not a member.');
      });
    },
    async remove(restorationId: number, userId: number) {
      await db.transaction(async (tx) => {
        await assertNotLastTechnician(tx, restorationId, userId);
        if (!(await membersRepo(tx).remove(restorationId, userId)))
          throw new NotFoundError('That person is not a member.');
      });
    },
  };
}
