import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { taxRoundingLabels, taxRoundings } from '../../../../shared/money/tax';
import type { WorkshopSettings } from '../../../../shared/schemas/estimates';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useSaveWorkshopSettings } from '../api/workshop-settings';
import { moneyText } from './money-text';
import { settingsFormSchema, toFormValues, toSettings, type SettingsFormValues } from './settings-form-values';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

/** Where each rounding rule comes from, stated beside the choice. */
const roundingSources: Record<(typeof taxRoundings)[number], string> = {
  'invoice-down': 'HMRC (UK VAT) allows the VAT on an invoice total to be rounded down to the whole penny.',
  'invoice-half-up': 'The usual rule for GST in Australia (ATO): the total GST to the nearest cent, half a cent up.',
  'line-half-up': 'HMRC also accepts VAT worked per line, each rounded to the nearest penny.',
};

/**
 * The workshop's money settings; each estimate and invoice copies them when written, so changes apply from now on.
 * `readOnly` shows them to a technician who is not one of the administrators, who change them (decision 46).
 */
export function WorkshopSettingsForm({
  settings,
  readOnly = false,
}: {
  settings: WorkshopSettings;
  readOnly?: boolean;
}) {
  const save = useSaveWorkshopSettings();
  const {
    register,
    handleSubmit,
    watch,
    reset,
    formState: { errors, isDirty },
  } = useForm<SettingsFormValues>({
    resolver: zodResolver(settingsFormSchema),
    defaultValues: toFormValues(settings),
  });
  const taxOn = watch('taxOn');
  const rounding = watch('taxRounding');
  return (
    <form
      noValidate
      className="space-y-5"
      aria-label="Workshop settings"
      onSubmit={handleSubmit((v) => save.mutate(toSettings(v), { onSuccess: (saved) => reset(toFormValues(saved)) }))}
    >
      <fieldset disabled={readOnly} className="space-y-5">
        <fieldset className="grid gap-4 rounded-xl border border-rule bg-panel p-4 sm:grid-cols-3">
          <legend className="px-1 font-bold">Prices</legend>
          <Field
            label="Currency"
            hint="ISO 4217 code; every screen, CSV and PDF shows amounts in it."
            error={errors.currency?.message}
          >
            {(a) => (
              <input
                {...a}
                {...register('currency')}
                className={inputClass}
                autoCapitalize="characters"
                maxLength={3}
              />
            )}
          </Field>
          <Field
            label="Labour rate per hour"
            hint={`Now ${moneyText({ amount: settings.labourRate, currency: settings.currency })}.`}
            error={errors.labourRate?.message}
          >
            {(a) => <input {...a} {...register('labourRate')} className={inputClass} inputMode="decimal" />}
          </Field>
          <Field
            label="Parts markup (%)"
            hint="Added to each fitted part's cost on the final invoice."
            error={errors.partsMarkup?.message}
          >
            {(a) => <input {...a} {...register('partsMarkup')} className={inputClass} inputMode="decimal" />}
          </Field>
        </fieldset>
        <fieldset className="grid gap-4 rounded-xl border border-rule bg-panel p-4 sm:grid-cols-3">
          <legend className="px-1 font-bold">Tax</legend>
          <label className="flex min-h-11 items-center gap-2 sm:col-span-3">
            <input type="checkbox" {...register('taxOn')} /> Charge tax on estimates and invoices
          </label>
          {taxOn && (
            <>
              <Field label="Tax name" error={errors.taxName?.message}>
                {(a) => <input {...a} {...register('taxName')} className={inputClass} />}
              </Field>
              <Field label="Rate (%)" error={errors.taxRate?.message}>
                {(a) => <input {...a} {...register('taxRate')} className={inputClass} inputMode="decimal" />}
              </Field>
              <Field label="Rounding rule" hint={roundingSources[rounding]} error={errors.taxRounding?.message}>
                {(a) => (
                  <select {...a} {...register('taxRounding')} className={inputClass}>
                    <LabelledOptions values={taxRoundings} labels={taxRoundingLabels} />
                  </select>
                )}
              </Field>
            </>
          )}
          <p className="text-sm text-ink-soft sm:col-span-3">
            Check the rate and rule with your tax authority or accountant; Gridleak applies what you set here.
          </p>
        </fieldset>
        <fieldset className="grid gap-4 rounded-xl border border-rule bg-panel p-4 sm:grid-cols-3">
          <legend className="px-1 font-bold">Invoices and estimates</legend>
          <Field
            label="Invoice number prefix"
            hint="Printed before the number: CL- gives CL-42. Numbers themselves always follow on without gaps."
            error={errors.invoicePrefix?.message}
          >
            {(a) => <input {...a} {...register('invoicePrefix')} className={inputClass} />}
          </Field>
          <Field
            label="Time zone for e-mailed documents"
            hint="IANA name, e.g. Europe/London. A download uses the reader's own zone."
            error={errors.timeZone?.message}
          >
            {(a) => <input {...a} {...register('timeZone')} className={inputClass} />}
          </Field>
          <label className="flex min-h-11 items-center gap-2 sm:col-span-3">
            <input type="checkbox" {...register('estimateApprovalRequired')} /> Work goes past Assessment only once the
            owner has approved the estimate
          </label>
        </fieldset>
      </fieldset>
      {save.isError && <FormAlert message={save.error.message} />}
      {save.isSuccess && !isDirty && (
        <p role="status">Saved. New estimates and invoices use these settings; those already written keep theirs.</p>
      )}
      {!readOnly && (
        <button type="submit" className={buttonClass('primary')} disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save the settings'}
        </button>
      )}
    </form>
  );
}
