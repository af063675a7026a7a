import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import type { WorkshopSettings } from '../../../../shared/schemas/estimates';
import { Button } from '../../../components/button';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useEstimates } from '../api/estimates';
import { EstimateCard } from './estimate-card';
import { EstimateForm } from './estimate-form';

/** Estimates, newest version first; technicians write them, the owner answers the latest. */
export function EstimatesSection({
  restorationId,
  role,
  settings,
}: {
  restorationId: number;
  role: Role;
  settings: { data?: WorkshopSettings; isError: boolean; error: unknown; refetch: () => unknown };
}) {
  const query = useEstimates(restorationId);
  const canEdit = can(role, 'money.edit');
  const [writing, setWriting] = useState(false);
  if (query.isPending) return <Loading label="Fetching the estimates…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  const list = query.data;
  const latestSent = list.find((e) => e.sent)?.id;
  return (
    <section aria-labelledby="estimates-heading" className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="estimates-heading" className="text-xl font-bold">
          Estimates
        </h2>
        {canEdit && !writing && (
          <Button onClick={() => setWriting(true)} disabled={!settings.data}>
            {list.length ? 'Revise the estimate' : 'Write an estimate'}
          </Button>
        )}
      </div>
      {canEdit && settings.isError && <ErrorState error={settings.error} onRetry={() => settings.refetch()} />}
      {writing && settings.data && (
        <EstimateForm restorationId={restorationId} settings={settings.data} onDone={() => setWriting(false)} />
      )}
      {list.length === 0 ? (
        <EmptyState title="No estimate yet">
          {canEdit
            ? 'Write one before opening the set; revise it after the assessment.'
            : 'The workshop has not sent an estimate yet.'}
        </EmptyState>
      ) : (
        list.map((e) => (
          <EstimateCard
            key={e.id}
            restorationId={restorationId}
            estimate={e}
            latest={e.sent ? e.id === latestSent : true}
            canEdit={canEdit}
            canDecide={can(role, 'estimates.decide')}
          />
        ))
      )}
    </section>
  );
}
