import { KnownReferences } from '../../../components/known-references';
import { useId } from 'react';
import {
  mainsPositionLabels,
  mainsPositions,
  partActionLabels,
  partActions,
  partStateLabels,
  partStates,
  type Part,
} from '../../../../shared/schemas/parts';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { usePartForm } from '../hooks/use-part-form';
import { FindingOptions, type FindingChoice } from '../../../components/finding-options';
import { DeletePart } from './delete-part';
import { RecapCaution } from './recap-caution';
import { SameReferencePart } from './same-reference-part';
import { WarningsPreview } from './warnings-preview';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

export interface PartFormProps {
  restorationId: number;
  /** The line to change; without it the form adds a new one. */
  part?: Part;
  findings?: FindingChoice[];
  onDone?: () => void;
  onCancel?: () => void;
}

const mono = `${inputClass} font-mono`;
const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

/** Adds a line to the parts ledger, or changes one, with the checks previewed as it is typed. Technicians only. */
export function PartForm({ restorationId, part, findings, onDone, onCancel }: PartFormProps) {
  const { form, currency, warnings, compared, capacitor, onSubmit, saving, saved, serverMessage } = usePartForm({
    restorationId,
    part,
    onDone,
  });
  const {
    register,
    formState: { errors },
  } = form;
  const typedRef = form.watch('componentRef');
  const editing = part !== undefined;
  const sourcesId = useId();
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change part ${part.componentRef}` : 'Record a part'}
      className="space-y-4 rounded-xl border border-rule bg-panel p-4 print:hidden"
    >
      <h3 className="text-lg font-bold">{editing ? `Change ${part.componentRef}` : 'Record a part'}</h3>
      <div className="grid gap-3 sm:grid-cols-3">
        <KnownReferences restorationId={restorationId} id="ledger-known-references" />
        <Field
          label="Component reference"
          hint="As the schematic prints it, e.g. C27"
          error={errors.componentRef?.message}
        >
          {(a) => (
            <input {...a} {...register('componentRef')} {...typed} list="ledger-known-references" className={mono} />
          )}
        </Field>
        <Field label="Action" error={errors.action?.message}>
          {(a) => (
            <select {...a} {...register('action')} className={inputClass}>
              <LabelledOptions values={partActions} labels={partActionLabels} />
            </select>
          )}
        </Field>
        <Field label="State" error={errors.state?.message}>
          {(a) => (
            <select {...a} {...register('state')} className={inputClass}>
              <LabelledOptions values={partStates} labels={partStateLabels} />
            </select>
          )}
        </Field>
      </div>
      <SameReferencePart
        restorationId={restorationId}
        componentRef={typeof typedRef === 'string' ? typedRef : ''}
        exceptId={part?.id}
      />
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="sr-only">What came out and what goes in</legend>
        <Field label="Original part" hint="What came out, e.g. wax paper tubular" error={errors.originalPart?.message}>
          {(a) => <input {...a} {...register('originalPart')} className={inputClass} />}
        </Field>
        <Field
          label="Original rating"
          hint="Value and voltage, e.g. 0.022µF 350V"
          error={errors.originalRating?.message}
        >
          {(a) => <input {...a} {...register('originalRating')} {...typed} className={mono} />}
        </Field>
        <Field
          label="Replacement part"
          hint="What goes in, e.g. polyester film"
          error={errors.replacementPart?.message}
        >
          {(a) => <input {...a} {...register('replacementPart')} className={inputClass} />}
        </Field>
        <Field
          label="Replacement rating"
          hint="Never a lower voltage, e.g. 22nF 630V"
          error={errors.replacementRating?.message}
        >
          {(a) => <input {...a} {...register('replacementRating')} {...typed} className={mono} />}
        </Field>
      </fieldset>
      <Field
        label="Mains position"
        error={errors.mainsPosition?.message}
        hint="Across the mains (live to neutral) needs an X-class safety capacitor; from the mains to the chassis or earth needs a Y-class, made not to fail short. A Y may stand in for an X, never the reverse. Fit new ones here: old stock safety capacitors are known to crack and fail."
      >
        {(a) => (
          <select {...a} {...register('mainsPosition')} className={inputClass}>
            <LabelledOptions values={mainsPositions} labels={mainsPositionLabels} />
          </select>
        )}
      </Field>
      <WarningsPreview warnings={warnings} compared={compared} />
      {capacitor && <RecapCaution />}
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Quantity" error={errors.quantity?.message}>
          {(a) => <input {...a} {...register('quantity')} {...typed} inputMode="numeric" className={mono} />}
        </Field>
        <Field label={`Cost of the line (${currency})`} hint="Blank if not known" error={errors.cost?.message}>
          {(a) => (
            <input
              {...a}
              {...register('cost')}
              {...typed}
              inputMode="decimal"
              className={mono}
              placeholder="e.g. 0.55"
            />
          )}
        </Field>
        <Field label="Source" hint="e.g. “new, supplier” or “new-old-stock”" error={errors.source?.message}>
          {(a) => <input {...a} {...register('source')} list={sourcesId} className={inputClass} />}
        </Field>
        <datalist id={sourcesId}>
          <option value="new, supplier" />
          <option value="new-old-stock" />
          <option value="original, restuffed" />
        </datalist>
      </div>
      <Field
        label="Tested after"
        hint="How it tested once fitted, e.g. output cathode 8.3 V after an hour, no red glow"
        error={errors.testedAfter?.message}
      >
        {(a) => <input {...a} {...register('testedAfter')} className={inputClass} />}
      </Field>
      <Field label="Notes" hint="Not shown to the owner" error={errors.notes?.message}>
        {(a) => <textarea {...a} {...register('notes')} rows={2} className={inputClass} />}
      </Field>
      {findings && findings.length > 0 && (
        <Field label="Finding (optional)" error={errors.findingId?.message}>
          {(a) => (
            <select {...a} {...register('findingId')} className={inputClass}>
              <FindingOptions findings={findings} />
            </select>
          )}
        </Field>
      )}
      {serverMessage && <FormAlert small message={`Not saved: ${serverMessage}`} />}
      {saved && (
        <p role="status" className="text-sm">
          Saved. The ledger shows the line with the checks stored for it.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={buttonClass('primary')} disabled={saving}>
          {saving ? 'Saving…' : editing ? 'Save changes' : 'Add to the ledger'}
        </button>
        {onCancel && (
          <button type="button" className={buttonClass('quiet')} onClick={onCancel}>
            Cancel
          </button>
        )}
        {editing && <DeletePart restorationId={restorationId} part={part} onDeleted={onDone} />}
      </div>
    </form>
  );
}
