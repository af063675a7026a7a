import { roleLabels, roles, type Role } from '../../../../shared/permissions';
import type { Member } from '../../../../shared/schemas/members';
import { useConfirm } from '../../../components/use-confirm';
import { useChangeRole, useRemoveMember } from '../api/manage-members';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

export function MembersList({
  restorationId,
  members,
  canManage,
  meId,
}: {
  restorationId: number;
  members: Member[];
  canManage: boolean;
  meId?: number;
}) {
  const changeRole = useChangeRole(restorationId);
  const remove = useRemoveMember(restorationId);
  const error = changeRole.error ?? remove.error;
  const { confirm, dialog } = useConfirm();
  return (
    <div>
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {members.map((m) => (
          <li key={m.userId} className="flex flex-wrap items-center gap-3 px-4 py-3">
            <div className="min-w-0 flex-1">
              <p className="font-semibold">
                {m.name} {m.userId === meId && <span className="text-sm font-normal text-ink-soft">(you)</span>}
              </p>
              <p className="truncate text-sm text-ink-soft">{m.email}</p>
            </div>
            {canManage ? (
              <>
                <label className="sr-only" htmlFor={`role-${m.userId}`}>
                  Role of {m.name}
                </label>
                <select
                  id={`role-${m.userId}`}
                  value={m.role}
                  disabled={changeRole.isPending}
                  onChange={(e) => changeRole.mutate({ userId: m.userId, role: e.target.value as Role })}
                  className="min-h-11 rounded-lg border border-rule bg-panel px-2"
                >
                  <LabelledOptions values={roles} labels={roleLabels} />
                </select>
                <button
                  type="button"
                  className="min-h-11 rounded-lg px-3 text-sm text-danger hover:bg-danger-soft"
                  disabled={remove.isPending}
                  onClick={() =>
                    void confirm({
                      title: `Remove ${m.name} from this restoration?`,
                      consequence: `${m.name} can no longer open this restoration or its photos, findings and report. Their findings and comments stay.`,
                      confirmLabel: 'Remove member',
                      danger: true,
                    }).then((yes) => yes && remove.mutate(m.userId))
                  }
                >
                  Remove
                </button>
              </>
            ) : (
              <span className="rounded-full bg-sunken px-3 py-1 text-sm font-semibold">{roleLabels[m.role]}</span>
            )}
          </li>
        ))}
      </ul>
      <FormAlert small className="mt-2" message={error?.message} />
      {dialog}
    </div>
  );
}
