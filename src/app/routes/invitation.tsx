import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { roleLabels } from '../../../shared/permissions';
import { buttonClass } from '../../components/button';
import { ErrorState, Loading } from '../../components/states';
import { useMe } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { useAcceptInvitation } from '../../features/invitations/api/accept-invitation';
import { useInvitation } from '../../features/invitations/api/get-invitation';
import { FormAlert } from '../../components/form-alert';

/** The link from an invitation e-mail: create an account or sign in, then join. */
export function InvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const me = useMe();
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation();
  const signOut = useSignOut();
  const [mode, setMode] = useState<'sign-up' | 'sign-in'>('sign-up');
  if (invitation.isPending || me.isPending) return <Loading label="Opening the invitation…" />;
  if (invitation.isError)
    return (
      <AuthPanel title="Invitation">
        <ErrorState error={invitation.error} />
      </AuthPanel>
    );
  const inv = invitation.data;
  const join = () =>
    accept.mutate(token, { onSuccess: (r) => navigate(`/restorations/${r.restorationId}`, { replace: true }) });
  const intro = (
    <p>
      {inv.invitedBy ?? 'A technician'} invited <strong>{inv.email}</strong> to the{' '}
      <strong>
        {inv.restoration.make} {inv.restoration.model}
      </strong>{' '}
      as <strong>{roleLabels[inv.role].toLowerCase()}</strong>.
    </p>
  );
  if (me.data) {
    const matches = me.data.email.toLowerCase() === inv.email.toLowerCase();
    return (
      <AuthPanel title="Join the restoration" intro={intro}>
        {matches ? (
          <button type="button" className={buttonClass('primary', 'w-full')} onClick={join} disabled={accept.isPending}>
            {accept.isPending ? 'Joining…' : 'Join'}
          </button>
        ) : (
          <>
            <FormAlert message={`You are signed in as ${me.data.email}; this invitation is for ${inv.email}.`} />
            <button type="button" className={buttonClass('quiet', 'mt-3 w-full')} onClick={() => signOut.mutate()}>
              Sign out and continue as {inv.email}
            </button>
          </>
        )}
        <FormAlert message={accept.error?.message} />
      </AuthPanel>
    );
  }
  return (
    <AuthPanel title="Join the restoration" intro={intro}>
      <div role="tablist" aria-label="How to join" className="mb-4 grid grid-cols-2 gap-1 rounded-lg bg-sunken p-1">
        {(['sign-up', 'sign-in'] as const).map((m) => (
          <button
            key={m}
            type="button"
            role="tab"
            aria-selected={mode === m}
            onClick={() => setMode(m)}
            className={`min-h-11 rounded-md font-semibold ${mode === m ? 'bg-panel shadow-sm' : 'text-ink-soft'}`}
          >
            {m === 'sign-up' ? 'New to Gridleak' : 'I have an account'}
          </button>
        ))}
      </div>
      {mode === 'sign-up' ? (
        <SignUpForm
          invitation={{ token, email: inv.email }}
          onDone={(r) =>
            r.status === 'signed-in' &&
            navigate(`/restorations/${r.restorationId ?? inv.restoration.id}`, { replace: true })
          }
        />
      ) : (
        <SignInForm preset={{ email: inv.email }} onSignedIn={join} />
      )}
    </AuthPanel>
  );
}
