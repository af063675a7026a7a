import { useState } from 'react';
import { Link } from 'react-router';
import { can } from '../../../shared/permissions';
import { equipmentKindLabels, workLevelLabels } from '../../../shared/schemas/restorations';
import { Button } from '../../components/button';
import { ApiError } from '../../lib/api-client';
import { ReportPanel } from '../../features/report/components/report-panel';
import { useUpdateRestoration } from '../../features/restorations/api/update-restoration';
import { RestorationForm } from '../../features/restorations/components/restoration-form';
import { StagePicker } from '../../features/restorations/components/stage-picker';
import { useRestorationContext } from '../restoration-context';
import { Caution, CautionLead } from '../../components/caution';
import { FormAlert } from '../../components/form-alert';

export function RestorationRoute() {
  const r = useRestorationContext();
  const update = useUpdateRestoration(r.id);
  const [editing, setEditing] = useState(false);
  const canEdit = can(r.role, 'restoration.edit');
  const rows: [string, string | null][] = [
    ['Kind', equipmentKindLabels[r.equipmentKind]],
    ['Serial', r.serial],
    ['Mains setting', r.mainsSetting],
    ['Level of work', workLevelLabels[r.workLevel] + (r.hiddenPartsOriginal ? ', hidden parts original' : '')],
    ['Received', r.receivedOn],
    ['Symptoms', r.symptoms],
    ['Condition', r.conditionNotes],
    ['Story', r.story],
  ];
  return (
    <div className="space-y-4">
      {r.liveChassis && (
        <Caution className="px-4 py-3">
          <p>
            <CautionLead>Live chassis.</CautionLead> The chassis may sit at mains potential: work through an isolation
            transformer, keep one hand away, and refit insulating knobs and covers before hand-back. Follow local
            electrical codes and licensed practice.
          </p>
        </Caution>
      )}
      <ReportPanel restorationId={r.id} role={r.role} />
      {canEdit && (
        <StagePicker stage={r.stage} disabled={update.isPending} onChange={(stage) => update.mutate({ stage })} />
      )}
      {update.error && !editing && <FormAlert message={update.error.message} />}
      {editing ? (
        <div className="rounded-xl border border-rule bg-panel p-5">
          <RestorationForm
            initial={r}
            submitLabel="Save details"
            submitting={update.isPending}
            serverError={update.error?.message}
            onSubmit={(values) => update.mutate(values, { onSuccess: () => setEditing(false) })}
          />
          <Button variant="quiet" className="mt-3" onClick={() => setEditing(false)}>
            Cancel
          </Button>
        </div>
      ) : (
        <>
          <dl className="grid gap-x-6 gap-y-3 rounded-xl border border-rule bg-panel p-5 sm:grid-cols-[12rem_1fr]">
            {rows
              .filter(([, v]) => v)
              .map(([k, v]) => (
                <div key={k} className="contents">
                  <dt className="font-semibold text-ink-soft">{k}</dt>
                  <dd className="whitespace-pre-line">{v}</dd>
                </div>
              ))}
          </dl>
          {canEdit && (
            <Button variant="quiet" onClick={() => setEditing(true)}>
              Edit details
            </Button>
          )}
          {update.error && !editing && (
            <p role="alert" className="text-danger">
              {update.error.message}
              {update.error instanceof ApiError && update.error.status === 409 && (
                <>
                  {' '}
                  <Link to="bring-up" className="font-semibold underline">
                    Open the Bring-up tab
                  </Link>
                </>
              )}
            </p>
          )}
        </>
      )}
    </div>
  );
}
