import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { signInSchema, type User } from '../../../../shared/schemas/auth';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useSignIn } from '../api/sign-in';
import { FormAlert } from '../../../components/form-alert';

type In = z.input<typeof signInSchema>;
type Out = z.output<typeof signInSchema>;

/** Re-key it with a new `preset` to fill it (the demo accounts do). */
export function SignInForm({
  onSignedIn,
  preset,
}: {
  onSignedIn: (user: User) => void;
  preset?: { email: string; password?: string };
}) {
  const signIn = useSignIn();
  const { register, handleSubmit, formState } = useForm<In, unknown, Out>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: preset?.email ?? '', password: preset?.password ?? '', remember: false },
  });
  const e = formState.errors;
  return (
    <form noValidate className="space-y-4" onSubmit={handleSubmit((v) => signIn.mutate(v, { onSuccess: onSignedIn }))}>
      <Field label="E-mail" error={e.email?.message}>
        {(a) => <input {...a} {...register('email')} type="email" autoComplete="username" className={inputClass} />}
      </Field>
      <Field label="Password" error={e.password?.message}>
        {(a) => (
          <input
            {...a}
            {...register('password')}
            type="password"
            autoComplete="current-password"
            className={inputClass}
          />
        )}
      </Field>
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" {...register('remember')} className="h-5 w-5 accent-[var(--color-glow)]" />
        Keep me signed in on this device for 30 days
      </label>
      <FormAlert message={signIn.error?.message} />
      <button type="submit" className={buttonClass('primary', 'w-full')} disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
