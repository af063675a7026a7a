import { zodResolver } from '@hookform/resolvers/zod';
import type { ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { kindLabels, kinds, severities, severityLabels, type Shape } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { newFindingDefaults, newFindingSchema, type NewFindingValues } from '../lib/new-finding';
import { toolLabels } from '../lib/tool-labels';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

/** Asks for the words of a mark just drawn; the mark waits on the photo, dashed, until it is saved or cancelled. */
export function NewFindingForm({
  shape,
  busy,
  error,
  onSubmit,
  onCancel,
  refNotice,
  referenceListId,
  referenceHelp,
}: {
  shape: Shape;
  /** Shown under the reference as it is typed: the page points out another finding for the same part. */
  refNotice?: (componentRef: string) => ReactNode;
  busy: boolean;
  error?: string;
  onSubmit: (values: NewFindingValues) => void;
  onCancel: () => void;
  /** A `<datalist>` of the references already known, offered as the reference is typed. */
  referenceListId?: string;
  /** Shown under the reference as it is typed (the known references, an existing finding for the same part). */
  referenceHelp?: (typed: string) => ReactNode;
}) {
  const { register, handleSubmit, formState, watch } = useForm<NewFindingValues>({
    resolver: zodResolver(newFindingSchema),
    defaultValues: newFindingDefaults,
  });
  const errors = formState.errors;
  return (
    <form
      noValidate
      aria-label="New finding"
      className="space-y-3"
      onSubmit={handleSubmit(onSubmit)}
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.preventDefault();
          onCancel();
        }
      }}
    >
      <h2 className="text-lg font-bold">New finding ({toolLabels[shape].toLowerCase()})</h2>
      <Field label="Title" hint="What is wrong, or what to check" error={errors.title?.message}>
        {(a) => <input {...a} {...register('title')} autoFocus maxLength={140} className={inputClass} />}
      </Field>
      <Field
        label="Component reference"
        hint="As the schematic prints it, e.g. C27, R20 or V5"
        error={errors.componentRef?.message}
      >
        {(a) => (
          <input
            {...a}
            {...register('componentRef')}
            list={referenceListId}
            maxLength={20}
            autoComplete="off"
            className={`${inputClass} font-mono`}
          />
        )}
      </Field>
      {refNotice?.(watch('componentRef') ?? '')}
      {referenceHelp?.(watch('componentRef') ?? '')}
      <div className="grid grid-cols-2 gap-3">
        <Field label="Kind">
          {(a) => (
            <select {...a} {...register('kind')} className={inputClass}>
              <LabelledOptions values={kinds} labels={kindLabels} />
            </select>
          )}
        </Field>
        <Field label="Severity">
          {(a) => (
            <select {...a} {...register('severity')} className={inputClass}>
              <LabelledOptions values={severities} labels={severityLabels} />
            </select>
          )}
        </Field>
      </div>
      {error && <FormAlert message={error} />}
      {/* In the phone's bottom sheet the buttons stay in reach while the fields scroll under them. */}
      <div className="flex flex-wrap gap-2 max-lg:sticky max-lg:-bottom-4 max-lg:-mx-4 max-lg:border-t max-lg:border-rule max-lg:bg-panel max-lg:px-4 max-lg:py-2">
        <button type="submit" className={buttonClass('primary')} disabled={busy}>
          {busy ? 'Saving…' : 'Save finding'}
        </button>
        <button type="button" className={buttonClass('quiet')} onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
