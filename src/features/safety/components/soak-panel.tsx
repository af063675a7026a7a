import { useState } from 'react';
import { formatQuantity } from '../../../../shared/bench';
import { Button, buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useSoakLog } from '../api/get-soak-log';
import { useStartSoak } from '../api/start-soak';
import { useStopSoak } from '../api/stop-soak';
import { SoakCaution } from './safety-test-caution';
import { SoakPlot } from './soak-plot';
import { SoakTimer } from './soak-timer';
import { formatDateTime as when } from '../../../lib/format';
import { FormAlert } from '../../../components/form-alert';

const blank = { ambientC: '', chassisC: '', mainsCurrent: '', faults: '', actionTaken: '' };

/** Soak runs: start and stop (the clock survives a reload), temperatures, mains current and faults; a fault opens a finding. */
export function SoakPanel({ restorationId, canRecord }: { restorationId: number; canRecord: boolean }) {
  const log = useSoakLog(restorationId);
  const start = useStartSoak(restorationId);
  const stop = useStopSoak(restorationId);
  const [values, setValues] = useState(blank);
  const set = (k: keyof typeof blank) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [k]: e.target.value }));
  if (log.isPending) return <Loading label="Loading the soak log…" />;
  if (log.isError) return <ErrorState error={log.error} onRetry={() => log.refetch()} />;
  const { sessions, totalHours, running } = log.data;
  const finished = sessions.filter((s) => s.endedAt);
  return (
    <section aria-labelledby="soak-heading" className="space-y-3">
      <h2 id="soak-heading" className="text-xl font-bold">
        Soak test
      </h2>
      {canRecord && <SoakCaution />}
      <p>
        <strong className="font-mono">{totalHours.toFixed(1)} h</strong> in {finished.length} finished run
        {finished.length === 1 ? '' : 's'}.
      </p>
      {running ? (
        <div className="space-y-3 rounded-xl border border-glow bg-panel p-4">
          <p className="flex flex-wrap items-center gap-3">
            Running since {when(running.startedAt)}: <SoakTimer startedAt={running.startedAt} />
          </p>
          {canRecord && (
            <form
              aria-label="Stop the soak run"
              className="space-y-3"
              onSubmit={(e) => {
                e.preventDefault();
                stop.mutate(values, { onSuccess: () => setValues(blank) });
              }}
            >
              <div className="grid gap-3 sm:grid-cols-3">
                <Field label="Room (°C)">
                  {(a) => (
                    <input
                      {...a}
                      inputMode="decimal"
                      className={inputClass}
                      value={values.ambientC}
                      onChange={set('ambientC')}
                    />
                  )}
                </Field>
                <Field label="Chassis (°C)">
                  {(a) => (
                    <input
                      {...a}
                      inputMode="decimal"
                      className={inputClass}
                      value={values.chassisC}
                      onChange={set('chassisC')}
                    />
                  )}
                </Field>
                <Field label="Mains current (A)" hint="e.g. 0.25 or 250m">
                  {(a) => (
                    <input
                      {...a}
                      className={`${inputClass} font-mono`}
                      value={values.mainsCurrent}
                      onChange={set('mainsCurrent')}
                    />
                  )}
                </Field>
              </div>
              <Field
                label="Faults seen"
                hint="Leave blank if none. A fault opens a finding on the newest photo, to move to the spot."
              >
                {(a) => (
                  <textarea {...a} rows={2} className={inputClass} value={values.faults} onChange={set('faults')} />
                )}
              </Field>
              <Field label="What was done">
                {(a) => (
                  <textarea
                    {...a}
                    rows={2}
                    className={inputClass}
                    value={values.actionTaken}
                    onChange={set('actionTaken')}
                  />
                )}
              </Field>
              {stop.isError && <FormAlert small message={`Not stopped: ${stop.error.message}`} />}
              <button type="submit" className={buttonClass()} disabled={stop.isPending}>
                {stop.isPending ? 'Stopping…' : 'Stop the run'}
              </button>
            </form>
          )}
        </div>
      ) : canRecord ? (
        <div className="space-y-2">
          <Button onClick={() => start.mutate()} disabled={start.isPending}>
            {start.isPending ? 'Starting…' : 'Start a soak run'}
          </Button>
          {start.isError && (
            <p role="alert" className="text-sm font-semibold text-danger">
              Not started: {start.error.message}
            </p>
          )}
        </div>
      ) : null}
      {finished.length === 0 && !running ? (
        <EmptyState title="No soak run yet">
          New valves and old capacitors often fail in the first hours; a few hours’ run before hand-back shows it.
        </EmptyState>
      ) : (
        <>
          <SoakPlot sessions={finished} />
          <ol className="space-y-1 text-sm">
            {finished.map((s, i) => (
              <li key={s.id} className={s.faults ? 'text-danger' : ''}>
                Run {i + 1}, {when(s.startedAt)}: {(s.hours ?? 0).toFixed(2)} h
                {s.ambientC !== null && `, room ${s.ambientC} °C`}
                {s.chassisC !== null && `, chassis ${s.chassisC} °C`}
                {s.mainsCurrentAmps !== null && `, mains ${formatQuantity(s.mainsCurrentAmps, 'A')}`}
                {s.faults ? ` — fault: ${s.faults}${s.actionTaken ? `; ${s.actionTaken}` : ''}` : ' — no fault seen'}
              </li>
            ))}
          </ol>
        </>
      )}
    </section>
  );
}
