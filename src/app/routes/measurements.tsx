import { useQuery } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { restorationFindingsQueryOptions } from '../../lib/queries/get-restoration-findings';
import { ReadingsTab } from '../../features/measurements/components/readings-tab';
import { useRestorationContext } from '../restoration-context';

/** The Readings tab. The findings feed the form's finding picker; only technicians see the form, so only they fetch them. */
export function MeasurementsRoute() {
  const r = useRestorationContext();
  const canRecord = can(r.role, 'measurements.record');
  const findings = useQuery({ ...restorationFindingsQueryOptions(r.id), enabled: canRecord });
  const choices = findings.data?.map((f) => ({ id: f.id, number: f.number, title: f.title }));
  return <ReadingsTab restorationId={r.id} role={r.role} liveChassis={r.liveChassis} findings={choices} />;
}
