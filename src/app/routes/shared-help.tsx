import { useParams } from 'react-router';
import { SharedHelpPage } from '../../features/help/components/shared-help-page';

/** A help request through its read-only link: outside the app shell, no sign-in. */
export function SharedHelpRoute() {
  return <SharedHelpPage token={useParams().token ?? ''} />;
}
