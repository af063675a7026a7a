import { Link } from 'react-router';
import { EmptyState } from '../../components/states';

export function NotFoundRoute() {
  return (
    <EmptyState title="Nothing here">
      <Link to="/" className="underline">
        Back to the bench
      </Link>
    </EmptyState>
  );
}
