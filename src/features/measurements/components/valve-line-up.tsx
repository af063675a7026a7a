import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { buttonClass } from '../../../components/button';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useValves } from '../api/get-valves';
import { HeaterSummaryLine } from './heater-summary-line';
import { LiveChassisCaution } from './live-chassis-caution';
import { ValveDecoded } from './valve-decoded';
import { ValveLineUpEditor } from './valve-line-up-editor';

/**
 * The set's valves by position, each decoded in words. The live-chassis caution shows when the line-up points to
 * series heaters or the restoration is already marked live (`liveChassis`). Technicians change the list.
 */
export function ValveLineUp({
  restorationId,
  role,
  liveChassis = false,
}: {
  restorationId: number;
  role: Role;
  liveChassis?: boolean;
}) {
  const query = useValves(restorationId);
  const [editing, setEditing] = useState(false);
  const canEdit = can(role, 'measurements.record');
  if (query.isPending) return <Loading label="Fetching the valve line-up…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  const { valves, liveChassis: assessed } = query.data;
  const live = assessed.likely || liveChassis;
  return (
    <div className="space-y-3">
      {live &&
        (can(role, 'workshop.view') ? (
          <LiveChassisCaution reasons={assessed.reasons} />
        ) : (
          <LiveChassisCaution audience="owner" />
        ))}
      {editing ? (
        <ValveLineUpEditor
          restorationId={restorationId}
          valves={valves}
          cautioned={live}
          onClose={() => setEditing(false)}
        />
      ) : valves.length === 0 ? (
        <EmptyState title="No valves listed yet">
          {canEdit
            ? 'List each valve by its position (V1, V2, …) and the type printed on it.'
            : 'The technician has not listed the valves yet.'}
        </EmptyState>
      ) : (
        <ul className="grid gap-2 sm:grid-cols-2 xl:grid-cols-3" aria-label="Valve line-up">
          {valves.map((v) => (
            <li key={v.position} className="rounded-xl border border-rule bg-panel p-3">
              <p className="flex items-baseline gap-2">
                <span className="font-mono font-bold">{v.position}</span>
                <span className="font-mono text-lg">{v.type}</span>
              </p>
              <ValveDecoded type={v.type} />
              {v.notes && <p className="mt-1 text-sm">{v.notes}</p>}
            </li>
          ))}
        </ul>
      )}
      {!editing && valves.length > 0 && <HeaterSummaryLine types={valves.map((v) => v.type)} />}
      {canEdit && !editing && (
        <button type="button" className={buttonClass('quiet')} onClick={() => setEditing(true)}>
          {valves.length ? 'Change the line-up' : 'List the valves'}
        </button>
      )}
    </div>
  );
}
