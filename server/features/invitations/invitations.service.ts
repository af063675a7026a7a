import type { Role } from '../../../shared/permissions';
import type { Invitation, InvitationPreview } from '../../../shared/schemas/members';
import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { sendOrRollBack } from '../../mail';
import { ConflictError, ForbiddenError, HttpError, NotFoundError } from '../../http/errors';
import { usersRepo } from '../auth/users.repo';
import { membersRepo } from '../members/members.repo';
import { restorationsRepo } from '../restorations/restorations.repo';
import { invitationMail } from './invitations.mail';
import { invitationsRepo } from './invitations.repo';

const gone = () =>
  new HttpError(410, 'gone', 'This invitation has expired, was revoked or was already used. Ask for a new one.');
const sameEmail = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

export function invitationsService({ db, mailer, config }: AppDeps) {
  const repo = invitationsRepo(db);
  const members = membersRepo(db);
  const users = usersRepo(db);

  /** The invitation e-mail, sent inside the invitation's transaction: no mail, no invitation (503). */
  async function send(tx: Executor, restorationId: number, to: string, role: Role, inviterId: number, token: string) {
    const [set, inviter] = await Promise.all([restorationsRepo(tx).find(restorationId), usersRepo(tx).byId(inviterId)]);
    await sendOrRollBack(
      mailer,
      invitationMail({
        to,
        inviter: inviter?.name ?? 'A technician',
        set: `${set?.make} ${set?.model}`,
        role,
        link: `${config.publicOrigin}/invitations/${token}`,
      }),
    );
  }

  /** Spends the link and joins the account on the caller's transaction: if joining fails, the link still works. */
  async function acceptIn(tx: Executor, token: string, user: { id: number; email: string }) {
    const inTx = invitationsRepo(tx);
    const found = await inTx.findPendingByToken(token);
    if (!found) throw gone();
    const { invitation } = found;
    if (!sameEmail(invitation.email, user.email))
      throw new ForbiddenError(
        `This invitation was sent to another address. Sign in with the account for ${invitation.email}.`,
      );
    if (!(await inTx.markAccepted(invitation.id, user.id))) throw gone();
    await membersRepo(tx).add(invitation.restorationId, user.id, invitation.role);
    return { restorationId: invitation.restorationId, role: invitation.role };
  }

  return {
    async listPending(restorationId: number): Promise<Invitation[]> {
      return (await repo.listPending(restorationId)).map((i) => ({
        ...i,
        expiresAt: i.expiresAt.toISOString(),
        createdAt: i.createdAt.toISOString(),
      }));
    },
    async invite(restorationId: number, email: string, role: Role, inviterId: number) {
      const existing = await users.byEmail(email);
      if (existing && (await members.roleOf(existing.id, restorationId)))
        throw new ConflictError(`${email} is already a member of this restoration.`);
      return db.transaction(async (tx) => {
        const { invitation, token } = await invitationsRepo(tx).issue(restorationId, email, role, inviterId);
        await send(tx, restorationId, email, role, inviterId, token);
        return invitation;
      });
    },
    /** Invites on the caller's transaction (an intake that records the owner): the e-mail is its last step. */
    async inviteIn(tx: Executor, restorationId: number, email: string, role: Role, inviterId: number) {
      const { invitation, token } = await invitationsRepo(tx).issue(restorationId, email, role, inviterId);
      await send(tx, restorationId, email, role, inviterId, token);
      return invitation;
    },
    async resend(restorationId: number, id: number, senderId: number) {
      // If the mail cannot go, the renewal rolls back and the link already sent keeps working.
      await db.transaction(async (tx) => {
        const renewed = await invitationsRepo(tx).renew(restorationId, id);
        if (!renewed) throw new NotFoundError('No pending invitation with that id.');
        await send(tx, restorationId, renewed.invitation.email, renewed.invitation.role, senderId, renewed.token);
      });
    },
    async revoke(restorationId: number, id: number) {
      if (!(await repo.revoke(restorationId, id))) throw new NotFoundError('No pending invitation with that id.');
    },
    async preview(token: string): Promise<InvitationPreview> {
      const found = await repo.findPendingByToken(token);
      if (!found) throw gone();
      const { invitation: i } = found;
      return {
        restoration: { id: i.restorationId, make: found.make, model: found.model },
        email: i.email,
        role: i.role,
        invitedBy: found.invitedBy,
      };
    },
    /** Joins the signed-in account with the invited role; only the invited address may accept. */
    async accept(token: string, user: { id: number; email: string }) {
      return db.transaction((tx) => acceptIn(tx, token, user));
    },
    acceptIn,
    /** For sign-up from an invitation link: the address must be the invited one. */
    async assertInvitedAddress(token: string, email: string) {
      const found = await repo.findPendingByToken(token);
      if (!found) throw gone();
      if (!sameEmail(found.invitation.email, email))
        throw new ForbiddenError(`This invitation was sent to ${found.invitation.email}; sign up with that address.`);
    },
  };
}
