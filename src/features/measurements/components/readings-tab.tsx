import { can, type Role } from '../../../../shared/permissions';
import { ErrorState, Loading } from '../../../components/states';
import { useMeasurements } from '../api/get-measurements';
import { MeasurementForm } from './measurement-form';
import type { FindingChoice } from '../../../components/finding-options';
import { MeasurementsTable } from './measurements-table';
import { ValveLineUp } from './valve-line-up';
import { VoltageChart } from './voltage-chart';

/**
 * A restoration's readings: the valve line-up, the voltage chart, every reading, and (technicians only) the form to
 * record one. `findings` fills the form's finding picker; `plotWidth` fixes the plot's size.
 */
export function ReadingsTab({
  restorationId,
  role,
  liveChassis,
  findings,
  plotWidth,
}: {
  restorationId: number;
  role: Role;
  liveChassis: boolean;
  findings?: FindingChoice[];
  plotWidth?: number;
}) {
  const canRecord = can(role, 'measurements.record');
  const measurements = useMeasurements(restorationId);
  return (
    <div className="space-y-8">
      <section className="space-y-3" aria-labelledby="valves-heading">
        <h2 id="valves-heading" className="text-lg font-bold">
          Valve line-up
        </h2>
        <ValveLineUp restorationId={restorationId} role={role} liveChassis={liveChassis} />
      </section>
      {measurements.isPending ? (
        <Loading label="Fetching readings…" />
      ) : measurements.isError ? (
        <ErrorState error={measurements.error} onRetry={() => measurements.refetch()} />
      ) : (
        <>
          <section className="space-y-3" aria-labelledby="voltage-chart-heading">
            <h2 id="voltage-chart-heading" className="text-lg font-bold">
              Voltage chart
            </h2>
            <VoltageChart
              restorationId={restorationId}
              role={role}
              measurements={measurements.data}
              plotWidth={plotWidth}
            />
          </section>
          <section className="space-y-3" aria-labelledby="readings-heading">
            <h2 id="readings-heading" className="text-lg font-bold">
              All readings
            </h2>
            {canRecord && <MeasurementForm restorationId={restorationId} findings={findings} />}
            <MeasurementsTable
              restorationId={restorationId}
              role={role}
              measurements={measurements.data}
              findings={findings}
            />
          </section>
        </>
      )}
    </div>
  );
}
