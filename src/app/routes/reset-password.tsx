import { Link, useNavigate, useParams } from 'react-router';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { ResetConfirmForm } from '../../features/auth/components/reset-confirm-form';
import { ResetRequestForm } from '../../features/auth/components/reset-request-form';

export function ResetPasswordRoute() {
  const { token } = useParams();
  const navigate = useNavigate();
  return token ? (
    <AuthPanel title="Choose a new password">
      <ResetConfirmForm token={token} onDone={() => navigate('/', { replace: true })} />
    </AuthPanel>
  ) : (
    <AuthPanel title="Reset your password" intro="We'll e-mail a link to choose a new one.">
      <ResetRequestForm />
      <p className="mt-4 text-sm">
        <Link to="/sign-in" className="underline">
          Back to sign-in
        </Link>
      </p>
    </AuthPanel>
  );
}
