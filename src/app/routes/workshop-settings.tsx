import { ApiError } from '../../lib/api-client';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { useWorkshopSettings } from '../../features/money/api/workshop-settings';
import { WorkshopSettingsForm } from '../../features/money/components/workshop-settings-form';

/** The workshop's money settings, for its technicians. */
export function WorkshopSettingsRoute() {
  const query = useWorkshopSettings();
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Workshop settings</h1>
      {query.isPending ? (
        <Loading label="Fetching the workshop settings…" />
      ) : query.isError ? (
        query.error instanceof ApiError && query.error.status === 403 ? (
          <EmptyState title="For the workshop's technicians">
            Only a technician of the workshop changes its currency, prices, tax and invoice numbers.
          </EmptyState>
        ) : (
          <ErrorState error={query.error} onRetry={() => query.refetch()} />
        )
      ) : (
        <WorkshopSettingsForm settings={query.data} />
      )}
    </div>
  );
}
