import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MIN, signUpSchema, type SignUpResult } from '../../../../shared/schemas/auth';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useSignUp } from '../api/sign-up';
import { FormAlert } from '../../../components/form-alert';

type In = z.input<typeof signUpSchema>;
type Out = z.output<typeof signUpSchema>;

/** With an invitation, the address is the invited one and the account is ready at once. */
export function SignUpForm({
  onDone,
  invitation,
}: {
  onDone: (r: SignUpResult) => void;
  invitation?: { token: string; email: string };
}) {
  const signUp = useSignUp();
  const { register, handleSubmit, formState } = useForm<In, unknown, Out>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: invitation?.email ?? '', password: '', invitationToken: invitation?.token },
  });
  const e = formState.errors;
  return (
    <form noValidate className="space-y-4" onSubmit={handleSubmit((v) => signUp.mutate(v, { onSuccess: onDone }))}>
      <Field label="Your name" hint="As the others on a restoration will see it" error={e.name?.message}>
        {(a) => <input {...a} {...register('name')} autoComplete="name" className={inputClass} />}
      </Field>
      <Field label="E-mail" error={e.email?.message}>
        {(a) => (
          <input
            {...a}
            {...register('email')}
            type="email"
            autoComplete="email"
            readOnly={Boolean(invitation)}
            className={inputClass}
          />
        )}
      </Field>
      <Field
        label="Password"
        hint={`At least ${PASSWORD_MIN} characters; a few unrelated words work well`}
        error={e.password?.message}
      >
        {(a) => (
          <input {...a} {...register('password')} type="password" autoComplete="new-password" className={inputClass} />
        )}
      </Field>
      <FormAlert message={signUp.error?.message} />
      <button type="submit" className={buttonClass('primary', 'w-full')} disabled={signUp.isPending}>
        {signUp.isPending ? 'Creating your account…' : invitation ? 'Create account and join' : 'Create account'}
      </button>
    </form>
  );
}
