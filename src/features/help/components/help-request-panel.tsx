import { findSymptom } from '../../../../shared/bench/symptoms';
import type { HelpRequest, HelpRequestPatch } from '../../../../shared/schemas/help';
import { Button } from '../../../components/button';
import { ErrorState, Loading } from '../../../components/states';
import { useApproveHelpReply } from '../api/approve-help-reply';
import { useHelpRequest } from '../api/get-help-request';
import { useUpdateHelpRequest } from '../api/update-help-request';
import { HelpContentView } from './help-content-view';
import { HelpLinkPanel } from './help-link-panel';
import { HelpReplies } from './help-replies';

const field = { parts: 'partIds', readings: 'measurementIds', photos: 'photoIds' } as const;

/** One request: what goes with it (the technician removes what is not relevant), its link and its replies. */
export function HelpRequestPanel({
  restorationId,
  helpRequestId,
  canEdit,
}: {
  restorationId: number;
  helpRequestId: number;
  canEdit: boolean;
}) {
  const query = useHelpRequest(helpRequestId);
  const update = useUpdateHelpRequest(restorationId, helpRequestId);
  const approve = useApproveHelpReply(restorationId, helpRequestId);
  if (query.isPending) return <Loading label="Opening the help request…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  const r: HelpRequest = query.data;
  const remove = (section: keyof typeof field, id: number) => {
    const key = field[section];
    update.mutate({ [key]: r[key].filter((x) => x !== id) } as HelpRequestPatch);
  };
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-2 print:hidden">
        <Button variant="quiet" onClick={() => window.print()}>
          Print
        </Button>
        {canEdit && (
          <>
            <Button variant="quiet" onClick={() => update.mutate({ includeSet: !r.includeSet })}>
              {r.includeSet ? 'Leave out the set details' : 'Add the set details'}
            </Button>
            <Button variant="quiet" onClick={() => update.mutate({ includeValves: !r.includeValves })}>
              {r.includeValves ? 'Leave out the valve line-up' : 'Add the valve line-up'}
            </Button>
          </>
        )}
      </div>
      {update.isError && (
        <p role="alert" className="font-semibold text-danger">
          {update.error.message}
        </p>
      )}
      <HelpContentView
        content={r}
        extra={
          canEdit
            ? (section, id) => (
                <Button
                  variant="quiet"
                  className="min-h-8 px-2 py-0 text-sm print:hidden"
                  disabled={update.isPending}
                  onClick={() => remove(section, id)}
                  aria-label={`Remove ${section.slice(0, -1)} ${id} from the request`}
                >
                  Remove
                </Button>
              )
            : undefined
        }
        removeSymptom={
          canEdit
            ? (symptomId) => (
                <Button
                  variant="quiet"
                  className="min-h-8 px-2 py-0 text-sm print:hidden"
                  disabled={update.isPending}
                  onClick={() => update.mutate({ symptomIds: r.symptomIds.filter((x) => x !== symptomId) })}
                  aria-label={`Remove the checklist for ${findSymptom(symptomId)?.title ?? symptomId} from the request`}
                >
                  Remove
                </Button>
              )
            : undefined
        }
      />
      <HelpReplies
        replies={r.replies}
        action={(reply) =>
          canEdit &&
          !reply.approved && (
            <Button className="mt-2 print:hidden" disabled={approve.isPending} onClick={() => approve.mutate(reply.id)}>
              Approve reply
            </Button>
          )
        }
      />
      {approve.isError && (
        <p role="alert" className="font-semibold text-danger">
          {approve.error.message}
        </p>
      )}
      {canEdit && <HelpLinkPanel request={r} />}
    </div>
  );
}
