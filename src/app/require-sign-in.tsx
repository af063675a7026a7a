import { Navigate, Outlet, useLocation } from 'react-router';
import { ErrorState, Loading } from '../components/states';
import { useMe } from '../features/auth/api/get-me';

/** Signed-out visitors go to sign-in and come back where they were going. */
export function RequireSignIn() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <Loading label="Checking who is at the bench…" />;
  if (me.isError) return <ErrorState error={me.error} onRetry={() => me.refetch()} />;
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }
  return <Outlet />;
}

/** Only same-site paths are followed after sign-in. */
export function safeNext(value: string | null): string {
  return value && value.startsWith('/') && !value.startsWith('//') ? value : '/';
}
