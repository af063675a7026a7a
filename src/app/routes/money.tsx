import { can } from '../../../shared/permissions';
import { EmptyState } from '../../components/states';
import { PaymentsPanel } from '../../features/money/components/payments-panel';
import { MoneyTab } from '../../features/money/components/money-tab';
import { useRestorationContext } from '../restoration-context';

/** The Money tab: estimates for technicians and the owner; mentors see no money. */
export function MoneyRoute() {
  const r = useRestorationContext();
  if (!can(r.role, 'money.view'))
    return (
      <EmptyState title="Not shown to mentors">
        Estimates and payments are between the workshop and the owner.
      </EmptyState>
    );
  return (
    <div className="space-y-8">
      <MoneyTab restorationId={r.id} role={r.role} />
      <section aria-labelledby="payments-title" className="space-y-4">
        <h2 id="payments-title" className="text-xl font-bold">
          Payments
        </h2>
        <PaymentsPanel restorationId={r.id} role={r.role} />
      </section>
    </div>
  );
}
