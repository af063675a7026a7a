import { HelpTab } from '../../features/help/components/help-tab';
import { useRestorationContext } from '../restoration-context';

/** The Help tab: asking mentors and outside helpers about this set. */
export function HelpRoute() {
  const r = useRestorationContext();
  return <HelpTab restorationId={r.id} role={r.role} />;
}
