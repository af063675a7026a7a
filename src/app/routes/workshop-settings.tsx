import { ApiError } from '../../lib/api-client';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { useWorkshopAdmins } from '../../features/money/api/workshop-admins';
import { useWorkshopSettings } from '../../features/money/api/workshop-settings';
import { WorkshopAdminsPanel } from '../../features/money/components/workshop-admins-panel';
import { WorkshopSettingsForm } from '../../features/money/components/workshop-settings-form';

/** The workshop's money settings: read by its technicians, changed by its administrators (decision 46). */
export function WorkshopSettingsRoute() {
  const query = useWorkshopSettings();
  const admins = useWorkshopAdmins();
  const failed = query.error ?? admins.error;
  const settings = query.data;
  const people = admins.data;
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Workshop settings</h1>
      {failed ? (
        failed instanceof ApiError && failed.status === 403 ? (
          <EmptyState title="For the workshop's technicians">
            Only the workshop's technicians read its currency, prices, tax and invoice numbers.
          </EmptyState>
        ) : (
          <ErrorState error={failed} onRetry={() => Promise.all([query.refetch(), admins.refetch()])} />
        )
      ) : !settings || !people ? (
        <Loading label="Fetching the workshop settings…" />
      ) : (
        <>
          {!people.youAreAdmin && (
            <p role="note" className="rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm">
              You can read these settings; only the workshop's administrators change them:{' '}
              {people.admins.map((a) => a.name).join(', ') || 'none named yet'}.
            </p>
          )}
          <WorkshopSettingsForm settings={settings} readOnly={!people.youAreAdmin} />
          <WorkshopAdminsPanel admins={people} />
        </>
      )}
    </div>
  );
}
