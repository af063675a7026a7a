import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { FormAlert } from '../../components/form-alert';

export function SignUpRoute() {
  const navigate = useNavigate();
  const [sent, setSent] = useState(false);
  return (
    <AuthPanel
      title="Create your account"
      intro="For technicians, mentors and owners alike; your role is set per restoration."
    >
      {sent ? (
        <FormAlert
          tone="ok"
          message="Check your e-mail: follow the link we sent to confirm the address and finish signing up."
        />
      ) : (
        <SignUpForm onDone={(r) => (r.status === 'signed-in' ? navigate('/') : setSent(true))} />
      )}
      <p className="mt-4 text-sm">
        Already have an account?{' '}
        <Link to="/sign-in" className="underline">
          Sign in
        </Link>
      </p>
    </AuthPanel>
  );
}
