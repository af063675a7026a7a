import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { EmptyState } from '../../../components/states';
import { MeasurementForm } from './measurement-form';
import type { FindingChoice } from '../../../components/finding-options';
import { MeasurementRow } from './measurement-row';

const heads = [
  'Location',
  'Quantity',
  'Expected',
  'Reading',
  'Deviation',
  'Verdict',
  'Conditions, method',
  'Who, when',
];

/** Every reading the person may see (owners get only shared ones from the API), newest first; changes happen in place. */
export function MeasurementsTable({
  restorationId,
  role,
  measurements,
  findings,
}: {
  restorationId: number;
  role: Role;
  measurements: Measurement[];
  findings?: FindingChoice[];
}) {
  const [editingId, setEditingId] = useState<number | null>(null);
  const canRecord = can(role, 'measurements.record');
  if (measurements.length === 0)
    return (
      <EmptyState title="No readings yet">
        {canRecord
          ? 'Record ESR, capacitance, voltages and the rest with the form; each gets a verdict against the manual.'
          : role === 'owner'
            ? 'Readings the technician shares with you will appear here.'
            : 'Readings appear here as the technician records them.'}
      </EmptyState>
    );
  const newestFirst = [...measurements].sort((a, b) => b.measuredAt.localeCompare(a.measuredAt) || b.id - a.id);
  return (
    <div className="overflow-x-auto rounded-xl border border-rule bg-panel">
      <table className="w-full min-w-[56rem] border-collapse text-left">
        <caption className="sr-only">All readings, newest first</caption>
        <thead className="bg-sunken text-sm">
          <tr>
            {heads.map((h) => (
              <th key={h} scope="col" className="px-3 py-2 font-semibold">
                {h}
              </th>
            ))}
            {canRecord && (
              <th scope="col" className="px-3 py-2">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {newestFirst.map((m) =>
            editingId === m.id ? (
              <tr key={m.id} className="border-t border-rule">
                <td colSpan={heads.length + 1} className="p-2">
                  <MeasurementForm
                    restorationId={restorationId}
                    measurement={m}
                    findings={findings}
                    onDone={() => setEditingId(null)}
                    onCancel={() => setEditingId(null)}
                  />
                </td>
              </tr>
            ) : (
              <MeasurementRow
                key={m.id}
                restorationId={restorationId}
                m={m}
                canRecord={canRecord}
                onEdit={() => setEditingId(m.id)}
              />
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
