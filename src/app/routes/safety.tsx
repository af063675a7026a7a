import { SafetyTab } from '../../features/safety/components/safety-tab';
import { useRestorationContext } from '../restoration-context';

/** The Safety tab: final safety test, Returned override and soak runs. */
export function SafetyRoute() {
  const r = useRestorationContext();
  return <SafetyTab restorationId={r.id} role={r.role} liveChassis={r.liveChassis} />;
}
