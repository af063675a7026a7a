import { useNavigate } from 'react-router';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-out';

/** The header's place for the signed-in person. */
export function UserMenu() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (!me.data) return null;
  return (
    <div className="flex items-center gap-2" data-testid="user-slot">
      <span className="hidden text-sm sm:inline">
        Signed in as <strong>{me.data.name}</strong>
      </span>
      <button
        type="button"
        className="min-h-11 rounded-lg border border-rule px-3 text-sm hover:bg-sunken"
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in') })}
      >
        Sign out
      </button>
    </div>
  );
}
