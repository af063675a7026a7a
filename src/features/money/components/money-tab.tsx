import { Link } from 'react-router';
import { can, type Role } from '../../../../shared/permissions';
import { useMoneySettings } from '../api/estimates';
import { EstimatesSection } from './estimates-section';
import { InvoicePanel } from './invoice-panel';
import { LabourLog } from './labour-log';
import { moneyText } from './money-text';

/**
 * The Money tab: estimates; for technicians the labour log; deposits and invoices. Every amount is shown in the
 * workshop's currency, as each amount carries it.
 */
export function MoneyTab({ restorationId, role }: { restorationId: number; role: Role }) {
  const canEdit = can(role, 'money.edit');
  const settings = useMoneySettings(restorationId, canEdit);
  return (
    <div className="space-y-8">
      <EstimatesSection restorationId={restorationId} role={role} settings={settings} />
      {can(role, 'labour.record') && <LabourLog restorationId={restorationId} />}
      <InvoicePanel restorationId={restorationId} canEdit={canEdit} currency={settings.data?.currency} />
      {canEdit && (
        <p className="text-sm text-ink-soft">
          Prices, tax and invoice numbers come from the{' '}
          <Link className="font-semibold underline" to="/workshop/settings">
            workshop settings
          </Link>
          {settings.data &&
            `: ${settings.data.currency}, labour at ${moneyText({ amount: settings.data.labourRate, currency: settings.data.currency })} an hour`}
          .
        </p>
      )}
    </div>
  );
}
