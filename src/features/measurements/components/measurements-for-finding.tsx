import { can, type Role } from '../../../../shared/permissions';
import { readingKinds } from '../../../../shared/bench';
import { ErrorState, Loading } from '../../../components/states';
import { useFindingMeasurements } from '../api/get-finding-measurements';
import { expectedSummary } from '../lib/measurement-format';
import { VerdictBadge } from '../../../components/verdict-badge';

/** The readings tied to one finding, compact, for the finding panel: what, where, the verdict and why. */
export function MeasurementsForFinding({
  restorationId,
  findingId,
  role,
}: {
  restorationId: number;
  findingId: number;
  role: Role;
}) {
  const query = useFindingMeasurements(restorationId, findingId);
  if (query.isPending) return <Loading label="Fetching readings…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  if (query.data.length === 0)
    return (
      <p className="text-sm text-ink-soft">
        {can(role, 'measurements.record')
          ? 'No readings tied to this finding yet. Record one under Readings and link it here.'
          : 'No readings tied to this finding.'}
      </p>
    );
  return (
    <ul aria-label="Readings for this finding" className="divide-y divide-rule rounded-lg border border-rule bg-panel">
      {query.data.map((m) => (
        <li key={m.id} className="space-y-1 px-3 py-2" data-verdict={m.verdict}>
          <p className="flex flex-wrap items-center gap-x-2">
            <span className="font-semibold">{m.location}</span>
            <span className="text-sm text-ink-soft">{readingKinds[m.quantity].label}</span>
            <span className="font-mono">{m.readingText}</span>
            <span className="font-mono text-sm text-ink-soft">({expectedSummary(m)})</span>
            <VerdictBadge verdict={m.verdict} />
          </p>
          <p className="text-sm">{m.verdictReason}</p>
        </li>
      ))}
    </ul>
  );
}
