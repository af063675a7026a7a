import { useEffect, useRef } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { useConfirmEmail } from '../../features/auth/api/confirm-email';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { FormAlert } from '../../components/form-alert';

export function ConfirmEmailRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const { mutate, error } = useConfirmEmail();
  const sent = useRef(false);
  useEffect(() => {
    // The link works once: StrictMode's second effect run must not spend it again.
    if (sent.current) return;
    sent.current = true;
    mutate(token, { onSuccess: () => navigate('/', { replace: true }) });
  }, [mutate, navigate, token]);
  return (
    <AuthPanel title="Confirming your e-mail">
      {error ? (
        <>
          <FormAlert message={error.message} />
          <Link to="/sign-in" className="mt-3 inline-block underline">
            Go to sign-in
          </Link>
        </>
      ) : (
        <p role="status">One moment…</p>
      )}
    </AuthPanel>
  );
}
