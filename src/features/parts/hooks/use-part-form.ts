import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { Part } from '../../../../shared/schemas/parts';
import { useCreatePart } from '../api/create-part';
import { useUpdatePart } from '../api/update-part';
import {
  blankPart,
  nextBlank,
  partFormSchema,
  toInput,
  valuesOf,
  type PartDraft,
  type PartFormOutput,
  type PartFormValues,
} from '../lib/part-form-values';
import { isCapacitor, previewWarnings } from '../lib/part-preview';
import { useCurrency } from './use-currency';

/**
 * The part form's state: the shared schema checks it, the bench library previews the warnings as it is typed, and
 * a save adds the line or (with `part`) changes it. The server's message shows if it refuses.
 */
export function usePartForm({
  restorationId,
  part,
  onDone,
}: {
  restorationId: number;
  part?: Part;
  onDone?: () => void;
}) {
  const [currency] = useCurrency();
  const schema = useMemo(() => partFormSchema(currency), [currency]);
  const form = useForm<PartFormValues, unknown, PartFormOutput>({
    resolver: zodResolver(schema),
    defaultValues: part ? valuesOf(part, currency) : blankPart,
  });
  // A line opened for a change takes the focus, which also brings the form into view.
  useEffect(() => {
    if (part) form.setFocus('componentRef');
  }, [part, form]);
  const draft = { ...blankPart, ...useWatch({ control: form.control }) } as PartDraft;
  const warnings = previewWarnings(draft);
  const goesIn = draft.action === 'replaced' || draft.action === 'restuffed';
  const create = useCreatePart(restorationId);
  const update = useUpdatePart(restorationId);
  const saving = part ? update : create;

  const onSubmit = form.handleSubmit((values) => {
    const input = toInput(values, currency);
    if (part) {
      update.mutate({ id: part.id, patch: input }, { onSuccess: () => onDone?.() });
      return;
    }
    create.mutate(input, {
      onSuccess: () => {
        form.reset(nextBlank(draft));
        form.setFocus('componentRef');
        onDone?.();
      },
    });
  });

  return {
    form,
    currency,
    warnings,
    /** Whether both sides carry something to compare, so "no warnings" means something. */
    compared:
      goesIn &&
      Boolean((draft.originalPart || draft.originalRating) && (draft.replacementPart || draft.replacementRating)),
    capacitor: goesIn && isCapacitor(draft),
    onSubmit,
    saving: saving.isPending,
    saved: !part && create.isSuccess && !form.formState.isDirty,
    serverMessage: saving.error?.message,
  };
}
