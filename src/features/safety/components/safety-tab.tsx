import { can, type Role } from '../../../../shared/permissions';
import { ErrorState, Loading } from '../../../components/states';
import { useSafetyTests } from '../api/get-safety-tests';
import { SafetyOverrideForm } from './safety-override-form';
import { SafetyTestCaution } from './safety-test-caution';
import { SafetyTestForm } from './safety-test-form';
import { SafetyTestResult } from './safety-test-result';
import { SoakPanel } from './soak-panel';

/** The Safety tab: the final safety test before Returned (with its gate and override), then the soak log. */
export function SafetyTab({
  restorationId,
  role,
  liveChassis,
}: {
  restorationId: number;
  role: Role;
  liveChassis: boolean;
}) {
  const status = useSafetyTests(restorationId);
  const canRecord = can(role, 'safety.record');
  return (
    <div className="space-y-6">
      <section aria-labelledby="safety-heading" className="space-y-3">
        <h2 id="safety-heading" className="text-xl font-bold">
          Final safety test
        </h2>
        {canRecord && <SafetyTestCaution />}
        {status.isPending && <Loading label="Loading the safety tests…" />}
        {status.isError && <ErrorState error={status.error} onRetry={() => status.refetch()} />}
        {status.data && (
          <>
            <p
              role="status"
              className={status.data.returnedAllowed ? 'font-semibold text-ok' : 'font-semibold text-danger'}
            >
              {status.data.latest?.verdict === 'pass'
                ? 'The latest test passed: the set may be marked Returned.'
                : status.data.returnedAllowed
                  ? 'No passing test: the set may be marked Returned only on the override recorded below.'
                  : 'The set cannot be marked Returned until a safety test passes or a technician records an override.'}
            </p>
            {status.data.override && status.data.latest?.verdict !== 'pass' && (
              <p className="rounded-lg border-l-4 border-danger bg-danger-soft px-3 py-2 text-sm">
                <strong className="text-danger">Override</strong> by {status.data.override.by ?? 'a technician'}:{' '}
                {status.data.override.reason}
              </p>
            )}
            {status.data.latest ? (
              <SafetyTestResult test={status.data.latest} heading="Latest test" />
            ) : (
              <p className="text-ink-soft">No safety test recorded yet.</p>
            )}
            {canRecord && <SafetyTestForm restorationId={restorationId} liveChassis={liveChassis} />}
            {can(role, 'safety.override') && !status.data.returnedAllowed && (
              <SafetyOverrideForm restorationId={restorationId} />
            )}
            {status.data.tests.length > 1 && (
              <details className="rounded-xl border border-rule bg-panel p-3">
                <summary className="cursor-pointer font-semibold">
                  Earlier tests ({status.data.tests.length - 1})
                </summary>
                <div className="mt-3 space-y-3">
                  {status.data.tests.slice(1).map((t) => (
                    <SafetyTestResult key={t.id} test={t} heading={`Test #${t.id}`} />
                  ))}
                </div>
              </details>
            )}
          </>
        )}
      </section>
      <SoakPanel restorationId={restorationId} canRecord={canRecord} />
    </div>
  );
}
