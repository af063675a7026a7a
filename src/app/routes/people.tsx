import { can } from '../../../shared/permissions';
import { ErrorState, Loading } from '../../components/states';
import { useMe } from '../../features/auth/api/get-me';
import { useInvitations } from '../../features/members/api/get-invitations';
import { useMembers } from '../../features/members/api/get-members';
import { InvitationsList } from '../../features/members/components/invitations-list';
import { InviteForm } from '../../features/members/components/invite-form';
import { MembersList } from '../../features/members/components/members-list';
import { useRestorationContext } from '../restoration-context';

export function PeopleRoute() {
  const r = useRestorationContext();
  const me = useMe();
  const canManage = can(r.role, 'members.manage');
  const members = useMembers(r.id);
  const invitations = useInvitations(r.id, canManage);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <section className="space-y-3" aria-labelledby="members-heading">
        <h2 id="members-heading" className="text-lg font-bold">
          Members
        </h2>
        {members.isPending ? (
          <Loading label="Fetching members…" />
        ) : members.isError ? (
          <ErrorState error={members.error} onRetry={() => members.refetch()} />
        ) : (
          <MembersList restorationId={r.id} members={members.data} canManage={canManage} meId={me.data?.id} />
        )}
      </section>
      {canManage && (
        <section className="space-y-3" aria-labelledby="invitations-heading">
          <InviteForm restorationId={r.id} />
          <h2 id="invitations-heading" className="text-lg font-bold">
            Waiting to join
          </h2>
          {invitations.isPending ? (
            <Loading label="Fetching invitations…" />
          ) : invitations.isError ? (
            <ErrorState error={invitations.error} />
          ) : (
            <InvitationsList restorationId={r.id} invitations={invitations.data} />
          )}
        </section>
      )}
    </div>
  );
}
