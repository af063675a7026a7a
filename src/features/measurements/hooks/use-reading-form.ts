import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { measurementInputSchema, type Measurement } from '../../../../shared/schemas/measurements';
import { useCreateMeasurement } from '../api/create-measurement';
import { useUpdateMeasurement } from '../api/update-measurement';
import { applicableFields, applicableTexts, readingKinds } from '../../../../shared/bench';
import { fieldOfMessage, previewVerdict, type ReadingField } from '../lib/verdict-preview';
import { inputOf } from '../lib/measurement-input';

// The API's own rules, with the finding link as a select gives it (a string; '' for none).
const formSchema = measurementInputSchema.extend({
  findingId: z.string().transform((v) => (v === '' ? null : Number(v))),
});
export type ReadingFormValues = z.input<typeof formSchema>;
type Output = z.output<typeof formSchema>;

const blank: ReadingFormValues = {
  location: '',
  quantity: 'esr',
  expected: '',
  tolerance: '',
  rating: '',
  reading: '',
  conditions: '',
  method: '',
  chartMeter: '',
  meter: '',
  source: '',
  findingId: '',
  ownerVisible: false,
  powerOn: false,
};

const valuesOf = (m: Measurement): ReadingFormValues => ({
  ...inputOf(m),
  findingId: m.findingId === null ? '' : String(m.findingId),
});

/**
 * The reading form's state: the shared schema validates it, the bench library previews the verdict as it is typed,
 * and a save creates or (with `measurement`) changes the reading. Messages are found per field.
 */
export function useReadingForm({
  restorationId,
  measurement,
  findingId,
  onDone,
}: {
  restorationId: number;
  measurement?: Measurement;
  findingId?: number;
  onDone?: () => void;
}) {
  const form = useForm<ReadingFormValues, unknown, Output>({
    resolver: zodResolver(formSchema),
    defaultValues: measurement ? valuesOf(measurement) : { ...blank, findingId: findingId ? String(findingId) : '' },
  });
  const [
    quantity = 'esr',
    expected = '',
    tolerance = '',
    rating = '',
    reading = '',
    chartMeter = '',
    meter = '',
    source = '',
  ] = useWatch({
    control: form.control,
    name: ['quantity', 'expected', 'tolerance', 'rating', 'reading', 'chartMeter', 'meter', 'source'],
  });
  const preview = previewVerdict({ quantity, expected, tolerance, rating, reading, chartMeter, meter, source });
  const create = useCreateMeasurement(restorationId);
  const update = useUpdateMeasurement(restorationId);
  const saving = measurement ? update : create;
  const serverMessage = saving.error?.message;
  const serverField = serverMessage === undefined ? undefined : fieldOfMessage(serverMessage);

  /** What to show beside a field: the schema's complaint, the library's, or the server's. */
  const errorOf = (field: ReadingField): string | undefined =>
    (form.formState.errors[field]?.message as string | undefined) ??
    (preview.status === 'refused' && preview.field === field ? preview.message : undefined) ??
    (serverField === field ? serverMessage : undefined);

  const onSubmit = form.handleSubmit((values) => {
    if (preview.status === 'refused') {
      if (preview.field) form.setFocus(preview.field as keyof ReadingFormValues);
      return;
    }
    const input = applicableTexts(values);
    if (measurement) {
      update.mutate({ id: measurement.id, patch: input }, { onSuccess: () => onDone?.() });
      return;
    }
    create.mutate(input, {
      onSuccess: () => {
        // Readings come in runs of one kind: keep the kind, meter and conditions, clear the point itself.
        form.reset({ ...form.getValues(), location: '', expected: '', rating: '', reading: '', source: '' });
        onDone?.();
      },
    });
  });

  return {
    form,
    hints: readingKinds[quantity].form,
    applies: applicableFields(quantity),
    preview,
    errorOf,
    onSubmit,
    saving: saving.isPending,
    saved: !measurement && create.isSuccess && !form.formState.isDirty,
    serverMessage,
  };
}
