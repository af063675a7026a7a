import { can } from '../../../shared/permissions';
import { EmptyState } from '../../components/states';
import { MoneyTab } from '../../features/money/components/money-tab';
import { useRestorationContext } from '../restoration-context';

/** The Money tab: estimates for technicians and the owner; mentors see no money. */
export function MoneyRoute() {
  const r = useRestorationContext();
  if (!can(r.role, 'money.view')) return <EmptyState title="Not shown to mentors">Estimates and payments are between the workshop and the owner.</EmptyState>;
  return <MoneyTab restorationId={r.id} role={r.role} />;
}
