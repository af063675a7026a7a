import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { roleLabels, roles } from '../../../../shared/permissions';
import { invitationInputSchema, type InvitationInput } from '../../../../shared/schemas/members';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useInvite } from '../api/manage-members';
import { FormAlert } from '../../../components/form-alert';

const roleHints = {
  technician: 'does the work; full access',
  mentor: 'advises remotely; sees everything, comments anywhere',
  owner: "the set's owner; sees what is shared with them",
};

export function InviteForm({ restorationId }: { restorationId: number }) {
  const invite = useInvite(restorationId);
  const { register, handleSubmit, reset, formState } = useForm<InvitationInput>({
    resolver: zodResolver(invitationInputSchema),
    defaultValues: { email: '', role: 'mentor' },
  });
  return (
    <form
      noValidate
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      onSubmit={handleSubmit((v) => invite.mutate(v, { onSuccess: () => reset({ email: '', role: v.role }) }))}
    >
      <h3 className="font-bold">Invite someone</h3>
      <div className="grid gap-3 sm:grid-cols-[1fr_14rem]">
        <Field label="E-mail" error={formState.errors.email?.message}>
          {(a) => (
            <input {...a} {...register('email')} type="email" className={inputClass} placeholder="name@example.org" />
          )}
        </Field>
        <Field label="Role" error={formState.errors.role?.message}>
          {(a) => (
            <select {...a} {...register('role')} className={inputClass}>
              {roles.map((r) => (
                <option key={r} value={r}>
                  {roleLabels[r]} — {roleHints[r]}
                </option>
              ))}
            </select>
          )}
        </Field>
      </div>
      <FormAlert small className="mt-2" message={invite.error?.message} />
      {invite.isSuccess && (
        <p role="status" className="text-sm">
          Invitation sent. The link works once, for seven days.
        </p>
      )}
      <button type="submit" className={buttonClass('primary')} disabled={invite.isPending}>
        {invite.isPending ? 'Sending…' : 'Send invitation'}
      </button>
    </form>
  );
}
