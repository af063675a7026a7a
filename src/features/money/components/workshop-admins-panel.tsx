import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { addWorkshopAdminSchema, type WorkshopAdmins } from '../../../../shared/schemas/workshop';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { FormAlert } from '../../../components/form-alert';
import { useConfirm } from '../../../components/use-confirm';
import { useAddWorkshopAdmin, useRemoveWorkshopAdmin } from '../api/workshop-admins';

type AddValues = z.infer<typeof addWorkshopAdminSchema>;

/**
 * Who changes the workshop's settings. Everyone who reads the settings sees their names; an administrator also sees
 * their addresses, names another by the address of a confirmed account, and takes the role back from one.
 */
export function WorkshopAdminsPanel({ admins }: { admins: WorkshopAdmins }) {
  const add = useAddWorkshopAdmin();
  const remove = useRemoveWorkshopAdmin();
  const { confirm, dialog } = useConfirm();
  const { register, handleSubmit, reset, formState } = useForm<AddValues>({
    resolver: zodResolver(addWorkshopAdminSchema),
    defaultValues: { email: '' },
  });
  const mayRemove = admins.youAreAdmin && admins.admins.length > 1;
  return (
    <section aria-labelledby="workshop-admins" className="space-y-3 rounded-xl border border-rule bg-panel p-4">
      <h2 id="workshop-admins" className="font-bold">
        Administrators
      </h2>
      <p className="text-sm text-ink-soft">
        They change these settings and name the other administrators. Taking in a set makes someone its technician, not
        an administrator.
      </p>
      <ul className="divide-y divide-rule">
        {admins.admins.map((a) => (
          <li key={a.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <span className="font-semibold">{a.name}</span>
              {a.email && <span className="text-ink-soft"> · {a.email}</span>}
            </span>
            {mayRemove && (
              <button
                type="button"
                className={buttonClass('quiet')}
                disabled={remove.isPending}
                onClick={async () => {
                  const yes = await confirm({
                    title: `Remove ${a.name} as an administrator?`,
                    consequence: 'They keep their sets and roles, but no longer change the workshop’s settings.',
                    confirmLabel: 'Remove',
                  });
                  if (yes) remove.mutate(a.id);
                }}
              >
                Remove {a.name}
              </button>
            )}
          </li>
        ))}
      </ul>
      <FormAlert small message={remove.error?.message} />
      {admins.youAreAdmin && (
        <form
          noValidate
          aria-label="Add an administrator"
          className="space-y-2"
          onSubmit={handleSubmit((v) => add.mutate(v.email, { onSuccess: () => reset({ email: '' }) }))}
        >
          <Field
            label="Add an administrator by e-mail"
            hint="The address of someone with a confirmed account"
            error={formState.errors.email?.message}
          >
            {(f) => (
              <input {...f} {...register('email')} type="email" className={inputClass} placeholder="name@example.org" />
            )}
          </Field>
          <FormAlert small message={add.error?.message} />
          <button type="submit" className={buttonClass('primary')} disabled={add.isPending}>
            {add.isPending ? 'Adding…' : 'Add'}
          </button>
        </form>
      )}
      {dialog}
    </section>
  );
}
