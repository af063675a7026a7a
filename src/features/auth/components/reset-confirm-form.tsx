import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MIN, passwordResetConfirmSchema, type User } from '../../../../shared/schemas/auth';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useConfirmPasswordReset } from '../api/password-reset';
import { FormAlert } from '../../../components/form-alert';

const schema = passwordResetConfirmSchema.pick({ password: true });
type Values = z.input<typeof schema>;

export function ResetConfirmForm({ token, onDone }: { token: string; onDone: (u: User) => void }) {
  const confirm = useConfirmPasswordReset();
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(schema) });
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit((v) => confirm.mutate({ token, password: v.password }, { onSuccess: onDone }))}
    >
      <Field
        label="New password"
        hint={`At least ${PASSWORD_MIN} characters. Other devices will be signed out.`}
        error={formState.errors.password?.message}
      >
        {(a) => (
          <input {...a} {...register('password')} type="password" autoComplete="new-password" className={inputClass} />
        )}
      </Field>
      <FormAlert message={confirm.error?.message} />
      <button type="submit" className={buttonClass('primary', 'w-full')} disabled={confirm.isPending}>
        {confirm.isPending ? 'Saving…' : 'Set the new password'}
      </button>
    </form>
  );
}
