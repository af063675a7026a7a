import { roleLabels } from '../../../../shared/permissions';
import type { Invitation } from '../../../../shared/schemas/members';
import { useResendInvitation, useRevokeInvitation } from '../api/manage-members';
import { formatMediumDate } from '../../../lib/format';
import { FormAlert } from '../../../components/form-alert';

export function InvitationsList({ restorationId, invitations }: { restorationId: number; invitations: Invitation[] }) {
  const resend = useResendInvitation(restorationId);
  const revoke = useRevokeInvitation(restorationId);
  if (!invitations.length) return <p className="text-ink-soft">No invitations waiting.</p>;
  return (
    <div>
      <ul className="divide-y divide-rule rounded-xl border border-dashed border-rule bg-panel">
        {invitations.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center gap-3 px-4 py-3">
            <div className="min-w-0 flex-1">
              <p className="truncate font-semibold">{i.email}</p>
              <p className="text-sm text-ink-soft">
                {roleLabels[i.role]} · expires {formatMediumDate(i.expiresAt)}
              </p>
            </div>
            <button
              type="button"
              className="min-h-11 rounded-lg px-3 text-sm hover:bg-sunken"
              disabled={resend.isPending}
              onClick={() => resend.mutate(i.id)}
            >
              Resend
            </button>
            <button
              type="button"
              className="min-h-11 rounded-lg px-3 text-sm text-danger hover:bg-danger-soft"
              disabled={revoke.isPending}
              onClick={() => revoke.mutate(i.id)}
            >
              Revoke
            </button>
          </li>
        ))}
      </ul>
      {resend.isSuccess && (
        <p role="status" className="mt-2 text-sm">
          Sent again with a new link.
        </p>
      )}
      <FormAlert small className="mt-2" message={(resend.error ?? revoke.error)?.message} />
    </div>
  );
}
