import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useHelpRequests } from '../api/get-help-requests';
import { HelpRequestPanel } from './help-request-panel';
import { NewHelpRequestForm } from './new-help-request-form';
import { ReadingRequestsPanel } from './reading-requests-panel';
import { SymptomChecklist } from './symptom-checklist';
import { formatMediumDate } from '../../../lib/format';

/** The Help tab: the restoration's help requests; technicians start and share them, mentors read them. */
export function HelpTab({ restorationId, role }: { restorationId: number; role: Role }) {
  const list = useHelpRequests(restorationId);
  const [chosen, setChosen] = useState<number | null>(null);
  const canEdit = can(role, 'help.ask');
  if (list.isPending) return <Loading label="Loading help requests…" />;
  if (list.isError) return <ErrorState error={list.error} onRetry={() => list.refetch()} />;
  const current = chosen ?? list.data[0]?.id ?? null;
  return (
    <div className="space-y-6">
      <SymptomChecklist restorationId={restorationId} canEdit={canEdit} />
      {canEdit && <NewHelpRequestForm restorationId={restorationId} onCreated={setChosen} />}
      {list.data.length === 0 ? (
        <EmptyState title="No help requests yet">
          {canEdit
            ? 'Describe the symptom above to gather everything a helper asks for.'
            : 'The technician has not asked for help on this set.'}
        </EmptyState>
      ) : (
        <>
          {list.data.length > 1 && (
            <nav aria-label="Help requests" className="flex flex-wrap gap-2 print:hidden">
              {list.data.map((h) => (
                <button
                  key={h.id}
                  type="button"
                  aria-current={h.id === current ? 'true' : undefined}
                  onClick={() => setChosen(h.id)}
                  className={`min-h-11 rounded-lg border px-3 text-left text-sm ${h.id === current ? 'border-glow bg-panel font-semibold' : 'border-rule'}`}
                >
                  {formatMediumDate(h.createdAt)} · {h.symptom.slice(0, 40)}
                  {h.pendingReplies > 0 && ` · ${h.pendingReplies} waiting`}
                </button>
              ))}
            </nav>
          )}
          {current && (
            <HelpRequestPanel key={current} restorationId={restorationId} helpRequestId={current} canEdit={canEdit} />
          )}
        </>
      )}
      <ReadingRequestsPanel restorationId={restorationId} helpRequestId={current ?? undefined} canAnswer={canEdit} />
    </div>
  );
}
