import { prePowerItemWords, prePowerStatusLabels, type Bringup } from '../../../../shared/schemas/bringup';
import { Button } from '../../../components/button';
import { useSavePrePowerCheck } from '../api/save-pre-power-check';
import { useSignOffPrePower } from '../api/sign-off-pre-power';
import { formatDateTime as when } from '../../../lib/format';
import { DischargeCaution } from './power-cautions';
import { PrePowerItemRow } from './pre-power-item-row';
import { TapCheck } from './tap-check';

export interface PrePowerChecklistProps {
  restorationId: number;
  prePower: Bringup['prePower'];
  canRecord: boolean;
  canSignOff: boolean;
  ownerWords: boolean;
}

/** The checklist a technician signs off before the set first sees mains; until then Testing and powered readings are refused. */
export function PrePowerChecklist({
  restorationId,
  prePower,
  canRecord,
  canSignOff,
  ownerWords,
}: PrePowerChecklistProps) {
  const save = useSavePrePowerCheck(restorationId);
  const signOff = useSignOffPrePower(restorationId);
  const { items, signedOff, missing } = prePower;
  return (
    <section aria-labelledby="pre-power-heading" className="space-y-3">
      <h2 id="pre-power-heading" className="text-xl font-bold">
        Pre-power checklist
      </h2>
      <p role="status" className={`rounded-lg px-3 py-2 font-semibold ${signedOff ? 'bg-glow-soft' : 'bg-sunken'}`}>
        {signedOff
          ? `Signed off by ${signedOff.by ?? 'a former member'} on ${when(signedOff.at)}.`
          : 'Not signed off: the set may not be powered, moved to Testing, or have powered readings recorded yet.'}
      </p>
      {canRecord && <DischargeCaution />}
      {canRecord ? (
        <ul className="space-y-3">
          {items.map((item) => (
            <PrePowerItemRow
              key={`${item.item}-${item.status ?? ''}-${item.reason}`}
              value={item}
              signedOff={signedOff !== null}
              saving={save.isPending && save.variables?.item === item.item}
              error={save.isError && save.variables?.item === item.item ? save.error.message : undefined}
              onSave={(input) => save.mutate(input)}
            >
              {item.item === 'mains-tap' && <TapCheck />}
            </PrePowerItemRow>
          ))}
        </ul>
      ) : (
        <ul className="space-y-1">
          {items.map((item) => (
            <li key={item.item} className={item.status === 'waived' ? 'font-semibold text-danger' : ''}>
              {ownerWords ? prePowerItemWords[item.item].ownerLabel : prePowerItemWords[item.item].label}:{' '}
              {item.status ? prePowerStatusLabels[item.status].toLowerCase() : 'not yet'}
              {item.status && item.status !== 'done' && item.reason && ` — ${item.reason}`}
            </li>
          ))}
        </ul>
      )}
      {canSignOff && !signedOff && (
        <div className="space-y-2 rounded-lg border border-rule bg-panel p-3">
          {missing.length > 0 && (
            <div>
              <p className="font-semibold">Still to do before the sign-off:</p>
              <ul className="list-disc pl-5 text-sm">
                {missing.map((m) => (
                  <li key={m}>{m}</li>
                ))}
              </ul>
            </div>
          )}
          <Button disabled={missing.length > 0 || signOff.isPending} onClick={() => signOff.mutate()}>
            {signOff.isPending ? 'Signing off…' : 'Sign off the pre-power checklist'}
          </Button>
          {signOff.isError && (
            <p role="alert" className="text-sm font-semibold text-danger">
              {signOff.error.message}
            </p>
          )}
        </div>
      )}
    </section>
  );
}
