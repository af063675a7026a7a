import { useState } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import { useMe } from '../../features/auth/api/get-me';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { DemoAccounts } from '../../features/auth/components/demo-accounts';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useMeta } from '../../lib/queries/get-meta';
import { safeNext } from '../require-sign-in';

export function SignInRoute() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const navigate = useNavigate();
  const me = useMe();
  const meta = useMeta();
  const [preset, setPreset] = useState<{ email: string; password?: string }>();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <AuthPanel
      title="Sign in to Gridleak"
      intro="Your restorations, their photos and findings are waiting on the bench."
    >
      <SignInForm key={preset?.email} preset={preset} onSignedIn={() => navigate(next, { replace: true })} />
      <p className="mt-4 flex flex-wrap justify-between gap-2 text-sm">
        <Link to="/reset-password" className="underline">
          Forgot your password?
        </Link>
        <Link to={`/sign-up${params.get('next') ? `?next=${encodeURIComponent(next)}` : ''}`} className="underline">
          New here? Create an account
        </Link>
      </p>
      {meta.data?.demo && (
        <DemoAccounts
          accounts={meta.data.demoAccounts}
          onPick={(a) => setPreset({ email: a.email, password: a.password })}
        />
      )}
    </AuthPanel>
  );
}
