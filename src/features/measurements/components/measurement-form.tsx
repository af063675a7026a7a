import { KnownReferences } from '../../../components/known-references';
import { useId } from 'react';
import { measuredQuantities, readingKinds } from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useReadingForm } from '../hooks/use-reading-form';
import { LiveReadingsNote } from './live-readings-note';
import { MeterLoadingFields } from './meter-loading-fields';
import { VerdictPreviewPanel } from './verdict-preview-panel';
import { FindingOptions, type FindingChoice } from '../../../components/finding-options';
import { FormAlert } from '../../../components/form-alert';

const valueInput = `${inputClass} font-mono`;
const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

/**
 * Records a reading (or, with `measurement`, changes one) as the restorer writes it: "470k", "255 V", "32µ".
 * The verdict is previewed while typing; the server's stored verdict counts once saved. Technicians only.
 */
export function MeasurementForm({
  restorationId,
  findings,
  measurement,
  findingId,
  onDone,
  onCancel,
}: {
  restorationId: number;
  findings?: FindingChoice[];
  measurement?: Measurement;
  /** Links a new reading to this finding from the start. */
  findingId?: number;
  onDone?: () => void;
  onCancel?: () => void;
}) {
  const { form, hints, applies, preview, errorOf, onSubmit, saving, saved, serverMessage } = useReadingForm({
    restorationId,
    measurement,
    findingId,
    onDone,
  });
  const { register } = form;
  const powerHintId = useId();
  const editing = measurement !== undefined;
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change the reading at ${measurement.location}` : 'Record a reading'}
      className="space-y-4 rounded-xl border border-rule bg-panel p-4"
    >
      {!editing && <h3 className="text-lg font-bold">Record a reading</h3>}
      <div className="grid gap-3 sm:grid-cols-2">
        <KnownReferences restorationId={restorationId} id="reading-known-references" />
        <Field label="Location" hint="Component or test point, e.g. C27, V5 pin 3" error={errorOf('location')}>
          {(a) => (
            <input
              {...a}
              {...register('location')}
              {...typed}
              list="reading-known-references"
              className={inputClass}
              placeholder="e.g. V5 pin 3"
            />
          )}
        </Field>
        <Field label="Quantity" error={errorOf('quantity')}>
          {(a) => (
            <select {...a} {...register('quantity')} className={inputClass}>
              {measuredQuantities.map((q) => (
                <option key={q} value={q}>
                  {readingKinds[q].label}
                </option>
              ))}
            </select>
          )}
        </Field>
        <Field label={hints.expectedLabel} error={errorOf('expected')}>
          {(a) => (
            <input
              {...a}
              {...register('expected')}
              {...typed}
              className={valueInput}
              placeholder={hints.expectedPlaceholder}
            />
          )}
        </Field>
        {applies.tolerance && (
          <Field label="Tolerance (%)" hint={hints.toleranceHint} error={errorOf('tolerance')}>
            {(a) => (
              <input
                {...a}
                {...register('tolerance')}
                {...typed}
                className={valueInput}
                placeholder="e.g. 10"
                inputMode="text"
              />
            )}
          </Field>
        )}
        {applies.rating && (
          <Field label="Rated voltage" error={errorOf('rating')}>
            {(a) => <input {...a} {...register('rating')} {...typed} className={valueInput} placeholder="e.g. 350 V" />}
          </Field>
        )}
        <Field label="Reading" hint="As the meter showed it" error={errorOf('reading')}>
          {(a) => (
            <input
              {...a}
              {...register('reading')}
              {...typed}
              className={valueInput}
              placeholder={hints.readingPlaceholder}
            />
          )}
        </Field>
      </div>
      {applies.meterLoading && (
        <MeterLoadingFields register={register} errorOf={errorOf} open={Boolean(form.getValues('chartMeter'))} />
      )}
      <VerdictPreviewPanel preview={preview} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field
          label="Conditions"
          hint="e.g. 236 V mains on the 245 V tap, no signal, volume minimum"
          error={errorOf('conditions')}
        >
          {(a) => <input {...a} {...register('conditions')} className={inputClass} />}
        </Field>
        <Field label="Method" hint={hints.methodHint} error={errorOf('method')}>
          {(a) => <input {...a} {...register('method')} className={inputClass} />}
        </Field>
        {findings && findings.length > 0 && (
          <Field label="Finding (optional)" error={errorOf('findingId')}>
            {(a) => (
              <select {...a} {...register('findingId')} className={inputClass}>
                <FindingOptions findings={findings} />
              </select>
            )}
          </Field>
        )}
        <label className="flex min-h-11 items-center gap-2 self-end">
          <input type="checkbox" {...register('ownerVisible')} className="h-5 w-5 accent-glow" />
          Share with the owner
        </label>
        <label className="flex min-h-11 items-center gap-2 self-end">
          <input
            type="checkbox"
            {...register('powerOn')}
            className="h-5 w-5 accent-glow"
            aria-describedby={powerHintId}
          />
          Taken with the set powered from the mains
        </label>
        <p id={powerHintId} className="text-sm text-ink-soft sm:col-span-full">
          Powered readings are recorded only after the pre-power checklist is signed off (Bring-up tab).
        </p>
      </div>
      {hints.live && <LiveReadingsNote />}
      {serverMessage && <FormAlert small message={`Not saved: ${serverMessage}`} />}
      {saved && (
        <p role="status" className="text-sm">
          Saved. The verdict shown in the list is the one stored.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={buttonClass('primary')} disabled={saving}>
          {saving ? 'Saving…' : editing ? 'Save changes' : 'Save reading'}
        </button>
        {onCancel && (
          <button type="button" className={buttonClass('quiet')} onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
