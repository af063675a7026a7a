import { useState } from 'react';
import {
  decisionLabels,
  decisions,
  lampBehaviourLabels,
  lampBehaviours,
  supplies,
  supplyLabels,
} from '../../../../shared/schemas/bringup';
import { buttonClass } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useAddBringupStep } from '../api/add-bringup-step';
import { lampLimitWords } from '../lib/inline-limits';
import { emptyDraft, readDraft, usesLamp, type StepDraft } from '../lib/step-draft';
import { FindingOptions, type FindingChoice } from '../../../components/finding-options';
import { StepReadings } from './step-readings';
import { LabelledOptions } from '../../../components/labelled-options';

const toNumber = (text: string) => (text.trim() === '' ? null : Number(text.replace(',', '.')));

/** Logs the step just taken; the draft stays on the page if the save fails. */
export function StepForm({
  restorationId,
  nextNumber,
  findings,
}: {
  restorationId: number;
  nextNumber: number;
  findings: FindingChoice[];
}) {
  const add = useAddBringupStep(restorationId);
  const [draft, setDraft] = useState<StepDraft>(emptyDraft());
  const [errors, setErrors] = useState<Record<string, string>>({});
  const set = (patch: Partial<StepDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const lamp = usesLamp(draft.supply);
  const limit = lamp
    ? lampLimitWords({
        lampWatts: toNumber(draft.lampWatts),
        lampVolts: toNumber(draft.lampVolts),
        appliedVolts: toNumber(draft.appliedVolts),
      })
    : null;
  const brightGoingOn = lamp && draft.lampBehaviour === 'bright-staying' && draft.decision === 'go-on';
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const read = readDraft(draft);
    if (!read.ok) return setErrors(read.errors);
    setErrors({});
    add.mutate(read.input, { onSuccess: () => setDraft(emptyDraft(draft)) });
  };
  const text = (key: 'lampWatts' | 'lampVolts' | 'appliedVolts', label: string, hint?: string) => (
    <div>
      <label htmlFor={`step-${key}`} className="text-sm font-semibold">
        {label}
      </label>
      {hint && <p className="text-xs text-ink-soft">{hint}</p>}
      <input
        id={`step-${key}`}
        inputMode="decimal"
        value={draft[key]}
        onChange={(e) => set({ [key]: e.target.value })}
        aria-invalid={Boolean(errors[key])}
        className={`${inputClass} font-mono`}
      />
      {errors[key] && <p className="text-sm font-semibold text-danger">{errors[key]}</p>}
    </div>
  );
  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label="Log a power-up step"
      className="space-y-4 rounded-xl border border-rule bg-panel p-4"
    >
      <h3 className="text-lg font-bold">Log step {nextNumber}</h3>
      <div className="grid gap-3 sm:grid-cols-4">
        <div>
          <label htmlFor="step-supply" className="text-sm font-semibold">
            Supply
          </label>
          <select
            id="step-supply"
            value={draft.supply}
            onChange={(e) => set({ supply: e.target.value as StepDraft['supply'] })}
            className={inputClass}
          >
            <LabelledOptions values={supplies} labels={supplyLabels} />
          </select>
        </div>
        {lamp && text('lampWatts', 'Lamp (W)')}
        {lamp && text('lampVolts', 'Lamp rated (V)')}
        {text('appliedVolts', 'Volts applied', 'Mains, or the variable transformer’s output')}
      </div>
      {limit && (
        <p aria-live="polite" className="rounded-lg bg-glow-soft px-3 py-2 text-sm">
          <strong>{limit.limit}</strong> {limit.note}
        </p>
      )}
      {lamp && (
        <div>
          <label htmlFor="step-lamp" className="text-sm font-semibold">
            What the lamp did
          </label>
          <select
            id="step-lamp"
            value={draft.lampBehaviour}
            onChange={(e) => set({ lampBehaviour: e.target.value as StepDraft['lampBehaviour'] })}
            className={inputClass}
          >
            {lampBehaviours
              .filter((b) => b !== 'no-lamp')
              .map((b) => (
                <option key={b} value={b}>
                  {lampBehaviourLabels[b]}
                </option>
              ))}
          </select>
        </div>
      )}
      <StepReadings rows={draft.readings} errors={errors} onChange={(readings) => set({ readings })} />
      <div>
        <label htmlFor="step-notes" className="text-sm font-semibold">
          Smell, smoke, hum, heater glow
        </label>
        <textarea
          id="step-notes"
          rows={2}
          value={draft.notes}
          maxLength={1000}
          onChange={(e) => set({ notes: e.target.value })}
          className={inputClass}
        />
      </div>
      {findings.length > 0 && (
        <div>
          <label htmlFor="step-finding" className="text-sm font-semibold">
            Finding (optional)
          </label>
          <select
            id="step-finding"
            value={draft.findingId}
            onChange={(e) => set({ findingId: e.target.value })}
            className={inputClass}
          >
            <FindingOptions findings={findings} />
          </select>
        </div>
      )}
      <fieldset>
        <legend className="text-sm font-semibold">Decision</legend>
        <div className="flex flex-wrap gap-x-5">
          {decisions.map((d) => (
            <label key={d} className="inline-flex min-h-11 items-center gap-2">
              <input
                type="radio"
                name="step-decision"
                value={d}
                checked={draft.decision === d}
                onChange={() => set({ decision: d })}
                className="h-4 w-4 accent-glow"
              />
              <span className={d === 'stop' ? 'text-danger' : ''}>{decisionLabels[d]}</span>
            </label>
          ))}
        </div>
        {errors.decision && <p className="text-sm font-semibold text-danger">{errors.decision}</p>}
      </fieldset>
      {brightGoingOn && (
        <p role="alert" className="text-sm font-semibold text-danger">
          A lamp that stays bright means a fault (a short, a leaky reservoir, a shorted rectifier): stop and find it
          before going on.
        </p>
      )}
      {add.isError && (
        <p role="alert" className="text-sm font-semibold text-danger">
          {add.error.message}
        </p>
      )}
      <button type="submit" disabled={add.isPending} className={buttonClass()}>
        {add.isPending ? 'Saving…' : `Log step ${nextNumber}`}
      </button>
    </form>
  );
}
