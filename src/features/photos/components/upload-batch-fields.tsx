import type { UseFormReturn } from 'react-hook-form';
import { phaseLabels, phases, viewLabels, views, type PhotoUploadFields } from '../../../../shared/schemas/photos';
import { Field, inputClass } from '../../../components/field';
import type { UploadFields } from '../api/upload-photo';
import { LabelledOptions } from '../../../components/labelled-options';

export type BatchForm = UseFormReturn<PhotoUploadFields, unknown, UploadFields>;

/** What every photo of the next batch is filed under; chosen before the files are picked. */
export function UploadBatchFields({ form }: { form: BatchForm }) {
  const { register, formState } = form;
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm text-ink-soft">These go with each photo you add next.</legend>
      <div className="grid grid-cols-2 gap-3">
        <Field label="View">
          {(a) => (
            <select {...a} {...register('view')} className={inputClass}>
              <LabelledOptions values={views} labels={viewLabels} />
            </select>
          )}
        </Field>
        <Field label="Phase">
          {(a) => (
            <select {...a} {...register('phase')} className={inputClass}>
              <LabelledOptions values={phases} labels={phaseLabels} />
            </select>
          )}
        </Field>
      </div>
      <Field label="Caption (optional)" error={formState.errors.caption?.message}>
        {(a) => (
          <input
            {...a}
            {...register('caption')}
            maxLength={500}
            className={inputClass}
            placeholder="e.g. mains dropper before any work"
          />
        )}
      </Field>
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" {...register('ownerVisible')} className="h-5 w-5 accent-glow" />
        <span>
          Share with owner <span className="text-sm text-ink-soft">— they see only shared photos</span>
        </span>
      </label>
    </fieldset>
  );
}
