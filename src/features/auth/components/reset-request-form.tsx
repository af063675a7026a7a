import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { passwordResetRequestSchema } from '../../../../shared/schemas/auth';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useRequestPasswordReset } from '../api/password-reset';
import { FormAlert } from '../../../components/form-alert';

type Values = z.input<typeof passwordResetRequestSchema>;

export function ResetRequestForm() {
  const reset = useRequestPasswordReset();
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(passwordResetRequestSchema) });
  if (reset.isSuccess) return <FormAlert tone="ok" message={`${reset.data.message} The link works for one hour.`} />;
  return (
    <form noValidate className="space-y-4" onSubmit={handleSubmit((v) => reset.mutate(v.email))}>
      <Field label="E-mail" error={formState.errors.email?.message}>
        {(a) => <input {...a} {...register('email')} type="email" autoComplete="username" className={inputClass} />}
      </Field>
      <FormAlert message={reset.error?.message} />
      <button type="submit" className={buttonClass('primary', 'w-full')} disabled={reset.isPending}>
        {reset.isPending ? 'Sending…' : 'Send me a reset link'}
      </button>
    </form>
  );
}
