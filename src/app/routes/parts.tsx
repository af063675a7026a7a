import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { restorationFindingsQueryOptions } from '../../lib/queries/get-restoration-findings';
import { PartsTab, type PartsView } from '../../features/parts/components/parts-tab';
import { useRestorationContext } from '../restoration-context';

/**
 * The Parts tab. `?view=shopping` shows the printable shopping list, so it can be linked and survives a reload.
 * The findings give the ledger its "#n" links and the form its finding picker (owners get only the shared ones).
 */
export function PartsRoute() {
  const r = useRestorationContext();
  const [params, setParams] = useSearchParams();
  const view: PartsView = params.get('view') === 'shopping' ? 'shopping' : 'ledger';
  const findings = useQuery(restorationFindingsQueryOptions(r.id));
  const choices = findings.data?.map((f) => ({ id: f.id, number: f.number, title: f.title }));
  return (
    <PartsTab
      restorationId={r.id}
      role={r.role}
      setName={`${r.make} ${r.model}`}
      findings={choices}
      view={view}
      onViewChange={(next) => setParams(next === 'shopping' ? { view: 'shopping' } : {}, { replace: true })}
    />
  );
}
