import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import {
  equipmentKindLabels,
  equipmentKinds,
  restorationInputSchema,
  workLevelLabels,
  workLevels,
} from '../../../../shared/schemas/restorations';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

type FormInput = z.input<typeof restorationInputSchema>;
type FormOutput = z.output<typeof restorationInputSchema>;

/** The intake form: make and model first, everything else can be filled in at the bench later. */
export function RestorationForm({
  onSubmit,
  submitting,
  submitLabel,
  serverError,
  initial,
}: {
  onSubmit: (values: FormOutput) => void;
  submitting: boolean;
  submitLabel: string;
  serverError?: string;
  /** Values to edit; a new intake starts from today's date. */
  initial?: Partial<FormInput>;
}) {
  const { register, handleSubmit, formState } = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(restorationInputSchema),
    defaultValues: initial ?? {
      equipmentKind: 'radio',
      workLevel: 'repair',
      receivedOn: new Date().toISOString().slice(0, 10),
    },
  });
  const e = formState.errors;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Maker" hint="As printed on the set or its back label" error={e.make?.message}>
          {(a) => <input {...a} {...register('make')} className={inputClass} autoComplete="off" />}
        </Field>
        <Field label="Model" error={e.model?.message}>
          {(a) => <input {...a} {...register('model')} className={inputClass} autoComplete="off" />}
        </Field>
        <Field label="Year" error={e.year?.message}>
          {(a) => (
            <input {...a} {...register('year')} className={inputClass} inputMode="numeric" placeholder="e.g. 1954" />
          )}
        </Field>
        <Field label="Serial number" error={e.serial?.message}>
          {(a) => <input {...a} {...register('serial')} className={`${inputClass} font-mono`} autoComplete="off" />}
        </Field>
        <Field label="Kind of equipment" error={e.equipmentKind?.message}>
          {(a) => (
            <select {...a} {...register('equipmentKind')} className={inputClass}>
              <LabelledOptions values={equipmentKinds} labels={equipmentKindLabels} />
            </select>
          )}
        </Field>
        <Field label="Received on" error={e.receivedOn?.message}>
          {(a) => <input {...a} {...register('receivedOn')} type="date" className={inputClass} />}
        </Field>
        <Field
          label="Mains setting as found"
          hint="Voltage tap, dropper setting, AC only or AC/DC"
          error={e.mainsSetting?.message}
        >
          {(a) => <input {...a} {...register('mainsSetting')} className={inputClass} placeholder="e.g. 245 V tap" />}
        </Field>
        <Field label="Agreed level of work" error={e.workLevel?.message}>
          {(a) => (
            <select {...a} {...register('workLevel')} className={inputClass}>
              <LabelledOptions values={workLevels} labels={workLevelLabels} />
            </select>
          )}
        </Field>
      </div>
      <fieldset className="space-y-3 rounded-lg border border-rule bg-panel p-3">
        <legend className="px-1 font-semibold">The owner</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Owner's name" error={e.ownerName?.message}>
            {(a) => <input {...a} {...register('ownerName')} className={inputClass} autoComplete="off" />}
          </Field>
          <Field label="Owner's e-mail" error={e.ownerEmail?.message}>
            {(a) => <input {...a} {...register('ownerEmail')} type="email" className={inputClass} autoComplete="off" />}
          </Field>
        </div>
        {!initial && (
          <label className="flex min-h-11 items-center gap-3">
            <input type="checkbox" {...register('inviteOwner')} className="h-5 w-5 accent-[var(--color-glow)]" />
            <span>
              Invite them as the owner: they get an e-mail link to follow the work and read the hand-back report
            </span>
          </label>
        )}
      </fieldset>
      <label className="flex min-h-11 items-center gap-3 rounded-lg border border-rule bg-panel px-3">
        <input type="checkbox" {...register('liveChassis')} className="h-5 w-5 accent-[var(--color-glow)]" />
        <span>
          <strong>Live chassis</strong> (AC/DC set, or chassis tied to the mains): work only through an isolation
          transformer.
        </span>
      </label>
      <label className="flex min-h-11 items-center gap-3 rounded-lg border border-rule bg-panel px-3">
        <input type="checkbox" {...register('hiddenPartsOriginal')} className="h-5 w-5 accent-[var(--color-glow)]" />
        <span>Hidden parts must look original too (restuff cans and tubulars)</span>
      </label>
      <Field label="Symptoms, in the owner's words" error={e.symptoms?.message}>
        {(a) => (
          <textarea
            {...a}
            {...register('symptoms')}
            rows={3}
            className={inputClass}
            placeholder="“Plays for a few minutes, then fades away”"
          />
        )}
      </Field>
      <Field
        label="Condition at intake"
        hint="Cabinet, knobs, back, mains lead, anything missing"
        error={e.conditionNotes?.message}
      >
        {(a) => <textarea {...a} {...register('conditionNotes')} rows={3} className={inputClass} />}
      </Field>
      <Field label="The set's story" hint="For the owner's hand-back report" error={e.story?.message}>
        {(a) => <textarea {...a} {...register('story')} rows={3} className={inputClass} />}
      </Field>
      <Field
        label="Care notes for the owner"
        hint="For the hand-back report: warm-up, ventilation, aerial, play time"
        error={e.careNotes?.message}
      >
        {(a) => <textarea {...a} {...register('careNotes')} rows={3} className={inputClass} />}
      </Field>
      {serverError && <FormAlert message={serverError} />}
      <button type="submit" className={buttonClass('primary')} disabled={submitting}>
        {submitting ? 'Saving…' : submitLabel}
      </button>
    </form>
  );
}
