import { can, type Role } from '../../../../shared/permissions';
import { ErrorState, Loading } from '../../../components/states';
import { useBringup } from '../api/get-bringup';
import type { PhotoChoice } from '../lib/choices';
import type { FindingChoice } from '../../../components/finding-options';
import { IntakeChecklist } from './intake-checklist';
import { PowerUpCaution } from './power-cautions';
import { PowerUpLog } from './power-up-log';
import { PrePowerChecklist } from './pre-power-checklist';
import { StepForm } from './step-form';

export interface BringupTabProps {
  restorationId: number;
  role: Role;
  liveChassis: boolean;
  findings?: FindingChoice[];
  photos?: PhotoChoice[];
}

/** Intake checks, the pre-power checklist and its sign-off, and the staged power-up log, in the order the work is done. */
export function BringupTab({ restorationId, role, liveChassis, findings = [], photos = [] }: BringupTabProps) {
  const query = useBringup(restorationId);
  if (query.isPending) return <Loading label="Fetching the bring-up record…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  const { intake, prePower, steps } = query.data;
  const canRecord = can(role, 'bringup.record');
  const ownerWords = role === 'owner';
  return (
    <div className="space-y-8">
      <IntakeChecklist
        restorationId={restorationId}
        intake={intake}
        canRecord={canRecord}
        ownerWords={ownerWords}
        findings={findings}
        photos={photos}
      />
      <PrePowerChecklist
        restorationId={restorationId}
        prePower={prePower}
        canRecord={canRecord}
        canSignOff={can(role, 'bringup.signoff')}
        ownerWords={ownerWords}
      />
      <section aria-labelledby="power-up-heading" className="space-y-3">
        <h2 id="power-up-heading" className="text-xl font-bold">
          {ownerWords ? 'First switch-on, step by step' : 'Staged power-up'}
        </h2>
        {canRecord && <PowerUpCaution liveChassis={liveChassis} />}
        <PowerUpLog steps={steps} />
        {canRecord &&
          (prePower.signedOff ? (
            <StepForm restorationId={restorationId} nextNumber={steps.length + 1} findings={findings} />
          ) : (
            <p className="rounded-lg bg-sunken px-3 py-2">Sign the pre-power checklist off to log power-up steps.</p>
          ))}
      </section>
    </div>
  );
}
