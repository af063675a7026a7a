import { useRouteError } from 'react-router';
import { ErrorState } from '../../components/states';

export function RouteError() {
  const error = useRouteError();
  return (
    <div className="mx-auto max-w-xl p-6">
      <ErrorState error={error} onRetry={() => window.location.reload()} />
    </div>
  );
}
