import type { Role } from '../../../shared/permissions';
import type { Member } from '../../../shared/schemas/members';
import type { Database } from '../../db/client';
import { ConflictError, NotFoundError } from '../../http/errors';
import { membersRepo } from './members.repo';

const lastTechnician = () =>
  new ConflictError('Every restoration needs a technician: make someone else technician first.');

export function membersService(db: Database) {
  const repo = membersRepo(db);

  /** Refuses a change that would leave the restoration without a technician. */
  async function assertNotLastTechnician(restorationId: number, userId: number) {
    if ((await repo.roleOf(userId, restorationId)) === 'technician' && (await repo.technicianCount(restorationId)) <= 1)
      throw lastTechnician();
  }

  return {
    async list(restorationId: number): Promise<Member[]> {
      return (await repo.list(restorationId)).map((m) => ({ ...m, since: m.since.toISOString() }));
    },
    async changeRole(restorationId: number, userId: number, role: Role) {
      if (role !== 'technician') await assertNotLastTechnician(restorationId, userId);
      if (!(await repo.setRole(restorationId, userId, role))) throw new NotFoundError('That person is not a member.');
    },
    async remove(restorationId: number, userId: number) {
      await assertNotLastTechnician(restorationId, userId);
      if (!(await repo.remove(restorationId, userId))) throw new NotFoundError('That person is not a member.');
    },
  };
}
